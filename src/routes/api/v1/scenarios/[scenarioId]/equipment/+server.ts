import { json } from '@sveltejs/kit';
import { parseRequest } from '$lib/calc';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { equipmentListSchema, newDeviceRowSchema } from '$lib/server/sites/device-specs';
import { invalid, methodNotAllowed, refusal } from '$lib/server/http/answers';
import { editEquipmentRow, saveEquipment } from '$lib/server/sites/equipment-edits';
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
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(equipmentListSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const saved = await saveEquipment(access, parsed.data.expectedRevision, parsed.data.devices);
	if (!saved.ok) return refusal(saved);
	return json({ revision: saved.revision }, { status: 200 });
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
	const { expectedRevision, device, position } = parsed.data;
	const written = await editEquipmentRow(access, expectedRevision, { kind: 'add', device, position });
	if (!written.ok) return refusal(written);
	return json(
		{ revision: written.revision, position: written.position },
		{
			status: 201,
			headers: { Location: `/api/v1/scenarios/${access.scenario.id}/equipment/${written.position}` }
		}
	);
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'POST', 'PUT');
