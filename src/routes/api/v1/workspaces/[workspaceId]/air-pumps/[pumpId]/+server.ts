import { json } from '@sveltejs/kit';
import { airPumpSchema, parseRequest } from '$lib/calc';
import { requireRole } from '$lib/server/guard';
import { PRIVATE, invalid, methodNotAllowed, notFound } from '$lib/server/http/answers';
import { readJsonBody } from '$lib/server/http/body';
import { airPumpJson, deleteAirPump, findAirPump, updateAirPump } from '$lib/server/workspaces/air-pumps';
import type { RequestHandler } from './$types';

/** GET — one of the workspace's pumps. */
export const GET: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'viewer');
	const found = await findAirPump(workspace.id, event.params.pumpId);
	return found ? json(airPumpJson(found), { headers: PRIVATE }) : notFound();
};

/** PUT — the whole data sheet again. */
export const PUT: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
	if (!(await findAirPump(workspace.id, event.params.pumpId))) return notFound();
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(airPumpSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	if (!(await updateAirPump(workspace.id, event.params.pumpId, parsed.data))) return notFound();
	return json(airPumpJson((await findAirPump(workspace.id, event.params.pumpId))!), { headers: PRIVATE });
};

/** DELETE — the pump; designs that used it keep their own copy of its data sheet. */
export const DELETE: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
	if (!(await deleteAirPump(workspace.id, event.params.pumpId))) return notFound();
	return new Response(null, { status: 204 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT', 'DELETE');
