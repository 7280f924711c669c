import { fail, redirect } from '@sveltejs/kit';
import { resetPassword } from '$lib/server/accounts/password-reset';
import { resetSchema } from '$lib/forms/auth.schema';
import { fieldErrors } from '$lib/forms/errors';
import type { Actions, PageServerLoad } from './$types';

export const load = (({ url }) => ({ token: url.searchParams.get('token') ?? '' })) satisfies PageServerLoad;

export const actions = {
	default: async ({ request }) => {
		const form = await request.formData();
		const parsed = resetSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) {
			const errors = fieldErrors(parsed.error);
			if (errors.token) errors.form = 'This reset link is incomplete. Open it again from the e-mail.';
			return fail(400, { errors });
		}
		const email = await resetPassword(parsed.data.token, parsed.data.password);
		if (!email)
			return fail(400, {
				errors: { form: 'This reset link has been used already or has expired. Ask for a new one.' }
			});
		redirect(303, `/signin?email=${encodeURIComponent(email)}&reset=1`);
	}
} satisfies Actions;
