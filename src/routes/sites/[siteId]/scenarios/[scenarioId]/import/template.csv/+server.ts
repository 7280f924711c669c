import { download } from '$lib/server/exports/download';
import { requireScenarioAccess } from '$lib/server/guard';
import { equipmentTemplateCsv } from '$lib/server/sites/equipment-sheet/write';
import type { RequestHandler } from './$types';

/** The column layout with invented example rows, beside the import form of the scenario. */
export const GET: RequestHandler = async (event) => {
	await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	return download(equipmentTemplateCsv(), 'runrate-equipment-template', 'csv');
};
