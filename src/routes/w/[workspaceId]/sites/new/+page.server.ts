import { redirect } from '@sveltejs/kit';
import { requireRole } from '$lib/server/guard';
import { createSite } from '$lib/server/sites/site.service';
import { readSiteForm, searchedForm, tariffChoices } from '$lib/server/sites/site-form';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'editor');
	const search = event.url.searchParams.get('tariffs') ?? '';
	return {
		tariffs: await tariffChoices({ workspaceId: workspace.id }, { search }),
		searched: searchedForm(event.url)
	};
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const { workspace, user } = await requireRole(event, event.params.workspaceId, 'editor');
		const read = await readSiteForm(event, { workspaceId: workspace.id });
		if (!read.ok) return read.failure;
		const id = await createSite(workspace.id, read.input, user);
		redirect(303, `/sites/${id}`);
	}
} satisfies Actions;
