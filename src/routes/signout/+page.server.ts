import { redirect } from '@sveltejs/kit';
import { signOut } from '$lib/server/auth';
import { forwardedHeaders } from '$lib/server/auth/hand-over';
import type { Actions, PageServerLoad } from './$types';

export const load = (() => redirect(303, '/')) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
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
