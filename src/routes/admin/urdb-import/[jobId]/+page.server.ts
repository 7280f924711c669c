import { error } from '@sveltejs/kit';
import { requireAdmin } from '$lib/server/guard';
import { bulkStatus } from '$lib/server/tariffs/bulk/bulk-status';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	requireAdmin(event);
	const status = await bulkStatus(event.params.jobId);
	if (!status) error(404, 'No such import is kept: reports are kept for about two hours.');
	return { jobId: event.params.jobId, status };
}) satisfies PageServerLoad;
