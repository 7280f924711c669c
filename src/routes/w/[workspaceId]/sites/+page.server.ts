import { requireRole } from '$lib/server/guard';
import { dashboardPage, dashboardQuery } from '$lib/server/sites/dashboard-page';
import { recentNotices } from '$lib/server/tariffs/tariff-notice.service';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	const now = new Date();
	const [dashboard, notices] = await Promise.all([
		dashboardPage(workspace.id, now, dashboardQuery(event.url)),
		// The latest tariff change notices show here too, where the costs they change are.
		recentNotices(workspace.id, 3)
	]);
	return { ...dashboard, canEdit: role !== 'viewer', year: now.getUTCFullYear(), notices };
}) satisfies PageServerLoad;
