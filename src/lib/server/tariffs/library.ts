import { z } from 'zod';
import { CUSTOMER_CLASSES } from '$lib/forms/tariff-meta.schema';
import { searchTariffs, workspaceIdsOf } from '$lib/server/tariffs/tariff.service';
import { features, typicalMonth, versionForToday } from './submission';
import { tariffListing, tariffScope } from './tariff-view';

export const libraryQuerySchema = z.object({
	q: z.string().trim().max(100, 'Search text must be at most 100 characters').optional(),
	country: z
		.string()
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{2}$/, 'Country must be a two-letter code')
		.optional(),
	region: z.string().trim().toUpperCase().max(10).optional(),
	customerClass: z.enum(CUSTOMER_CLASSES, { error: 'Unknown customer class' }).optional(),
	feature: z.enum(['tou', 'tiers', 'demand'], { error: 'Feature must be tou, tiers or demand' }).optional(),
	scope: z.enum(['public', 'private'], { error: 'Scope must be public or private' }).optional(),
	sort: z
		.enum(['name', 'utility', 'updated', 'cost'], { error: 'Sort by name, utility, updated or cost' })
		.optional(),
	page: z.coerce.number().int().min(1).max(10_000).optional(),
	pageSize: z.coerce.number().int().min(1).max(100).optional()
});
export type LibraryQuery = z.output<typeof libraryQuerySchema>;

/** Empty query-string values mean "no filter". */
export function queryObject(url: URL): Record<string, string> {
	return Object.fromEntries([...url.searchParams].filter(([, v]) => v.trim() !== ''));
}

/** One page of the library as the list page and GET /api/v1/tariffs show it. */
export async function libraryPage(userId: string | undefined, query: LibraryQuery) {
	const workspaceIds = await workspaceIdsOf(userId);
	const { sort, ...rest } = query;
	const result = await searchTariffs(workspaceIds, { ...rest, sort: sort === 'cost' ? 'name' : sort });
	const items = result.items.map(({ tariff, versions }) => {
		const latest = versions.at(-1);
		const priced = versionForToday(versions);
		return {
			id: tariff.id,
			...tariffListing(tariff),
			...tariffScope(tariff),
			revision: tariff.revision,
			latestVersion: latest
				? { number: latest.number, effectiveFrom: latest.effectiveFrom, checkedOn: latest.checkedOn }
				: null,
			features: latest ? features(latest.structure) : null,
			// Every version's number and start: a site form offers them to pin one.
			versions: versions.map((v) => ({ number: v.number, effectiveFrom: v.effectiveFrom })),
			// The version in force today, not the newest: a version ahead of its date is not yet paid.
			typicalMonthFor1Kw: typicalMonth(tariff, priced),
			typicalMonthVersion: priced?.number ?? null
		};
	});
	// Cost sorts within the page: the figure is computed, not stored.
	if (sort === 'cost')
		items.sort((a, b) => (a.typicalMonthFor1Kw ?? Infinity) - (b.typicalMonthFor1Kw ?? Infinity));
	return { page: result.page, pageSize: result.pageSize, total: result.total, items };
}
