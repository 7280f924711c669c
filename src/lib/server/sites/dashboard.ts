// The sites dashboard's rows: each live site with its baseline's cost this month and over the year, read
// from stored results in a fixed number of queries whatever the number of sites.
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { db } from '../db';
import { isLiveBaseline } from './scenario.service';
import { pricedResults, scenarios, sites } from '../db/schema';
import { slotOf } from './stored-key';
import { storedSummaries } from './stored-summaries';

// One query, built once: each live site by name, its live baseline, and the baseline's stored year if any.
const siteRowsQuery = db
	.select({
		site: sites,
		baseline: scenarios,
		stored: { inputKey: pricedResults.inputKey, summary: pricedResults.summary }
	})
	.from(sites)
	.leftJoin(scenarios, and(eq(scenarios.siteId, sites.id), isLiveBaseline()))
	.leftJoin(
		pricedResults,
		and(eq(pricedResults.scenarioId, scenarios.id), eq(pricedResults.slot, sql.placeholder('slot')))
	)
	.where(and(eq(sites.workspaceId, sql.placeholder('workspaceId')), isNull(sites.archivedAt)))
	.orderBy(asc(sites.name), asc(sites.id))
	.prepare('dashboard_site_rows');

/** Every live site of the workspace, by name, with its baseline's year of `now` (UTC) from stored results. */
export async function dashboardRows(workspaceId: string, now: Date) {
	const year = now.getUTCFullYear();
	const monthIndex = now.getUTCMonth();
	const period = { start: `${year}-01`, months: 12 };
	const rows = await siteRowsQuery.execute({ workspaceId, slot: slotOf(period) });
	const baselineOf = new Map(rows.flatMap((r) => (r.baseline ? [[r.site.id, r.baseline] as const] : [])));
	const entries = rows.flatMap(({ site, baseline }) => (baseline ? [{ site, scenario: baseline }] : []));
	const stored = new Map(
		rows.flatMap((r) => (r.baseline && r.stored ? [[r.baseline.id, r.stored] as const] : []))
	);
	const siteRows = [...new Map(rows.map((r) => [r.site.id, r.site])).values()];
	const priced = await storedSummaries(workspaceId, entries, period, stored);
	return siteRows.map((site) => {
		const baseline = baselineOf.get(site.id) ?? null;
		const answer = baseline ? priced.get(baseline.id) : undefined;
		const summary = answer?.ok ? answer.summary : null;
		const months = summary?.periods ?? [];
		return {
			id: site.id,
			name: site.name,
			address: site.address,
			currency: site.currency,
			baselineName: baseline?.name ?? null,
			deviceCount: answer ? (answer.ok ? answer.summary.deviceCount : answer.deviceCount) : 0,
			thisMonth: months[monthIndex] ?? null,
			year: months,
			problem: answer && !answer.ok ? answer.message : baseline ? null : 'No baseline scenario',
			note: summary?.note ?? null
		};
	});
}
