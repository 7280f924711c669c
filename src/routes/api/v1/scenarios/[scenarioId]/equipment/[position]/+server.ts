import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { parseRequest } from '$lib/calc';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess } from '$lib/server/guard';
import { listDevices } from '$lib/server/sites/equipment.service';
import { deviceRowSchema } from '$lib/server/sites/device-specs';
import { invalid, methodNotAllowed, notFound, PRIVATE, refusal } from '$lib/server/http/answers';
import { editEquipmentRow, positionOf } from '$lib/server/sites/equipment-edits';
import type { RequestHandler } from './$types';

const NO_DEVICE = 'There is no device at this position.';

const revisionQuery = z.object({
	expectedRevision: z
		.string({ error: 'Send the revision you edited (?expectedRevision=…)' })
		.regex(/^\d{1,9}$/, 'Send the revision you edited (?expectedRevision=…)')
		.transform(Number)
});

/** GET — the device at this position of the list (0 = first), with the list's revision. */
export const GET: RequestHandler = async (event) => {
	const { scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	const position = positionOf(event.params.position);
	const devices = await listDevices(scenario.id);
	const device = position === null ? undefined : devices[position];
	if (position === null || !device) return notFound(NO_DEVICE);
	return json({ revision: scenario.revision, position, device: device.spec }, { headers: PRIVATE });
};

/** PUT `{ expectedRevision, device }` — replaces the device at this position; a stale revision gets 409. */
export const PUT: RequestHandler = async (event) => {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const position = positionOf(event.params.position);
	if (position === null) return notFound(NO_DEVICE);
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(deviceRowSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const { expectedRevision, device } = parsed.data;
	const written = await editEquipmentRow(access, expectedRevision, { kind: 'replace', device, position });
	if (!written.ok) return refusal(written, NO_DEVICE);
	return json({ revision: written.revision, position }, { status: 200 });
};

/** DELETE `?expectedRevision=N` — removes the device at this position; the ones after it move up. */
export const DELETE: RequestHandler = async (event) => {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const position = positionOf(event.params.position);
	if (position === null) return notFound(NO_DEVICE);
	const query = parseRequest(revisionQuery, Object.fromEntries(event.url.searchParams));
	if (!query.success) return invalid(query.error.issues);
	const removed = await editEquipmentRow(access, query.data.expectedRevision, { kind: 'remove', position });
	if (!removed.ok) return refusal(removed, NO_DEVICE);
	return new Response(null, { status: 204 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT', 'DELETE');
