import { fail, redirect } from '@sveltejs/kit';
import { signUpLimiter, TOO_MANY } from '$lib/server/rate-limit';
import { signUp } from '$lib/server/accounts/sign-up';
import { signUpSchema } from '$lib/forms/auth.schema';
import { fieldErrors, keepValues } from '$lib/forms/errors';
import { estimateOffer, keptEstimateFrom } from './estimate.server';
import type { Actions, PageServerLoad } from './$types';

export const load = (({ locals, url }) => {
	if (locals.user) redirect(303, '/signin/landing');
	// A quick estimate in the address ("Keep it as a site") travels with this sign-up.
	return { estimate: estimateOffer(url) };
}) satisfies PageServerLoad;

export const actions = {
	default: async (event) => {
		const form = await event.request.formData();
		const values = keepValues(form);
		const parsed = signUpSchema.safeParse(Object.fromEntries(form));
		// The form posts to its own address, so the estimate it carries is in the URL.
		const kept = keptEstimateFrom(event.url, form);
		if (kept.errors.estimate)
			kept.errors.estimate = `This estimate cannot be kept as it is: ${kept.errors.estimate}. Go back to it to fix it, or sign up without it.`;
		if (!parsed.success || Object.keys(kept.errors).length)
			return fail(400, {
				values,
				errors: { ...(parsed.success ? {} : fieldErrors(parsed.error)), ...kept.errors }
			});
		if (await signUpLimiter.isLimited(event)) return fail(429, { values, errors: { form: TOO_MANY } });
		await signUp(parsed.data, event.url.origin, kept.estimate);
		// The same answer for a new and an existing address: the form must not tell who has an account.
		// The estimate's own link rides along, so it is not lost whatever happens to this sign-up.
		const back = kept.estimate ? `&estimate=${encodeURIComponent(estimateOffer(event.url)!.backTo)}` : '';
		redirect(303, `/signup/sent?email=${encodeURIComponent(parsed.data.email)}${back}`);
	}
} satisfies Actions;
