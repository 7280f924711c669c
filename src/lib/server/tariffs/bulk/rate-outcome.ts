import { parseRequest, tariffFromUrdb, urdbDate, urdbRateSchema, type RequestIssue } from '$lib/calc';
import { tariffSubmissionSchema, type TariffSubmission } from '../submission';
import { urdbSubmission } from '../urdb-provenance';
import type { UrdbRateFields } from '../urdb-read';
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

/** The library's length of a name (tariff-meta.schema.ts): a longer one is shortened, with a note. */
const NAME_CHARS = 120;

const textOf = (value: unknown) => (typeof value === 'string' ? value.trim() : '');

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
	if (!urdbDate(parsed.data.startdate))
		return skip(['The rate has no start date, so Runrate cannot tell from when it applies']);
	// The single-rate import's submission: provenance, customer class, description and what was not taken.
	const built = urdbSubmission(
		{
			tariff: converted.tariff,
			meta: converted.meta,
			notes: converted.notes,
			rate: parsed.data as UrdbRateFields
		},
		{ timezone: filters.timezone },
		checkedOn
	);
	if (textOf(converted.meta.utility).length > NAME_CHARS)
		notes.push(`The utility’s name was shortened to ${NAME_CHARS} characters`);
	if (textOf(converted.meta.name).length > NAME_CHARS)
		notes.push(`The rate’s name was shortened to ${NAME_CHARS} characters`);
	const submission = parseRequest(tariffSubmissionSchema, built);
	if (!submission.success) return skip(submission.error.issues.map((issue) => issue.message));
	return { kind: 'ready', label, name: submission.data.meta.name, submission: submission.data, notes };
}
