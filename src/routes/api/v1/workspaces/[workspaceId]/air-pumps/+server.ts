import { json } from '@sveltejs/kit';
import { airPumpSchema, parseRequest } from '$lib/calc';
import { requireRole } from '$lib/server/guard';
import { PRIVATE, invalid, methodNotAllowed } from '$lib/server/http/answers';
import { readJsonBody } from '$lib/server/http/body';
import { apiError } from '$lib/server/http/json';
import {
	airPumpJson,
	createAirPump,
	findAirPump,
	listAirPumps,
	MAX_AIR_PUMPS
} from '$lib/server/workspaces/air-pumps';
import type { RequestHandler } from './$types';

/** GET — the workspace's own air pumps, by name. */
export const GET: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'viewer');
	return json({ airPumps: (await listAirPumps(workspace.id)).map(airPumpJson) }, { headers: PRIVATE });
};

/** POST — a pump from its data sheet: name, 2–20 points (kPa gauge, L/min free air), input watts or wire-to-air %. */
export const POST: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(airPumpSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const created = await createAirPump(workspace.id, parsed.data);
	if (created === 'full')
		return apiError(
			409,
			'too_many',
			`A workspace keeps at most ${MAX_AIR_PUMPS} air pumps; delete one first.`
		);
	const stored = await findAirPump(workspace.id, created.id);
	return json(airPumpJson(stored!), {
		status: 201,
		headers: { ...PRIVATE, Location: `/api/v1/workspaces/${workspace.id}/air-pumps/${created.id}` }
	});
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'POST');
