import { requireSiteAccess } from '$lib/server/guard';
import { cheapestFromQuery } from '$lib/server/tariffs/cheapest-query';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site, role, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return {
		...(await cheapestFromQuery(site, viaGrant, event)),
		canImport: role !== 'viewer'
	};
}) satisfies PageServerLoad;
