import { fail } from '@sveltejs/kit';
import { requireUser } from '$lib/server/guard';
import { signOut } from '$lib/server/auth';
import { forwardedHeaders } from '$lib/server/auth/hand-over';
import { deleteAccount } from '$lib/server/services/account-deletion.service';
import { keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

const DELETED = '/account?deleted=1';

export const load = (async (event) => {
	// After a deletion the visitor is signed out and lands here once, to read what happened.
	if (!event.locals.user && event.url.searchParams.get('deleted') === '1')
		return { deleted: true as const, account: null };
	const user = requireUser(event);
	return { deleted: false as const, account: { name: user.name, email: user.email } };
}) satisfies PageServerLoad;

export const actions = {
	delete: async (event) => {
		const user = requireUser(event);
		const form = await event.request.formData();
		const typed = String(form.get('confirmEmail') ?? '')
			.trim()
			.toLowerCase();
		if (typed !== user.email.toLowerCase())
			return fail(400, {
				values: keepValues(form),
				errors: { confirmEmail: 'Type your e-mail address exactly to confirm.' }
			});
		const result = await deleteAccount(user.id);
		if (!result.deleted)
			return fail(409, {
				values: keepValues(form),
				blockers: result.blockers,
				errors: {
					form: `You are the last owner of ${result.blockers.join(', ')}, which other people use. Make one of them owner, or delete the workspace, first.`
				}
			});
		// Clears the Auth.js session cookie, then redirects.
		const body = new FormData();
		body.set('redirectTo', DELETED);
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
