import { requireSiteAccess } from '$lib/server/guard';
import { siteWorkspace } from '$lib/server/sites/site.service';
import type { PageServerLoad } from './$types';

/**
 * Where a confirmed sign-up that carried a quick estimate lands: it says that the estimate is now the
 * site, and what came of its rate. The site is read through the guard like any other.
 */
export const load = (async (event) => {
	const { site } = await requireSiteAccess(event, event.url.searchParams.get('site') ?? '', 'viewer');
	const workspace = await siteWorkspace(site);
	return {
		site: { id: site.id, name: site.name, timezone: site.timezone },
		workspace,
		rate: site.tariffId ? 'tariff' : site.notes ? 'flat' : 'unavailable'
	};
}) satisfies PageServerLoad;
