import { billTemplateCsv } from '$lib/server/bills/bill-sheet';
import { download } from '$lib/server/exports/download';
import { requireSiteAccess } from '$lib/server/guard';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = async (event) => {
	await requireSiteAccess(event, event.params.siteId, 'viewer');
	return download(billTemplateCsv(), 'runrate-bills-template', 'csv');
};
