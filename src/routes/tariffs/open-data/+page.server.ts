import { error, fail, redirect } from '@sveltejs/kit';
import { requireAdmin, requireRole, requireUser } from '$lib/server/guard';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { workspaceIdsOf } from '$lib/server/tariffs/tariff.service';
import { MAX_URDB_BYTES } from '$lib/server/tariffs/urdb-read';
import { postedForm, previewOf, readRate } from '$lib/server/tariffs/urdb-form';
import { importedCopies } from '$lib/server/tariffs/urdb-save';
import { saveImportedRate } from '$lib/server/tariffs/urdb-save-form';
import { US_TIME_ZONES } from '$lib/forms/urdb-import.schema';
import type { Actions, PageServerLoad } from './$types';

async function ownerChoices(user: SessionUser) {
	const workspaces = (await listWorkspacesFor(user.id)).filter((w) => w.role !== 'viewer');
	return [
		...workspaces.map((w) => ({ value: w.id, label: `${w.name} (private to the workspace)` })),
		...(user.isAdmin ? [{ value: 'public', label: 'The public library (everyone can use it)' }] : [])
	];
}

export const load = (async (event) => {
	const owners = await ownerChoices(requireUser(event));
	if (owners.length === 0) error(403, 'Importing a tariff needs the editor role in a workspace.');
	return { owners, zones: US_TIME_ZONES, maxMb: MAX_URDB_BYTES / 1024 / 1024 };
}) satisfies PageServerLoad;

export const actions = {
	read: async (event) => {
		const user = requireUser(event);
		const form = await postedForm(event);
		if (!(form instanceof FormData)) return form;
		const posted = await readRate(form);
		if (!('reading' in posted)) return posted;
		const { label } = posted.reading.rate;
		// Where the person's library already holds this rate: a link, before they save a second copy.
		const copies = label ? await importedCopies(label, await workspaceIdsOf(user.id)) : [];
		return { json: posted.json, preview: previewOf(posted.reading), copies };
	},
	save: async (event) => {
		requireUser(event);
		const form = await postedForm(event);
		if (!(form instanceof FormData)) return form;
		const owner = String(form.get('owner') ?? '');
		if (!owner) return fail(400, { owner, errors: { owner: 'Pick where the tariff goes.' } });
		// The guard decides, where the tariff is written: editors of that workspace, or admins for public.
		const author =
			owner === 'public' ? requireAdmin(event) : (await requireRole(event, owner, 'editor')).user;
		const posted = await readRate(form);
		if (!('reading' in posted)) return posted;
		const { json, reading } = posted;
		const outcome = await saveImportedRate(reading, form, owner === 'public' ? null : owner, author);
		if ('saved' in outcome) redirect(303, `/tariffs/${outcome.saved}?published=1`);
		return fail(outcome.status, { json, preview: previewOf(reading), owner, ...outcome.data });
	}
} satisfies Actions;
