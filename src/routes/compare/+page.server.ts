import { redirect } from '@sveltejs/kit';
import { DateTime } from 'luxon';
import { afterRemoval, scenarioIds } from '$lib/compare/picking';
import { defaultStart } from '$lib/compare/query';
import { pickerChoices } from '$lib/server/compare/choices';
import { requireUser } from '$lib/server/guard';
import type { PageServerLoad } from './$types';

export const load = (async (event) => {
	const user = requireUser(event);
	// A Remove button pressed without scripts: the same choices less that scenario.
	const removed = afterRemoval(event.url);
	if (removed) redirect(303, removed);
	const { searchParams } = event.url;
	// Read untracked: ticking a box or typing must not send the list again (the browser filters it).
	const wanted = event.untrack(() => ({
		find: searchParams.get('find') ?? '',
		picked: scenarioIds(searchParams)
	}));
	const choices = await pickerChoices(user.id, wanted);
	// Past the bound the list depends on the search: then a new Find loads it again.
	if (choices.left > 0) searchParams.get('find');
	return {
		choices,
		defaultStart: defaultStart(DateTime.now().toISODate() ?? '2026-01-01')
	};
}) satisfies PageServerLoad;
