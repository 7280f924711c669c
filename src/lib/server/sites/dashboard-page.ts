// One page of the sites dashboard: the totals across every site, then 50 sites a page by name, found by
// a search on name or address. An adviser's 200 sites stay one glance: the totals first.
import { roundMoney } from '$lib/calc';
import { dashboardRows } from './dashboard';

/** Sites a dashboard page lists; the totals above them count every site. */
export const SITES_PER_PAGE = 50;

type Row = Awaited<ReturnType<typeof dashboardRows>>[number];

/** Per currency: the baselines' cost this month and over the year, and how many sites have figures. */
function totalsOf(rows: Row[]) {
	const byCurrency = new Map<string, { currency: string; month: number; year: number; sites: number }>();
	for (const row of rows) {
		if (!row.thisMonth) continue;
		const total = byCurrency.get(row.currency) ?? { currency: row.currency, month: 0, year: 0, sites: 0 };
		total.month += row.thisMonth.cost;
		total.year += row.year.reduce((sum, m) => sum + m.cost, 0);
		total.sites += 1;
		byCurrency.set(row.currency, total);
	}
	return [...byCurrency.values()].map((t) => ({
		...t,
		month: roundMoney(t.month),
		year: roundMoney(t.year)
	}));
}

/** The search words and page number of the address; a page past the last shows the last. */
export function dashboardQuery(url: URL) {
	const q = (url.searchParams.get('q') ?? '').trim().slice(0, 100);
	const page = Number(url.searchParams.get('page') ?? '1');
	return { q, page: Number.isInteger(page) && page > 0 ? page : 1 };
}

/** The dashboard for one page of sites: its rows, and the totals of every site, searched or not. */
export async function dashboardPage(workspaceId: string, now: Date, query: { q: string; page: number }) {
	const rows = await dashboardRows(workspaceId, now);
	const words = query.q.toLowerCase();
	const found = words
		? rows.filter((r) => `${r.name} ${r.address ?? ''}`.toLowerCase().includes(words))
		: rows;
	const pages = Math.max(1, Math.ceil(found.length / SITES_PER_PAGE));
	const page = Math.min(query.page, pages);
	return {
		sites: found.slice((page - 1) * SITES_PER_PAGE, page * SITES_PER_PAGE),
		totals: totalsOf(rows),
		siteCount: rows.length,
		/** The search shows once there is more than one page to search. */
		searchable: rows.length > SITES_PER_PAGE,
		found: found.length,
		page,
		pages,
		q: query.q
	};
}
