// The sites dashboard's rows: each live site with its baseline's cost this month and over the year, read
// from stored results in a fixed number of queries whatever the number of sites.
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { db } from '../db';
import { scenarios } from '../db/schema';
import { listSites } from './site.service';
import { storedSummaries } from './stored-summaries';

/** Every live site of the workspace, by name, with its baseline's year of `now` (UTC) from stored results. */
export async function dashboardRows(workspaceId: string, now: Date) {
	const year = now.getUTCFullYear();
	const monthIndex = now.getUTCMonth();
	const sites = await listSites(workspaceId);
	const baselines = sites.length
		? await db
				.select()
				.from(scenarios)
				.where(
					and(
						inArray(
							scenarios.siteId,
							sites.map((s) => s.id)
						),
						eq(scenarios.isBaseline, true),
						isNull(scenarios.deletedAt),
						isNull(scenarios.archivedAt)
					)
				)
		: [];
	const baselineOf = new Map(baselines.map((b) => [b.siteId, b]));
	const entries = sites.flatMap((site) => {
		const scenario = baselineOf.get(site.id);
		return scenario ? [{ site, scenario }] : [];
	});
	const priced = await storedSummaries(workspaceId, entries, { start: `${year}-01`, months: 12 });
	return sites.map((site) => {
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
