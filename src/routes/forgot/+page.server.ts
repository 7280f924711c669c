import { fail } from '@sveltejs/kit';
import { mailLinkLimiter, TOO_MANY } from '$lib/server/rate-limit';
import { requestPasswordReset } from '$lib/server/accounts/password-reset';
import { magicLinkSchema } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import type { Actions } from './$types';

export const actions = {
	default: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = magicLinkSchema.safeParse(Object.fromEntries(form));
		if (!parsed.success) return fail(400, { values, errors: fieldErrors(parsed.error) });
		if (await mailLinkLimiter.isLimited(event, parsed.data.email))
			return fail(429, { values, errors: { form: TOO_MANY } });
		await requestPasswordReset(parsed.data.email, event.url.origin);
		return { sent: parsed.data.email };
	}
} satisfies Actions;
