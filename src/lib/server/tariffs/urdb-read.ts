// One rate of the open rate database (OpenEI URDB), as the single-rate endpoint and the import page read it.
import {
	parseRequest,
	tariffFromUrdb,
	tariffSchema,
	unstorableMessage,
	urdbRateSchema,
	type ImportNote,
	type RequestIssue,
	type TariffInput
} from '$lib/calc';
import { logger } from '../log';
import { issueInWords } from './urdb-issue-words';

/** The largest rate the single-rate import reads: 2 MB (the largest real rates are a few hundred kB). */
export const MAX_URDB_BYTES = 2 * 1024 * 1024;

/** What the import says of a rate: the database's own fields, unchanged (dates are its Unix seconds). */
export type UrdbMeta = ReturnType<typeof tariffFromUrdb>['meta'];

/** The rate, converted; or refused with the notes saying why; or not a rate Runrate can read. */
export type UrdbReading =
	| { kind: 'converted'; tariff: TariffInput; meta: UrdbMeta; notes: ImportNote[]; rate: UrdbRateFields }
	| { kind: 'refused'; meta: UrdbMeta; notes: ImportNote[]; rate: UrdbRateFields }
	| { kind: 'unreadable'; message: string; issues: RequestIssue[] };

/** The fields of the rate the provenance needs besides the import's meta. */
export type UrdbRateFields = {
	label?: string;
	uri?: string;
	startdate?: number;
	enddate?: number;
	description?: unknown;
};

export const REFUSED = 'This rate cannot be priced exactly by Runrate';

const unreadable = (message: string, issues: RequestIssue[] = []): UrdbReading => ({
	kind: 'unreadable',
	message,
	issues
});

/** The one rate of a body: a rate object, or the database API's answer `{ "items": [ rate ] }`. */
function oneRate(body: unknown): { rate: unknown; base: string } | UrdbReading {
	if (Array.isArray(body))
		return unreadable('Send one rate object, not a list. The curator imports many rates at once.');
	if (body === null || typeof body !== 'object')
		return unreadable('Send one rate of the open rate database.');
	if (!('items' in body)) return { rate: body, base: '' };
	const { items } = body as { items: unknown };
	if (!Array.isArray(items)) return unreadable('"items" must be a list holding one rate.');
	if (items.length === 0) return unreadable('"items" holds no rate. Send the answer for one rate.');
	if (items.length > 1)
		return unreadable(
			`"items" holds ${items.length.toLocaleString('en-US')} rates; this import takes one at a time.`
		);
	return { rate: items[0], base: 'items.0.' };
}

/**
 * Reads one rate: unwraps `{ items: [rate] }`, checks it with the core's URDB schema (problems in words,
 * each saying where), converts it, and checks the converted tariff with the tariff schema before anyone
 * sees it. A rate the core cannot price exactly is refused with its notes, never priced wrongly.
 */
export function readUrdbRate(body: unknown): UrdbReading {
	const one = oneRate(body);
	if ('kind' in one) return one;
	const parsed = parseRequest(urdbRateSchema, one.rate);
	if (!parsed.success)
		return unreadable(
			'This rate has problems, so Runrate did not read it.',
			parsed.error.issues.map((issue) => ({
				path: `${one.base}${issue.path}`,
				message: issueInWords(issue)
			}))
		);
	const rate = parsed.data as UrdbRateFields;
	// The label is looked up and stored as it is: text PostgreSQL cannot hold is refused here, by its field.
	const unstorable = rate.label === undefined ? null : unstorableMessage(rate.label);
	if (unstorable)
		return unreadable('This rate has problems, so Runrate did not read it.', [
			{ path: `${one.base}label`, message: `Label: ${unstorable}` }
		]);
	const { tariff, meta, notes } = tariffFromUrdb(parsed.data);
	if (!tariff) return { kind: 'refused', meta, notes, rate };
	if (!tariff.energyCharges?.length && !tariff.fixedCharges?.length && tariff.minimumMonthly == null)
		return unreadable(
			'This holds none of a rate’s charges (no energy rate structure, no fixed charge): is it a rate of the open rate database?'
		);
	const checked = tariffSchema.safeParse(tariff);
	if (!checked.success) {
		// The core's conversion should never build a tariff its own schema refuses; if it does, refuse.
		logger.error(
			{ issues: checked.error.issues.slice(0, 5), label: meta.label },
			'URDB import built an invalid tariff'
		);
		return {
			kind: 'refused',
			meta,
			rate,
			notes: [
				...notes,
				{ code: 'not-valid', field: '', message: 'The converted charges did not pass Runrate’s own checks' }
			]
		};
	}
	return { kind: 'converted', tariff, meta, notes, rate };
}
