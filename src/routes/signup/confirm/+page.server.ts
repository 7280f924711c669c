import { z } from 'zod';
import { confirmEmail } from '$lib/server/services/account.service';
import type { PageServerLoad } from './$types';

const query = z.object({ token: z.string().min(10).max(200) });

export const load = (async ({ url }) => {
	const parsed = query.safeParse({ token: url.searchParams.get('token') });
	const email = parsed.success ? await confirmEmail(parsed.data.token) : null;
	return { email };
}) satisfies PageServerLoad;
