import { PUBLIC_CHOICES, type PublicFound } from '$lib/components/site-form/tariff-choice';
import { libraryPage } from '$lib/server/tariffs/library';
import { findTariff } from '$lib/server/tariffs/tariff.service';
import type { PageServerLoad } from './$types';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The quick estimate offers the public library's tariffs, besides a flat price: the first page by utility
 * (the page's search box finds the rest), and the tariff a shared link names when it is a public one.
 */
export const load = (async ({ url }) => {
	// Find before the page's script runs sends the search box here (`?tariffs=`): answer what it asked.
	const search = (url.searchParams.get('tariffs') ?? '').trim().slice(0, 100);
	const first = await libraryPage(undefined, {
		scope: 'public',
		sort: 'utility',
		pageSize: PUBLIC_CHOICES,
		...(search ? { q: search } : {})
	});
	const choices = first.items.map((t) => ({ id: t.id, label: `${t.utility} — ${t.name}` }));
	const linked = url.searchParams.get('tariff');
	if (linked && UUID.test(linked) && !choices.some((c) => c.id === linked)) {
		const found = await findTariff(linked);
		if (found && !found.tariff.workspaceId)
			choices.unshift({ id: found.tariff.id, label: `${found.tariff.utility} — ${found.tariff.name}` });
	}
	const library: PublicFound = {
		search,
		found: first.total,
		choices: choices.map((c) => ({ ...c, currency: '', versions: [] }))
	};
	return { library };
}) satisfies PageServerLoad;
