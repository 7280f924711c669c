import { error, fail, redirect, type RequestEvent } from '@sveltejs/kit';
import { requireAdmin, requireRole, requireUser } from '$lib/server/guard';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { calculationBudgetSpent } from '$lib/server/http/rate-limits';
import { uploadForm } from '$lib/server/http/upload-form';
import { TOO_MANY } from '$lib/server/rate-limit';
import { MAX_URDB_BYTES } from '$lib/server/tariffs/urdb-read';
import { postedRate, previewOf } from '$lib/server/tariffs/urdb-form';
import { saveImportedRate } from '$lib/server/tariffs/urdb-save-form';
import { US_TIME_ZONES } from '$lib/forms/urdb-import.schema';
import type { Actions, PageServerLoad } from './$types';

const MB = MAX_URDB_BYTES / 1024 / 1024;

async function ownerChoices(user: SessionUser) {
	const workspaces = (await listWorkspacesFor(user.id)).filter((w) => w.role !== 'viewer');
	return [
		...workspaces.map((w) => ({ value: w.id, label: `${w.name} (private to the workspace)` })),
		...(user.isAdmin ? [{ value: 'public', label: 'The public library (everyone can use it)' }] : [])
	];
}

/** The posted form, within the budget and the size limit. */
async function postedForm(event: RequestEvent) {
	if (await calculationBudgetSpent(event)) return fail(429, { errors: { form: TOO_MANY } });
	const form = await uploadForm(event.request);
	if (form === 'too-large') return fail(413, { errors: { file: `The file is over ${MB} MB.` } });
	return form;
}

/** Every post reads the rate again from the form (pasted or uploaded): the preview is never trusted. */
async function readRate(form: FormData) {
	const posted = await postedRate(form);
	if ('message' in posted)
		return fail(posted.status, {
			json: posted.json,
			errors: { [posted.field]: posted.message },
			issues: posted.issues
		});
	return posted;
}

export const load = (async (event) => {
	const owners = await ownerChoices(requireUser(event));
	if (owners.length === 0) error(403, 'Importing a tariff needs the editor role in a workspace.');
	return { owners, zones: US_TIME_ZONES, maxMb: MB };
}) satisfies PageServerLoad;

export const actions = {
	read: async (event) => {
		requireUser(event);
		const form = await postedForm(event);
		if (!(form instanceof FormData)) return form;
		const posted = await readRate(form);
		if (!('reading' in posted)) return posted;
		return { json: posted.json, preview: previewOf(posted.reading) };
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
