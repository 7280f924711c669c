import { error } from '@sveltejs/kit';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { needsElectricalCaution } from '$lib/cautions';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { scenario, role } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	if (scenario.siteId !== event.params.siteId) error(404, 'Not found');
	const devices = await listDevices(scenario.id);
	const specs = devices.map((d) => d.spec);
	return {
		scenario: {
			id: scenario.id,
			name: scenario.name,
			description: scenario.description,
			isBaseline: scenario.isBaseline,
			revision: scenario.revision
		},
		devices: specs,
		caution: needsElectricalCaution(specs),
		canEdit: role !== 'viewer'
	};
}) satisfies PageServerLoad;
