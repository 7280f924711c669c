import { authorOf } from '$lib/compare/printed';
import { requireSiteAccess } from '$lib/server/guard';
import { cheapestFromQuery } from '$lib/server/tariffs/cheapest-query';
import type { PageServerLoad } from './$types';

/** The cheapest-tariff answer ready to print, for anyone who may read the site (guests too). */
export const load = (async (event) => {
	const { site, user, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return {
		...(await cheapestFromQuery(site, viaGrant, event)),
		author: authorOf(user),
		printedAt: new Date().toISOString()
	};
}) satisfies PageServerLoad;
