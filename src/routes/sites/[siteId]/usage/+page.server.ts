import { fail, redirect } from '@sveltejs/kit';
import { requireSiteAccess } from '$lib/server/guard';
import { rowIssueText } from '$lib/server/usage/interval';
import { readUsageFile } from '$lib/server/usage/read-usage';
import { CHOOSE_FILE, readUsageUpload } from '$lib/server/usage/upload';
import { dailyShape, importUsage, usageSummary } from '$lib/server/usage/usage.service';
import type { Actions, PageServerLoad } from './$types';

export const load = (async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const [summary, shape] = await Promise.all([usageSummary(site.id), dailyShape(site.id, site.timezone)]);
	const imported = Number(event.url.searchParams.get('imported'));
	return {
		summary: summary && {
			intervals: summary.intervals,
			firstStart: summary.firstStart.toISOString(),
			lastStart: summary.lastStart.toISOString(),
			kwh: summary.kwh
		},
		shape,
		// Set by the redirect after an import, for the notice; anything else in the address is ignored.
		imported: Number.isInteger(imported) && imported > 0 ? imported : null
	};
}) satisfies PageServerLoad;

export const actions = {
	/** One file, read off the main thread and stored in one transaction; a refusal stores nothing. */
	import: async (event) => {
		const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
		const upload = await readUsageUpload(event.request, { rawBody: false });
		// A form post without a file part (not multipart) gets the form's own words, not the API's.
		if (!upload.ok && upload.status === 415) return fail(400, { errors: { file: CHOOSE_FILE }, issues: [] });
		if (!upload.ok) return fail(upload.status, { errors: { file: upload.message }, issues: [] });
		const read = await readUsageFile(upload.bytes, site.timezone);
		if ('error' in read)
			return fail(400, { errors: { file: read.error }, issues: (read.issues ?? []).map(rowIssueText) });
		const { imported } = await importUsage(site, read.intervals, user);
		redirect(303, `/sites/${site.id}/usage?imported=${imported}`);
	}
} satisfies Actions;
