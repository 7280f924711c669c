import { error, fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { handOver } from '$lib/server/auth/hand-over';
import { requireUser } from '$lib/server/guard';
import { hasConfirmedAccount } from '$lib/server/accounts/sign-up';
import { signUpLimiter, TOO_MANY } from '$lib/server/rate-limit';
import {
	acceptInvitation,
	findOpenInvitation,
	MembershipRuleError
} from '$lib/server/workspaces/workspace.service';
import { nameField, newPasswordField } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

const tokenSchema = z.string().min(20).max(100);

async function openInvitation(token: string) {
	if (!tokenSchema.safeParse(token).success) return null;
	return findOpenInvitation(token);
}

export const load = (async ({ params, locals }) => {
	const invitation = await openInvitation(params.token);
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

const joinSchema = z
	.object({ name: nameField, password: newPasswordField, confirm: z.string() })
	.refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });

export const actions = {
	accept: async (event) => {
		const user = requireUser(event);
		const invitation = await openInvitation(event.params.token);
		if (!invitation) error(404, 'This invitation has been used, withdrawn or has expired.');
		if (invitation.email !== user.email.toLowerCase())
			return fail(403, {
				errors: {
					form: `This invitation is for ${invitation.email}. Sign in with that address to accept it.`
				}
			});
		const accepted = await acceptInvitation(event.params.token, { userId: user.id });
		if (!accepted) error(404, 'This invitation has been used, withdrawn or has expired.');
		redirect(303, accepted.siteId ? `/sites/${accepted.siteId}` : `/w/${accepted.workspaceId}`);
	},

	join: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = joinSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { values, errors: fieldErrors(parsed.error) });
		if (await signUpLimiter.isLimited(event)) return fail(429, { values, errors: { form: TOO_MANY } });
		let accepted;
		try {
			accepted = await acceptInvitation(event.params.token, {
				name: parsed.data.name,
				password: parsed.data.password
			});
		} catch (e) {
			if (e instanceof MembershipRuleError) return fail(409, { values, errors: { form: e.message } });
			throw e;
		}
		if (!accepted) error(404, 'This invitation has been used, withdrawn or has expired.');
		await handOver(event, 'password', {
			email: accepted.email,
			password: parsed.data.password,
			next: accepted.siteId ? `/sites/${accepted.siteId}` : `/w/${accepted.workspaceId}`
		});
		redirect(303, accepted.siteId ? `/sites/${accepted.siteId}` : `/w/${accepted.workspaceId}`);
	}
} satisfies Actions;
