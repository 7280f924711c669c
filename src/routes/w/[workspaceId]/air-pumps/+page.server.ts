import { fail } from '@sveltejs/kit';
import { requireRole } from '$lib/server/guard';
import { pumpFormValues, readPumpForm } from '$lib/server/workspaces/air-pump-form';
import {
	createAirPump,
	deleteAirPump,
	listAirPumps,
	MAX_AIR_PUMPS,
	updateAirPump
} from '$lib/server/workspaces/air-pumps';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	const pumps = await listAirPumps(workspace.id);
	return {
		pumps: pumps.map((stored) => ({ ...stored, values: pumpFormValues(stored.pump) })),
		canEdit: role !== 'viewer'
	};
}) satisfies PageServerLoad;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const gone = (action: string) =>
	fail(404, { action, errors: { form: 'This pump is no longer in the workspace; reload the page.' } });

export const actions = {
	create: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
		const read = readPumpForm(await event.request.formData());
		if (!read.ok) return fail(400, { action: 'create', errors: read.errors, values: read.values });
		const created = await createAirPump(workspace.id, read.pump);
		if (created === 'full') {
			const form = `A workspace keeps at most ${MAX_AIR_PUMPS} air pumps; delete one first.`;
			return fail(409, { action: 'create', errors: { form }, values: read.values });
		}
		return { action: 'create', ok: true, saved: read.pump.name };
	},

	update: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
		const form = await event.request.formData();
		const pumpId = String(form.get('pumpId') ?? '');
		const read = readPumpForm(form);
		if (!read.ok) return fail(400, { action: 'update', pumpId, errors: read.errors, values: read.values });
		if (!(await updateAirPump(workspace.id, pumpId, read.pump))) return gone('update');
		return { action: 'update', ok: true, saved: read.pump.name };
	},

	delete: async (event) => {
		const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
		const pumpId = String((await event.request.formData()).get('pumpId') ?? '');
		if (!UUID.test(pumpId))
			return fail(400, { action: 'delete', errors: { form: 'Choose a pump to delete.' } });
		if (!(await deleteAirPump(workspace.id, pumpId))) return gone('delete');
		return { action: 'delete', ok: true };
	}
} satisfies Actions;
