// A converted open-rate-database rate as the library stores it: who bills it, to whom, since when, from where.
import { type ImportNote, type TariffInput, urdbDate } from '$lib/calc';
import type { CustomerClass } from '$lib/forms/tariff-meta.schema';
import type { UrdbMeta, UrdbRateFields } from './urdb-read';

/** The database's sectors as Runrate's customer classes; any other sector (Lighting…) is "other". */
const SECTOR_CLASSES: Record<string, CustomerClass> = {
	residential: 'residential',
	commercial: 'commercial',
	industrial: 'industrial',
	agricultural: 'agricultural',
	agriculture: 'agricultural'
};

export const customerClassOf = (sector: string | null): CustomerClass =>
	SECTOR_CLASSES[(sector ?? '').trim().toLowerCase()] ?? 'other';

/** The calendar date a database timestamp stands for (the core's rule: the nearest UTC midnight). */
export const dateOf = urdbDate;

/** Text cut to `max` characters (an ellipsis marks the cut), as the library's fields hold. */
const cut = (text: string, max: number) => (text.length <= max ? text : `${text.slice(0, max - 1)}…`);

/** The version's source: the rate's page in the database, or its label when it has no address. */
export function sourceOf(rate: UrdbRateFields): string {
	if (rate.uri && rate.uri.length <= 500) return rate.uri;
	return cut(`OpenEI Utility Rate Database, label ${rate.label ?? '(none)'}`, 500);
}

/** The change note's words when the person priced a rate the database marks as ended as still in force. */
function endLeftOut(rate: UrdbRateFields, choices: UrdbChoices): string {
	const end = dateOf(rate.enddate);
	return choices.openEnded && end ? ` The database's end date, ${end}, was left out at import.` : '';
}

/** What the person chooses, since the database does not say it: the time zone, and a start date if none. */
export type UrdbChoices = { timezone: string; effectiveFrom?: string | null; openEnded?: boolean };

/**
 * The submission the library's tariff schema checks (`tariffSubmissionSchema`): country US, US dollars,
 * no holidays (the database's schedules have none), the chosen time zone, provenance from the rate.
 */
export function urdbSubmission(
	reading: { tariff: TariffInput; meta: UrdbMeta; notes: ImportNote[]; rate: UrdbRateFields },
	choices: UrdbChoices,
	today: string
) {
	const { meta, rate, notes } = reading;
	const label = rate.label ?? null;
	const left = notes.map((note) => note.message).join('; ');
	const description = typeof rate.description === 'string' ? rate.description.trim() : '';
	return {
		meta: {
			utility: cut(meta.utility?.trim() || 'Utility not named in the rate', 120),
			name: cut(meta.name?.trim() || `Rate ${label ?? 'without a label'}`, 120),
			code: null,
			country: 'US',
			region: null,
			area: null,
			customerClass: customerClassOf(meta.sector),
			currency: 'USD',
			timezone: choices.timezone,
			holidays: null,
			description: cut(
				`Imported from the OpenEI Utility Rate Database${label ? `, label ${label}` : ''}.${description ? ` ${description}` : ''}`,
				2000
			)
		},
		version: {
			effectiveFrom: dateOf(rate.startdate) ?? choices.effectiveFrom ?? '',
			effectiveTo: choices.openEnded ? null : dateOf(rate.enddate),
			source: sourceOf(rate),
			checkedOn: today,
			changeNote: cut(
				`Imported from the OpenEI Utility Rate Database.${endLeftOut(rate, choices)}${left ? ` Not taken: ${left}.` : ''}`,
				2000
			)
		},
		structure: reading.tariff
	};
}
