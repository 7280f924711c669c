import { json } from '@sveltejs/kit';
import { parseRequest } from '$lib/calc';
import { apiError, readJsonBody } from '$lib/server/api';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices, saveDevices, StaleWrite } from '$lib/server/services/site.service';
import { equipmentListSchema } from '$lib/server/sites/device-specs';
import type { RequestHandler } from './$types';

/** GET — the scenario's equipment list, in order, with the revision to send back when saving. */
export const GET: RequestHandler = async (event) => {
	const { scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	const devices = await listDevices(scenario.id);
	return json(
		{ revision: scenario.revision, devices: devices.map((d) => d.spec) },
		{ headers: { 'Cache-Control': 'private, no-store' } }
	);
};

/** PUT — replace the whole list (order included). A stale `expectedRevision` gets 409 and nothing is written. */
export const PUT: RequestHandler = async (event) => {
	const { site, scenario, user } = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(equipmentListSchema, read.body);
	if (!parsed.success)
		return json({ ...parsed.error, message: 'Some fields need attention.' }, { status: 400 });
	try {
		const revision = await saveDevices(
			site,
			scenario,
			parsed.data.expectedRevision,
			parsed.data.devices,
			user
		);
		return json({ revision }, { status: 200 });
	} catch (e) {
		if (e instanceof StaleWrite)
			return json(
				{ error: 'conflict', message: e.message, currentRevision: e.currentRevision },
				{ status: 409 }
			);
		throw e;
	}
};

export const fallback: RequestHandler = () => apiError(405, 'method_not_allowed', 'Use GET or PUT.');
