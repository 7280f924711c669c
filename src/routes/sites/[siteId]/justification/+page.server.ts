import { redirect } from '@sveltejs/kit';
import { afterRemoval } from '$lib/compare/picking';
import { authorOf } from '$lib/compare/printed';
import { comparisonSearch } from '$lib/compare/query';
import { siteJustification } from '$lib/server/compare/justification';
import { requireSiteAccess } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

/**
 * A site's cost justification, for anyone who may read the site (viewers and site guests too): the
 * guard here, and again for each scenario where the comparison is built and where it is exported.
 */
export const load = (async (event) => {
	const { site, user } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	// A Remove button pressed without scripts: the same choices less that scenario.
	const removed = afterRemoval(event.url);
	if (removed) redirect(303, removed);
	const justification = await siteJustification(event, site);
	return {
		...justification,
		search: justification.report ? comparisonSearch(justification.report.query) : '',
		author: authorOf(user),
		printedAt: new Date().toISOString()
	};
}) satisfies PageServerLoad;
