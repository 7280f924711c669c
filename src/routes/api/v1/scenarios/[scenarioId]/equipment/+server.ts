import { json } from '@sveltejs/kit';
import { parseRequest } from '$lib/calc';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices, saveDevices } from '$lib/server/sites/equipment.service';
import { StaleWrite } from '$lib/server/sites/site.service';
import { equipmentListSchema, newDeviceRowSchema } from '$lib/server/sites/device-specs';
import { conflict, invalid, methodNotAllowed } from '$lib/server/http/answers';
import { writeList } from '$lib/server/sites/equipment-rows';
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

/**
 * POST `{ expectedRevision, device, position? }` — adds one device at `position` (0 = first), or at the
 * end. Answers 201 with the new revision and the device's position; a stale revision gets 409.
 */
export const POST: RequestHandler = async (event) => {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(newDeviceRowSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const { expectedRevision, device } = parsed.data;
	if (expectedRevision !== access.scenario.revision) return conflict(access.scenario.revision);
	const list = (await listDevices(access.scenario.id)).map((d) => d.spec);
	const position = parsed.data.position ?? list.length;
	if (position > list.length)
		return invalid([{ path: 'position', message: `Position must be from 0 to ${list.length}` }]);
	list.splice(position, 0, device);
	const written = await writeList(access, expectedRevision, list, position);
	if (!written.ok) return written.response;
	return json(
		{ revision: written.revision, position },
		{
			status: 201,
			headers: { Location: `/api/v1/scenarios/${access.scenario.id}/equipment/${position}` }
		}
	);
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'POST', 'PUT');
