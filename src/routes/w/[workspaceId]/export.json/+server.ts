import { error } from '@sveltejs/kit';
import { requireRole } from '$lib/server/guard';
import { download, safeFileName } from '$lib/server/exports/download';
import { exportWorkspace } from '$lib/server/workspaces/export';
import type { RequestHandler } from './$types';

/** All of the workspace's data as one JSON file, for its owners. */
export const GET: RequestHandler = async (event) => {
	const { workspace } = await requireRole(event, event.params.workspaceId, 'owner');
	const now = new Date();
	const data = await exportWorkspace(workspace.id, now);
	if (!data) error(404, 'Not found');
	const fileName = safeFileName(workspace.name, 'export', now.toISOString().slice(0, 10));
	return download(JSON.stringify(data, null, 2), fileName, 'json');
};
