import { requireSiteAccess } from '$lib/server/guard';
import { cheapestTariffs } from '$lib/server/tariffs/cheapest';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site, role, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return { cheapest: await cheapestTariffs(site, viaGrant), canImport: role !== 'viewer' };
}) satisfies PageServerLoad;
