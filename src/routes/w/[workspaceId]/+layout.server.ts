import { requireRole } from '$lib/server/guard';
import type { LayoutServerLoad } from './$types';

export const load = (async (event) => {
	const { workspace, role } = await requireRole(event, event.params.workspaceId, 'viewer');
	return { workspace, role };
}) satisfies LayoutServerLoad;
