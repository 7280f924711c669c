import { z } from 'zod';
import type { ComparisonQuery } from './types';

/**
 * The query string of a comparison (the page, the report, the JSON and the exports share it):
 * `scenarios=a,b,c&baseline=a&start=2027-01&horizon=10&discount=5&escalation=2&factor=0.4&source=…`.
 */
export const MAX_COMPARED = 6;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const number = (label: string, min: number, max: number, integer = false) =>
	z.coerce
		.number({ error: `${label} must be a number` })
		.refine((n) => Number.isFinite(n), `${label} must be a number`)
		.refine((n) => !integer || Number.isInteger(n), `${label} must be a whole number`)
		.refine((n) => n >= min && n <= max, `${label} must be from ${min} to ${max}`);

export const comparisonQuerySchema = z
	.object({
		scenarios: z
			.string({ error: 'Pick the scenarios to compare' })
			.transform((text) => [
				...new Set(
					text
						.split(',')
						.map((id) => id.trim())
						.filter(Boolean)
				)
			])
			.pipe(
				z
					.array(z.string().regex(UUID, 'A scenario in the list is not a scenario id'))
					.min(2, 'Pick at least two scenarios to compare')
					.max(
						MAX_COMPARED,
						`Pick at most ${MAX_COMPARED} scenarios: a comparison shows up to ${MAX_COMPARED}`
					)
			),
		baseline: z.string().optional(),
		start: z
			.string()
			.regex(/^\d{4}-(0[1-9]|1[0-2])$/, 'First month must be a month such as 2027-01')
			.optional(),
		horizon: number('Horizon', 1, 50, true).default(10),
		discount: number('Discount rate', 0, 100).default(5),
		escalation: number('Escalation rate', -50, 100).default(2),
		factor: number('Emission factor', 0, 5).default(0),
		source: z.string().max(300, 'Keep the source under 300 characters').default('')
	})
	.superRefine((q, ctx) => {
		if (q.baseline && !q.scenarios.includes(q.baseline))
			ctx.addIssue({
				code: 'custom',
				path: ['baseline'],
				message: 'The baseline must be one of the scenarios compared'
			});
	});

export type QueryIssue = { path: string; message: string };

/** January of `today`'s year, as "2026-01": the same twelve months the site pages estimate. */
export const defaultStart = (today: string) => `${today.slice(0, 4)}-01`;

export function parseComparisonQuery(
	params: URLSearchParams,
	today: string
): { ok: true; query: ComparisonQuery } | { ok: false; issues: QueryIssue[] } {
	// A form sends one `scenarios` per ticked box; a link sends one comma-separated value.
	const raw: Record<string, string> = Object.fromEntries([...params].filter(([, value]) => value !== ''));
	if (params.has('scenarios')) raw.scenarios = params.getAll('scenarios').join(',');
	const parsed = comparisonQuerySchema.safeParse(raw);
	if (!parsed.success) {
		return {
			ok: false,
			issues: parsed.error.issues.map((i) => ({ path: String(i.path[0] ?? ''), message: i.message }))
		};
	}
	const q = parsed.data;
	return {
		ok: true,
		query: {
			scenarios: q.scenarios,
			baseline: q.baseline ?? q.scenarios[0]!,
			start: q.start ?? defaultStart(today),
			horizonYears: q.horizon,
			discountPercent: q.discount,
			escalationPercent: q.escalation,
			emissionKgPerKwh: q.factor,
			emissionSource: q.source.trim()
		}
	};
}

/** The query string of a comparison, for links to the report and the exports. */
export function comparisonSearch(query: ComparisonQuery): string {
	return new URLSearchParams({
		scenarios: query.scenarios.join(','),
		baseline: query.baseline,
		start: query.start,
		horizon: String(query.horizonYears),
		discount: String(query.discountPercent),
		escalation: String(query.escalationPercent),
		factor: String(query.emissionKgPerKwh),
		source: query.emissionSource
	}).toString();
}
