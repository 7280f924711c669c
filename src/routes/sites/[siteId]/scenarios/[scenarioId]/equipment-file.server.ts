import { error, type RequestEvent } from '@sveltejs/kit';
import { download, safeFileName } from '$lib/server/exports/download';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { equipmentCsv, equipmentXlsx } from '$lib/server/sites/equipment-sheet/write';

/** The scenario's equipment list as the import sheet's columns; anyone who may read the site may download it. */
export async function equipmentFile(
	event: RequestEvent<{ siteId: string; scenarioId: string }>,
	kind: 'csv' | 'xlsx'
) {
	const { site, scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	if (scenario.siteId !== event.params.siteId) error(404, 'Not found');
	const specs = (await listDevices(scenario.id)).map((d) => d.spec);
	const name = safeFileName(site.name, scenario.name, 'equipment');
	if (kind === 'csv') return download(equipmentCsv(specs), name, 'csv');
	return download(new Uint8Array(await equipmentXlsx(specs, scenario.name)), name, 'xlsx');
}
