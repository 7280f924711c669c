import type { Tariff } from './tariff.schema';
import { demandFields } from './urdb-export-demand';
import { energyFields } from './urdb-export-energy';
import type { ExportNote } from './urdb-export-grid';

export type { ExportNote } from './urdb-export-grid';

/** What the open rate database keeps beside the prices: who, what, when (dates as YYYY-MM-DD). */
export interface UrdbMeta {
	label?: string | null;
	name?: string | null;
	utility?: string | null;
	sector?: string | null;
	source?: string | null;
	startDate?: string | null;
	endDate?: string | null;
}

/** What an export gives: the rate, and what of the tariff it could not hold. */
export interface UrdbExport {
	/** The rate in the open rate database's JSON shape (as its API gives one item). */
	rate: Record<string, unknown>;
	/** What of the tariff was not written, or written only approximately. */
	notes: ExportNote[];
}

const FIXED_UNITS = { perMonth: '$/month', perDay: '$/day', perYear: '$/year' } as const;

/** Fixed charges of one kind added up (URDB has one fixed charge); other kinds are noted, not written. */
function fixedFields(tariff: Tariff, notes: ExportNote[]): Record<string, unknown> {
	const first = tariff.fixedCharges[0];
	if (!first) return {};
	const kind = (Object.keys(FIXED_UNITS) as (keyof typeof FIXED_UNITS)[]).find(
		(k) => first[k] !== undefined
	)!;
	let sum = 0;
	for (const charge of tariff.fixedCharges) {
		const value = charge[kind];
		if (value === undefined)
			notes.push({
				field: 'fixedCharges',
				message: `"${charge.label}" is charged in other units than the first fixed charge; not written`
			});
		else sum += value;
	}
	return { fixedchargefirstmeter: sum, fixedchargeunits: FIXED_UNITS[kind] };
}

/** Minimum bills: per month or per day in `mincharge` (one of them), per year in `annualmincharge`. */
function minimumFields(tariff: Tariff, notes: ExportNote[]): Record<string, unknown> {
	const out: Record<string, unknown> = {};
	if (tariff.minimumMonthly)
		Object.assign(out, { mincharge: tariff.minimumMonthly, minchargeunits: '$/month' });
	if (tariff.minimumPerDay) {
		if (out.mincharge !== undefined)
			notes.push({
				field: 'minimumPerDay',
				message: 'A minimum per day beside a minimum per month: not written'
			});
		else Object.assign(out, { mincharge: tariff.minimumPerDay, minchargeunits: '$/day' });
	}
	if (tariff.minimumPerYear) out.annualmincharge = tariff.minimumPerYear;
	return out;
}

const seconds = (date: string | null | undefined) =>
	date ? Math.round(Date.parse(`${date}T00:00:00Z`) / 1000) : undefined;

/**
 * A Runrate tariff in the open rate database's shape, where that shape can hold it, with notes on the
 * rest: riders, taxes, holidays priced as weekends (the database's schedules know no holidays), a second
 * energy charge, windows between whole hours (written hour by hour), a currency other than US dollars.
 * Importing what this writes gives the tariff back (the round trip is tested).
 */
export function urdbFromTariff(tariff: Tariff, meta: UrdbMeta = {}): UrdbExport {
	const notes: ExportNote[] = [];
	if (tariff.currency !== 'USD')
		notes.push({
			field: 'currency',
			message: `Prices in ${tariff.currency} were written as they are; the database's rates are in US dollars`
		});
	if (tariff.holidaysAsWeekends)
		notes.push({
			field: 'holidaysAsWeekends',
			message: 'Holidays priced as weekends: not written (the database has no holidays)'
		});
	for (const rider of tariff.riders)
		notes.push({ field: 'riders', message: `Rider "${rider.label}": not written` });
	for (const tax of tariff.taxes) notes.push({ field: 'taxes', message: `Tax "${tax.label}": not written` });
	for (const extra of tariff.energyCharges.slice(1))
		notes.push({
			field: 'energyCharges',
			message: `Energy charge "${extra.label}": not written (the database has one energy charge)`
		});
	const energy = tariff.energyCharges[0];
	const rate: Record<string, unknown> = {
		...(meta.label ? { label: meta.label } : {}),
		...(meta.utility ? { utility: meta.utility } : {}),
		...(meta.name ? { name: meta.name } : {}),
		...(meta.sector ? { sector: meta.sector } : {}),
		...(meta.source ? { source: meta.source } : {}),
		...(meta.startDate ? { startdate: seconds(meta.startDate) } : {}),
		...(meta.endDate ? { enddate: seconds(meta.endDate) } : {}),
		...(energy ? energyFields(energy, notes) : {}),
		...demandFields(tariff.demandCharges, notes),
		...fixedFields(tariff, notes),
		...minimumFields(tariff, notes)
	};
	const unique = [...new Map(notes.map((n) => [`${n.field}|${n.message}`, n])).values()];
	return { rate, notes: unique };
}
