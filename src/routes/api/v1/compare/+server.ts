import { json } from '@sveltejs/kit';
import { compare } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import { comparisonFromQuery } from '$lib/server/compare/request';
import { compareBodySchema } from '$lib/server/tariffs/request-body';
import { requestWithVersions } from '$lib/server/tariffs/request-tariff';
import type { RequestHandler } from './$types';

/** POST /api/v1/compare — scenarios over 12 calendar months, with finance and CO₂; a library tariff is
 * priced on its version in force when the period starts. */
export const POST: RequestHandler = (event) =>
	calculationEndpoint(event, compareBodySchema, async (body) =>
		compare((await requestWithVersions(event, body)).request)
	);

/**
 * GET /api/v1/compare?scenarios=a,b&baseline=a&start=2027-01&horizon=10&discount=5&escalation=2&factor=0.4
 * — stored scenarios the caller may read, compared; 404 for any the caller may not read.
 */
export const GET: RequestHandler = async (event) => {
	const found = await comparisonFromQuery(event);
	if (!found.ok) return found.response;
	return json(found.comparison.report, { headers: { 'Cache-Control': 'private, no-store' } });
};
