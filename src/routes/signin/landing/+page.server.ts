import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/guard';
import { sitesHomeFor } from '$lib/server/accounts/landing';
import type { PageServerLoad } from './$types';

/**
 * Where a sign-in with no page of its own to return to lands: the sites of the person's only workspace,
 * or "Your workspaces" when they have none or several. A redirect with no page: Auth.js's redirect
 * (password and e-mailed link alike) comes here, and this page knows the person.
 */
export const load = (async (event) => {
	const user = requireUser(event);
	redirect(303, await sitesHomeFor(user.id));
}) satisfies PageServerLoad;
