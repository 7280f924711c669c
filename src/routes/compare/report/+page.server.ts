import { authorOf } from '$lib/compare/printed';
import { requireUser } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

/** Who prints the report and when; the figures come from the universal load. */
export const load = ((event) => {
	const user = requireUser(event);
	return { printedAt: new Date().toISOString(), author: authorOf(user) };
}) satisfies PageServerLoad;
