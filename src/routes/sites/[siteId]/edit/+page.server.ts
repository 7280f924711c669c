import { fail, redirect } from '@sveltejs/kit';
import { requireSiteAccess } from '$lib/server/guard';
import { StaleWrite, updateSite } from '$lib/server/sites/site.service';
import { readSiteForm, searchedForm, tariffChoices } from '$lib/server/sites/site-form';
import { chooserFor } from '$lib/server/tariffs/usable';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	// A guest of this site is offered public tariffs and the site's own, never the workspace's others.
	const access = await requireSiteAccess(event, event.params.siteId, 'editor');
	const search = event.url.searchParams.get('tariffs') ?? '';
	return {
		tariffs: await tariffChoices(chooserFor(access), { search, current: [access.site.tariffId] }),
		searched: searchedForm(event.url)
	};
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const access = await requireSiteAccess(event, event.params.siteId, 'editor');
		const { site, user } = access;
		const read = await readSiteForm(event, chooserFor(access));
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
