import { error } from '@sveltejs/kit';
import { requireSiteAccess } from '$lib/server/guard';
import { findScenario, listScenarios } from '$lib/server/sites/scenario.service';
import { cheapestForScenario, cheapestTariffs } from '$lib/server/tariffs/cheapest';
import type { PageServerLoad } from './$types';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const load = (async (event) => {
	const { site, role, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const scenarioId = event.url.searchParams.get('scenario') || null;
	// A scenario of another site (or none) is not found here, whatever its id: access follows the site.
	const scenario = scenarioId && UUID.test(scenarioId) ? await findScenario(scenarioId) : null;
	if (scenarioId && (!scenario || scenario.siteId !== site.id || scenario.deletedAt)) error(404, 'Not found');
	const scenarios = (await listScenarios(site.id)).filter((s) => !s.deletedAt && !s.archivedAt);
	return {
		cheapest: scenario
			? await cheapestForScenario(site, viaGrant, scenario)
			: await cheapestTariffs(site, viaGrant),
		scenarioId: scenario?.id ?? null,
		scenarios: scenarios.map((s) => ({ id: s.id, name: s.name })),
		canImport: role !== 'viewer'
	};
}) satisfies PageServerLoad;
