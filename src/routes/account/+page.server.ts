import { fail } from '@sveltejs/kit';
import { requireUser } from '$lib/server/guard';
import { handOverSignOut } from '$lib/server/auth/hand-over';
import { revokeAllSessions } from '$lib/server/auth/sessions';
import { deleteAccount } from '$lib/server/accounts/deletion';
import { keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

const DELETED = '/account?deleted=1';
const SIGNED_OUT_EVERYWHERE = '/account?signedout=everywhere';

export const load = (async (event) => {
	// After a deletion, or after signing out everywhere, the visitor is signed out and lands here once,
	// to read what happened.
	if (!event.locals.user && event.url.searchParams.get('deleted') === '1')
		return { deleted: true as const, signedOutEverywhere: false, account: null };
	if (!event.locals.user && event.url.searchParams.get('signedout') === 'everywhere')
		return { deleted: false as const, signedOutEverywhere: true, account: null };
	const user = requireUser(event);
	return {
		deleted: false as const,
		signedOutEverywhere: false,
		account: { name: user.name, email: user.email }
	};
}) satisfies PageServerLoad;

export const actions = {
	/** Ends every session of the account, on every device and browser, this one included. */
	signOutEverywhere: async (event) => {
		const user = requireUser(event);
		await revokeAllSessions(user.id);
		await handOverSignOut(event, SIGNED_OUT_EVERYWHERE);
	},

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
		await handOverSignOut(event, DELETED);
	}
} satisfies Actions;
