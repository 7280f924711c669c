import { json } from '@sveltejs/kit';
import { apiError } from '$lib/server/http/json';
import { requireSiteAccess } from '$lib/server/guard';
import { rowIssueText } from '$lib/server/usage/interval';
import { readUsageFile } from '$lib/server/usage/read-usage';
import { readUsageUpload } from '$lib/server/usage/upload';
import { dailyShape, importUsage, usageSummary } from '$lib/server/usage/usage.service';
import { methodNotAllowed, PRIVATE } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/** GET /api/v1/sites/:id/usage — what metered use is stored, and the daily load shape it gives. */
export const GET: RequestHandler = async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const [summary, shape] = await Promise.all([usageSummary(site.id), dailyShape(site.id, site.timezone)]);
	return json({ timezone: site.timezone, summary, dailyShape: shape }, { headers: PRIVATE });
};

/**
 * POST /api/v1/sites/:id/usage — a Green Button XML file or a timestamp,kWh CSV sheet, told apart by
 * its bytes: multipart (field `file`) or the file itself as application/xml, text/xml or text/csv.
 * 201 `{ imported, from, to }`; 400 with the reason (and `issues` by row for a sheet), nothing stored;
 * 413 past 10 MB; 415 for another kind of body.
 */
export const POST: RequestHandler = async (event) => {
	const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
	const upload = await readUsageUpload(event.request, { rawBody: true });
	if (!upload.ok)
		return apiError(
			upload.status,
			upload.status === 413 ? 'payload_too_large' : 'invalid_request',
			upload.message
		);
	const read = await readUsageFile(upload.bytes, site.timezone);
	if ('error' in read)
		return apiError(
			400,
			'invalid_file',
			read.error,
			read.issues?.map((issue) => ({
				path: `rows.${issue.line}.${issue.column}`,
				message: rowIssueText(issue)
			}))
		);
	const { imported, from, to } = await importUsage(site, read.intervals, user);
	return json(
		{ imported, format: read.format, from: from.toISOString(), to: to.toISOString() },
		{ status: 201, headers: PRIVATE }
	);
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'POST');
