import { fail, redirect } from '@sveltejs/kit';
import { signUpLimiter, TOO_MANY } from '$lib/server/rate-limit';
import { signUp } from '$lib/server/accounts/sign-up';
import { signUpSchema } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

export const load = (({ locals }) => {
	if (locals.user) redirect(303, '/workspaces');
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = signUpSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { values, errors: fieldErrors(parsed.error) });
		if (await signUpLimiter.isLimited(event)) return fail(429, { values, errors: { form: TOO_MANY } });
		await signUp(parsed.data, event.url.origin);
		// The same answer for a new and an existing address: the form must not tell who has an account.
		redirect(303, `/signup/sent?email=${encodeURIComponent(parsed.data.email)}`);
	}
} satisfies Actions;
