import { libraryPage } from '$lib/server/tariffs/library';
import type { PageServerLoad } from './$types';

/** The quick estimate offers the public library's tariffs, besides a flat price. */
export const load = (async () => {
	const { items } = await libraryPage(undefined, { scope: 'public', sort: 'utility', pageSize: 100 });
	return { libraryTariffs: items.map((t) => ({ id: t.id, label: `${t.utility} — ${t.name}` })) };
}) satisfies PageServerLoad;
