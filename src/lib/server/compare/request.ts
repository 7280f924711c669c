import { error, json, type RequestEvent } from '@sveltejs/kit';
import { DateTime } from 'luxon';
import { parseComparisonQuery } from '$lib/compare/query';
import { requireUser } from '$lib/server/guard';
import { type Comparison, buildComparison } from './build';

/** A comparison from a request's query string, or the JSON 400 that says which part is wrong. */
export async function comparisonFromQuery(
	event: RequestEvent
): Promise<{ ok: true; comparison: Comparison } | { ok: false; response: Response }> {
	requireUser(event);
	const today = DateTime.now().toISODate() ?? '2027-01-01';
	const parsed = parseComparisonQuery(event.url.searchParams, today);
	const invalid = (issues: { path: string; message: string }[]) => ({
		ok: false as const,
		response: json(
			{ error: 'invalid_request', message: issues[0]?.message ?? 'Check the comparison', issues },
			{ status: 400 }
		)
	});
	if (!parsed.ok) return invalid(parsed.issues);
	const built = await buildComparison(event, parsed.query);
	if (!built.ok) return invalid([{ path: built.path, message: built.message }]);
	return { ok: true, comparison: built.comparison };
}

/** For pages: the comparison or a thrown 400 page. */
export async function comparisonOrError(event: RequestEvent): Promise<Comparison> {
	const found = await comparisonFromQuery(event);
	if (found.ok) return found.comparison;
	const body = (await found.response.json()) as { message: string };
	error(400, body.message);
}
