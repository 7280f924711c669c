import { redirect } from '@sveltejs/kit';
import { handOverSignOut } from '$lib/server/auth/hand-over';
import { revokeSession } from '$lib/server/auth/sessions';
import type { Actions, PageServerLoad } from './$types';

export const load = (() => redirect(303, '/')) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		// Auth.js's signOut event ends the session's row too; this holds even if the cookie cannot be read back.
		if (event.locals.sessionId) await revokeSession(event.locals.sessionId);
		await handOverSignOut(event, '/');
	}
} satisfies Actions;
