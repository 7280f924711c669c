// A little over 60 lines: the load and two actions (accept as the signed-in person, or join with a new account).
import { error, fail, redirect } from '@sveltejs/kit';
import { handOver } from '$lib/server/auth/hand-over';
import { requireUser } from '$lib/server/guard';
import { hasConfirmedAccount } from '$lib/server/accounts/sign-up';
import { signUpLimiter, TOO_MANY } from '$lib/server/rate-limit';
import {
	acceptAsUser,
	findOpenInvitation,
	invitationHome,
	joinByInvitation
} from '$lib/server/workspaces/invitation';
import { joinSchema } from '$lib/server/workspaces/workspace.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

const CLOSED = 'This invitation has been used, withdrawn or has expired.';

export const load = (async ({ params, locals }) => {
	const invitation = await findOpenInvitation(params.token);
	if (!invitation) return { invitation: null, hasAccount: false };
	return {
		invitation: {
			email: invitation.email,
			role: invitation.role,
			// A site share names the site only, not the workspace around it.
			workspaceName: invitation.siteName ?? invitation.workspaceName,
			siteOnly: !!invitation.siteId
		},
		// Only a confirmed account owns the address (accounts/sign-up.ts).
		hasAccount: await hasConfirmedAccount(invitation.email),
		signedInAs: locals.user?.email ?? null
	};
}) satisfies PageServerLoad;

export const actions = {
	accept: async (event) => {
		const accepted = await acceptAsUser(event.params.token, requireUser(event));
		if (accepted === 'closed') error(404, CLOSED);
		if ('sentTo' in accepted)
			return fail(403, {
				errors: { form: `This invitation is for ${accepted.sentTo}. Sign in with that address to accept it.` }
			});
		redirect(303, accepted.home);
	},

	join: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = joinSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { values, errors: fieldErrors(parsed.error) });
		if (await signUpLimiter.isLimited(event)) return fail(429, { values, errors: { form: TOO_MANY } });
		const joined = await joinByInvitation(event.params.token, parsed.data);
		if (joined === 'closed') error(404, CLOSED);
		if ('refused' in joined) return fail(409, { values, errors: { form: joined.refused } });
		await handOver(event, 'password', {
			email: joined.email,
			password: parsed.data.password,
			next: invitationHome(joined)
		});
		redirect(303, invitationHome(joined));
	}
} satisfies Actions;
