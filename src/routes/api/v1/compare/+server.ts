import { json } from '@sveltejs/kit';
import { compare, compareRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import { comparisonFromQuery } from '$lib/server/compare/request';
import type { RequestHandler } from './$types';

/** POST /api/v1/compare — scenarios over 12 calendar months, with finance and CO₂. */
export const POST: RequestHandler = (event) => calculationEndpoint(event, compareRequestSchema, compare);

/**
 * GET /api/v1/compare?scenarios=a,b&baseline=a&start=2027-01&horizon=10&discount=5&escalation=2&factor=0.4
 * — stored scenarios the caller may read, compared; 404 for any the caller may not read.
 */
export const GET: RequestHandler = async (event) => {
	const found = await comparisonFromQuery(event);
	if (!found.ok) return found.response;
	return json(found.comparison.report, { headers: { 'Cache-Control': 'private, no-store' } });
};
