import { redirect } from '@sveltejs/kit';
import { signOut } from '$lib/server/auth';
import { forwardedHeaders } from '$lib/server/auth/hand-over';
import { revokeSession } from '$lib/server/auth/sessions';
import type { Actions, PageServerLoad } from './$types';

export const load = (() => redirect(303, '/')) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		// Auth.js's signOut event ends the session's row too; this holds even if the cookie cannot be read back.
		if (event.locals.sessionId) await revokeSession(event.locals.sessionId);
		const body = new FormData();
		body.set('redirectTo', '/');
		await signOut({
			...event,
			request: new Request(event.request.url, {
				method: 'POST',
				headers: forwardedHeaders(event.request),
				body
			})
		});
	}
} satisfies Actions;
