// Over 60 lines: the two doors of one sign-in page (password and e-mailed link), each rate limited, checked
// by an accounts service and handed to Auth.js in process.
import { fail, redirect } from '@sveltejs/kit';
import { handOver } from '$lib/server/auth/hand-over';
import { checkPassword } from '$lib/server/accounts/sign-in';
import { mailLinkLimiter, recordSignInFailure, signInLocked, TOO_MANY } from '$lib/server/rate-limit';
import { resendConfirmation } from '$lib/server/accounts/sign-up';
import { magicLinkSchema, signInSchema } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { safeNext } from '$lib/safe-next';
import type { Actions, PageServerLoad } from './$types';

const NO_MATCH = 'That e-mail and password do not match an account.';
/** With no page to return to, sign-in lands where the person's sites are (signin/landing). */
const LANDING = '/signin/landing';

export const load = (({ locals, url }) => {
	if (locals.user) redirect(303, safeNext(url.searchParams.get('next'), LANDING));
	return {
		next: safeNext(url.searchParams.get('next'), LANDING),
		email: url.searchParams.get('email') ?? '',
		passwordChanged: url.searchParams.has('reset')
	};
}) satisfies PageServerLoad;

export const actions = {
	password: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = signInSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { action: 'password', values, errors: fieldErrors(parsed.error) });
		const { email, password } = parsed.data;
		if (await signInLocked(event, email))
			return fail(429, { action: 'password', values, errors: { form: TOO_MANY } });

		const checked = await checkPassword(email, password);
		// A fresh confirmation link goes out within the mail-link limit, so repeated sign-ins cannot flood the mailbox.
		if (checked.found === 'pending') {
			if (!(await mailLinkLimiter.isLimited(event, email)))
				await resendConfirmation(checked.pending, event.url.origin);
			return fail(400, {
				action: 'password',
				values,
				errors: { form: 'Confirm your address first: we have sent you a new confirmation link.' }
			});
		}
		// One message whether the address is unknown or the password wrong: the form must not tell who has an account.
		if (checked.found === 'none') {
			await recordSignInFailure(event, email);
			return fail(400, { action: 'password', values, errors: { password: NO_MATCH } });
		}
		const next = safeNext(String(form.get('next') ?? ''), LANDING);
		if (!(await handOver(event, 'password', { email, password, next })))
			return fail(400, { action: 'password', values, errors: { password: NO_MATCH } });
	},

	link: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = magicLinkSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { action: 'link', values, errors: fieldErrors(parsed.error) });
		const { email } = parsed.data;
		if (await mailLinkLimiter.isLimited(event, email))
			return fail(429, { action: 'link', values, errors: { form: TOO_MANY } });
		await handOver(event, 'email', { email, next: safeNext(String(form.get('next') ?? ''), LANDING) });
		redirect(303, '/signin/check-email');
	}
} satisfies Actions;
