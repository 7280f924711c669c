import { error, fail } from '@sveltejs/kit';
import { requireUser } from '$lib/server/guard';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { tariffFormAction } from '$lib/server/tariffs/form-action';
import { jsonField, unstorableIn } from '$lib/forms/storable';
import type { Actions, PageServerLoad } from './$types';

async function ownerChoices(user: SessionUser) {
	const workspaces = (await listWorkspacesFor(user.id)).filter((w) => w.role !== 'viewer');
	return [
		...workspaces.map((w) => ({ value: w.id, label: `${w.name} (private to the workspace)` })),
		...(user.isAdmin ? [{ value: 'public', label: 'The public library (everyone can use it)' }] : [])
	];
}

export const load = (async (event) => {
	const user = requireUser(event);
	const owners = await ownerChoices(user);
	if (owners.length === 0) error(403, 'Adding a tariff needs the editor role in a workspace.');
	return { owners };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const user = requireUser(event);
		const form = await event.request.clone().formData();
		const owner = String(form.get('owner') ?? '');
		const owners = await ownerChoices(user);
		if (!owners.some((o) => o.value === owner)) return fail(400, { owner: 'Pick whose tariff this is.' });
		const unstorable = unstorableIn(jsonField(form.get('payload')));
		if (unstorable) return fail(400, { issues: [unstorable] });
		return tariffFormAction(event, { workspaceId: owner === 'public' ? null : owner });
	}
} satisfies Actions;
