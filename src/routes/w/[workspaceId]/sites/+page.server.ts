import { requireRole } from '$lib/server/guard';
import { dashboardRows } from '$lib/server/sites/dashboard';
import { recentNotices } from '$lib/server/tariffs/tariff-notice.service';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	const now = new Date();
	const [sites, notices] = await Promise.all([
		dashboardRows(workspace.id, now),
		// The latest tariff change notices show here too, where the costs they change are.
		recentNotices(workspace.id, 3)
	]);
	return { sites, canEdit: role !== 'viewer', year: now.getUTCFullYear(), notices };
}) satisfies PageServerLoad;
