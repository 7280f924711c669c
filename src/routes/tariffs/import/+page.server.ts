import { error, fail } from '@sveltejs/kit';
import { requireAdmin, requireRole, requireUser } from '$lib/server/guard';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import { MAX_SHEET_BYTES } from '$lib/server/tariffs/sheet-import';
import { importTariffSheet } from '$lib/server/tariffs/sheet-intake';
import { uploadForm } from '$lib/server/http/upload-form';
import type { Actions, PageServerLoad } from './$types';

const TOO_LARGE = `The file is over ${MAX_SHEET_BYTES / 1024 / 1024} MB.`;

async function ownerChoices(user: SessionUser) {
	const workspaces = (await listWorkspacesFor(user.id)).filter((w) => w.role !== 'viewer');
	return [
		...workspaces.map((w) => ({ value: w.id, label: `${w.name} (private)` })),
		...(user.isAdmin ? [{ value: 'public', label: 'The public library' }] : [])
	];
}

export const load = (async (event) => {
	const owners = await ownerChoices(requireUser(event));
	if (owners.length === 0) error(403, 'Importing tariffs needs the editor role in a workspace.');
	return { owners, maxMb: MAX_SHEET_BYTES / 1024 / 1024 };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const user = requireUser(event);
		const form = await uploadForm(event.request);
		if (form === 'too-large') return fail(413, { owner: '', errors: { sheet: TOO_LARGE } });
		const owner = String(form.get('owner') ?? '');
		const dryRun = form.get('intent') === 'check';
		if (owner === 'public') requireAdmin(event);
		else if (!(await ownerChoices(user)).some((o) => o.value === owner))
			return fail(400, { owner, errors: { owner: 'Pick where the tariffs go.' } });
		else await requireRole(event, owner, 'editor');

		const file = form.get('sheet');
		if (!(file instanceof File) || file.size === 0)
			return fail(400, { owner, errors: { sheet: 'Choose a CSV or XLSX file.' } });
		if (file.size > MAX_SHEET_BYTES) return fail(413, { owner, errors: { sheet: TOO_LARGE } });
		const kind = /\.xlsx$/i.test(file.name) ? 'xlsx' : /\.csv$/i.test(file.name) ? 'csv' : null;
		if (!kind) return fail(400, { owner, errors: { sheet: 'The file must end in .csv or .xlsx.' } });

		const bytes = new Uint8Array(await file.arrayBuffer());
		const workspaceId = owner === 'public' ? null : owner;
		const { ok, ...done } = await importTariffSheet(bytes, kind, { workspaceId, dryRun, author: user });
		return ok ? { owner, ...done } : fail(400, { owner, ...done, imported: [] });
	}
} satisfies Actions;
