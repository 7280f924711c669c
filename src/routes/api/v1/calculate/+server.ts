import { calculate, calculateAcrossVersions, calculateRequestSchema } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import type { RequestHandler } from './$types';

/** POST /api/v1/calculate — the calculation contract (see /rules). Anonymous requests are rate limited;
 * with a session, `tariffId` (and `tariffVersion`) may name a library tariff instead of an inline one. */
export const POST: RequestHandler = (event) =>
	calculationEndpoint(event, calculateRequestSchema, (request, versions) =>
		versions ? calculateAcrossVersions(request, versions) : calculate(request)
	);
