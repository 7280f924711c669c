import { requireUser } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	requireUser(event);
	return { printedOn: new Date().toISOString().slice(0, 10) };
}) satisfies PageServerLoad;
