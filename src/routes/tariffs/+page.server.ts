import { libraryPage, libraryQuerySchema, queryObject } from '$lib/server/tariffs/library';
import { listWorkspacesFor } from '$lib/server/workspaces/workspace.service';
import type { PageServerLoad } from './$types';

export const load = (async ({ url, locals }) => {
	const parsed = libraryQuerySchema.safeParse(queryObject(url));
	// A bad filter in a shared link falls back to the unfiltered library rather than an error page.
	const query = parsed.success ? parsed.data : {};
	const workspaces = locals.user ? await listWorkspacesFor(locals.user.id) : [];
	return {
		query,
		result: await libraryPage(locals.user?.id, query),
		editableWorkspaces: workspaces
			.filter((w) => w.role !== 'viewer')
			.map((w) => ({ id: w.id, name: w.name })),
		isAdmin: locals.user?.isAdmin ?? false
	};
}) satisfies PageServerLoad;
