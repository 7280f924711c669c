import { requireSiteAccess } from '$lib/server/guard';
import { siteWorkspace } from '$lib/server/sites/site.service';
import type { LayoutServerLoad } from './$types';

export const load = (async (event) => {
	const { site, role, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const ws = await siteWorkspace(site);
	return {
		// A guest of one site sees the site, not the workspace around it.
		workspace: viaGrant ? undefined : ws,
		site: {
			id: site.id,
			name: site.name,
			address: site.address,
			timezone: site.timezone,
			country: site.country,
			region: site.region,
			supplyVolts: site.supplyVolts,
			supplyPhases: site.supplyPhases,
			tariffId: site.tariffId,
			tariffVersion: site.tariffVersion,
			currency: site.currency,
			notes: site.notes,
			water: site.water,
			revision: site.revision
		},
		siteRole: role,
		viaGrant
	};
}) satisfies LayoutServerLoad;
