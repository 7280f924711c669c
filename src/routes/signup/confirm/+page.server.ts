import { fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { handOver } from '$lib/server/auth/hand-over';
import { recordSignInFailure, signInLocked, TOO_MANY } from '$lib/server/rate-limit';
import { confirmationFor, confirmSignUp } from '$lib/server/accounts/sign-up';
import { confirmSignUpSchema } from '$lib/forms/auth.schema';
import { fieldErrors } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

const query = z.object({ token: z.string().min(10).max(200) });
const CLOSED = 'This link has been used already, was replaced by a newer one or has expired.';

/**
 * Opening the link changes nothing (mail scanners open links too): the page asks for the password chosen
 * at sign-up, and only the link and that password together confirm the account (accounts/sign-up.ts).
 */
export const load = (async ({ url }) => {
	const parsed = query.safeParse({ token: url.searchParams.get('token') });
	const email = parsed.success ? await confirmationFor(parsed.data.token) : null;
	return { email, token: parsed.success ? parsed.data.token : '' };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const form = await event.request.formData();
		const parsed = confirmSignUpSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) {
			const errors = fieldErrors(parsed.error);
			if (errors.token) errors.form = 'This confirmation link is incomplete. Open it again from the e-mail.';
			return fail(400, { errors });
		}
		const email = await confirmationFor(parsed.data.token);
		if (!email) return fail(400, { errors: { form: CLOSED } });
		// Guessing the pending password through a leaked link counts like guessing it at sign-in.
		if (await signInLocked(event, email)) return fail(429, { errors: { form: TOO_MANY } });
		const result = await confirmSignUp(parsed.data.token, parsed.data.password);
		if (result === 'closed') return fail(400, { errors: { form: CLOSED } });
		if (result === 'wrong-password') {
			await recordSignInFailure(event, email);
			return fail(400, { errors: { password: 'That is not the password chosen for this sign-up.' } });
		}
		// A kept estimate is now the first site: the welcome page says so; else sign-in's usual landing.
		const next = result.firstSite ? `/signup/welcome?site=${result.firstSite.siteId}` : '/signin/landing';
		await handOver(event, 'password', { email, password: parsed.data.password, next });
		redirect(303, `/signin?email=${encodeURIComponent(email)}`);
	}
} satisfies Actions;
