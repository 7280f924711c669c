import { calculateAcrossVersions } from '$lib/calc';
import { calculationEndpoint } from '$lib/server/http/calculation';
import { calculateBodySchema } from '$lib/server/tariffs/request-body';
import { requestWithVersions } from '$lib/server/tariffs/request-tariff';
import type { RequestHandler } from './$types';

/** POST /api/v1/calculate — the calculation contract (see /rules). Anonymous requests are rate limited;
 * with a session, `tariffId` (and `tariffVersion`) may name a library tariff instead of an inline one.
 * Every request is calculated across its tariff's versions; an inline tariff is one open-ended version,
 * so its answer names no versions. */
export const POST: RequestHandler = (event) =>
	calculationEndpoint(event, calculateBodySchema, async (body) => {
		const { request, versions, inline } = await requestWithVersions(event, body);
		const { versions: used, ...result } = calculateAcrossVersions(request, versions);
		return inline ? result : { ...result, versions: used };
	});
