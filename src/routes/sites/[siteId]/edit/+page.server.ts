import { fail, redirect } from '@sveltejs/kit';
import { requireSiteAccess } from '$lib/server/guard';
import { StaleWrite, updateSite } from '$lib/server/services/site.service';
import { readSiteForm, tariffChoices } from '$lib/server/sites/site-form';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'editor');
	return { tariffs: await tariffChoices(site.workspaceId) };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
		const read = await readSiteForm(event, site.workspaceId);
		if (!read.ok) return read.failure;
		try {
			await updateSite(site, read.revision, read.input, user);
		} catch (e) {
			if (e instanceof StaleWrite)
				return fail(409, {
					values: {},
					errors: {
						form: 'Someone else saved this site while you were editing. Reload to see their change, then make yours.'
					}
				});
			throw e;
		}
		redirect(303, `/sites/${site.id}`);
	}
} satisfies Actions;
