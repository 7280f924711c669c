import { requireAdmin } from '$lib/server/guard';
import { jsonBody, NO_STORE } from '$lib/server/http/json';
import { notFound } from '$lib/server/http/answers';
import { bulkStatus } from '$lib/server/tariffs/bulk/bulk-status';
import type { RequestHandler } from './$types';

/** A bulk import's state and running report, for the progress page to poll. */
export const GET: RequestHandler = async (event) => {
	requireAdmin(event);
	const status = await bulkStatus(event.params.jobId);
	if (!status) return notFound();
	return jsonBody(status, { headers: NO_STORE });
};
