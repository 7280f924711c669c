import { parseRequest, tariffFromUrdb, urdbRateSchema, type RequestIssue } from '$lib/calc';
import type { CustomerClass } from '$lib/forms/tariff-meta.schema';
import { tariffSubmissionSchema, type TariffSubmission } from '../submission';
import type { BulkFilters } from './bulk-options';

/**
 * What the bulk import does with one rate of the file, before anything is saved: passed over by the
 * admin's filters, refused (invalid, or not expressible) with its reasons in words, or ready to save as
 * a public tariff with its provenance. Pure apart from the clock: the job saves what is ready.
 */

export type RateOutcome =
	| { kind: 'filtered'; by: 'sector' | 'utility' }
	| { kind: 'skipped'; label: string | null; name: string | null; reasons: string[] }
	| { kind: 'ready'; label: string; name: string; submission: TariffSubmission; notes: string[] };

/** The open rate database's sectors as Runrate's customer classes (street lighting has none of its own). */
const CLASS_OF_SECTOR: Record<string, CustomerClass> = {
	residential: 'residential',
	commercial: 'commercial',
	industrial: 'industrial',
	agricultural: 'agricultural'
};

/** Lengths the tariff library keeps (tariff-meta.schema.ts): longer names are shortened, with a note. */
const NAME_CHARS = 120;
const SOURCE_CHARS = 500;

const textOf = (value: unknown) => (typeof value === 'string' ? value.trim() : '');

const DAY_SECONDS = 86_400;

/**
 * The calendar date a database timestamp stands for, or null when absent or off the calendar. The
 * database keeps dates as Unix seconds at about midnight of the zone they were entered in (RS-1's end is
 * 23:00 UTC the day before), so the nearest UTC midnight gives the date as entered: the same rule as the
 * single-rate import's provenance.
 */
function isoDay(seconds: unknown): string | null {
	if (typeof seconds !== 'number' || !Number.isFinite(seconds)) return null;
	const date = new Date(Math.round(seconds / DAY_SECONDS) * DAY_SECONDS * 1000);
	const year = date.getUTCFullYear();
	return Number.isNaN(year) || year < 1900 || year > 9999 ? null : date.toISOString().slice(0, 10);
}

const SECTION: Record<string, string> = {
	energyratestructure: 'Energy rates',
	energyweekdayschedule: 'Weekday schedule',
	energyweekendschedule: 'Weekend schedule'
};

/** A schema issue in words: where it is (period and tier, month and hour) and what is wrong. */
export function issueInWords(issue: RequestIssue): string {
	const [head = '', ...rest] = issue.path.split('.');
	const section = SECTION[head];
	if (!section) return issue.message;
	const parts = head === 'energyratestructure' ? ['period', 'tier'] : ['month', 'hour'];
	const where = rest
		.filter((part) => /^\d+$/.test(part))
		.slice(0, 2)
		.map((n, i) => `${parts[i]} ${head === 'energyratestructure' || i === 0 ? Number(n) + 1 : n}`);
	return `${[section, ...where].join(', ')}: ${issue.message}`;
}

/** Whether the admin's filters let this rate through, read from the raw object (before validation). */
export function filteredBy(rate: unknown, filters: BulkFilters): 'sector' | 'utility' | null {
	const fields = (rate && typeof rate === 'object' ? rate : {}) as Record<string, unknown>;
	const sector = textOf(fields.sector).toLowerCase();
	if (filters.sectors.length && !filters.sectors.some((s) => s.toLowerCase() === sector)) return 'sector';
	const utility = filters.utilityContains.trim().toLowerCase();
	if (utility && !textOf(fields.utility).toLowerCase().includes(utility)) return 'utility';
	return null;
}

const shortened = (text: string, max: number, notes: string[], what: string) => {
	if (text.length <= max) return text;
	notes.push(`The ${what} was shortened to ${max} characters`);
	return `${text.slice(0, max - 1)}…`;
};

/** One rate of the file: filtered, skipped with its reasons, or ready to save. */
export function rateOutcome(rate: unknown, filters: BulkFilters, checkedOn: string): RateOutcome {
	const by = filteredBy(rate, filters);
	if (by) return { kind: 'filtered', by };
	const raw = (rate && typeof rate === 'object' ? rate : {}) as Record<string, unknown>;
	const label = textOf(raw.label) || null;
	const name = textOf(raw.name) || null;
	const skip = (reasons: string[]): RateOutcome => ({ kind: 'skipped', label, name, reasons });
	if (!rate || typeof rate !== 'object' || Array.isArray(rate))
		return skip(['This entry of the list is not a rate (a JSON object)']);
	const parsed = parseRequest(urdbRateSchema, rate);
	if (!parsed.success) return skip(parsed.error.issues.map(issueInWords));
	if (!label) return skip(['The rate has no label, so a later import could not tell it is already present']);
	const converted = tariffFromUrdb(parsed.data);
	const notes = converted.notes.map((n) => n.message);
	if (!converted.tariff) return skip(notes.length ? notes : ['Its charges cannot be expressed in Runrate']);
	const effectiveFrom = isoDay(raw.startdate);
	if (!effectiveFrom)
		return skip(['The rate has no start date, so Runrate cannot tell from when it applies']);
	const utility = shortened(textOf(raw.utility) || 'Unnamed utility', NAME_CHARS, notes, 'utility’s name');
	const tariffName = shortened(name ?? label, NAME_CHARS, notes, 'rate’s name');
	const uri = textOf(raw.uri);
	const source =
		uri && uri.length <= SOURCE_CHARS ? uri : `OpenEI Utility Rate Database, label ${label.slice(0, 200)}`;
	const submission = parseRequest(tariffSubmissionSchema, {
		meta: {
			utility,
			name: tariffName,
			code: null,
			country: 'US',
			region: null,
			area: null,
			customerClass: CLASS_OF_SECTOR[textOf(raw.sector).toLowerCase()] ?? 'other',
			currency: 'USD',
			timezone: filters.timezone,
			holidays: null,
			description: null
		},
		version: {
			effectiveFrom,
			effectiveTo: isoDay(raw.enddate),
			source,
			checkedOn,
			changeNote: 'Imported from the OpenEI Utility Rate Database'
		},
		structure: converted.tariff
	});
	if (!submission.success) return skip(submission.error.issues.map((issue) => issue.message));
	return { kind: 'ready', label, name: tariffName, submission: submission.data, notes };
}
