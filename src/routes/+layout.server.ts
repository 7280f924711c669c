import { env } from '$env/dynamic/private';
import { sitesHomeFor } from '$lib/server/accounts/landing';
import type { LayoutServerLoad } from './$types';

export const load = (async ({ locals, request }) => {
	const user = locals.user;
	// Read with the session, before any form action: after one (it may have made or left a workspace), ask again.
	const sitesHome = request.method === 'GET' ? locals.sitesHome : null;
	return {
		// A whitelisted subset: never tokens or whole rows.
		user: user ? { id: user.id, email: user.email, name: user.name, isAdmin: user.isAdmin } : null,
		// Where the main navigation's "Sites" goes outside a workspace (accounts/landing.ts).
		sitesHome: user ? (sitesHome ?? (await sitesHomeFor(user.id))) : null,
		// Only set where the local SMTP catcher runs (npm start, npm test); production has no such page.
		mailViewUrl: env.MAIL_VIEW_URL || null
	};
}) satisfies LayoutServerLoad;
