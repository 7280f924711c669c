import { DateTime } from 'luxon';
import { defaultStart } from '$lib/compare/query';
import { readableScenarios } from '$lib/server/compare/choices';
import { requireUser } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const user = requireUser(event);
	return {
		choices: await readableScenarios(user.id),
		defaultStart: defaultStart(DateTime.now().toISODate() ?? '2026-01-01')
	};
}) satisfies PageServerLoad;
