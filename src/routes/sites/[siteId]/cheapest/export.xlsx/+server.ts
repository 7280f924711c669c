import { error } from '@sveltejs/kit';
import { loadWords } from '$lib/cheapest/words';
import { cheapestWorkbook } from '$lib/server/exports/cheapest-workbook';
import { download, safeFileName } from '$lib/server/exports/download';
import { requireSiteAccess } from '$lib/server/guard';
import { cheapestFromQuery } from '$lib/server/tariffs/cheapest-query';
import type { RequestHandler } from './$types';

/** GET …/cheapest/export.xlsx?scenario=&from= — the cheapest-tariff answer as a workbook; viewers may export. */
export const GET: RequestHandler = async (event) => {
	const { site, viaGrant } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const answer = await cheapestFromQuery(site, viaGrant, event);
	// Nothing priced (no year of usage, a scenario without equipment): the page says why; no empty file.
	if (!answer.cheapest.ok && answer.cheapest.limited)
		return new Response(answer.cheapest.message, { status: 429, headers: { 'Retry-After': '60' } });
	if (!answer.cheapest.ok) error(409, answer.cheapest.message);
	const workbook = await cheapestWorkbook({
		siteName: site.name,
		timezone: site.timezone,
		load: loadWords(answer.scenario?.name ?? null),
		generatedAt: new Date().toISOString(),
		figures: answer.cheapest
	});
	const name = safeFileName(site.name, 'cheapest-tariff', answer.scenario?.name ?? 'metered');
	return download(new Uint8Array(workbook), name, 'xlsx');
};
