// After a tariff gets a new version, the queue prices again the stored years of the baselines on it, so
// the next dashboard view is read, not computed.
import { and, eq, isNull, or } from 'drizzle-orm';
import { db } from '../db';
import { scenarios, sites } from '../db/schema';
import { defineJob } from '../jobs';
import { logger } from '../log';
import { isLiveBaseline, type ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';
import { storedSummaries } from './stored-summaries';

/** At most this many baselines a job: a bounded run; the rest are priced on their next read. */
export const REPRICE_LIMIT = 500;

/** The live baselines priced on this tariff (their own override, or their site's tariff). */
async function baselinesOn(tariffId: string) {
	return db
		.select({ site: sites, scenario: scenarios })
		.from(scenarios)
		.innerJoin(sites, eq(sites.id, scenarios.siteId))
		.where(
			and(
				isNull(sites.archivedAt),
				isLiveBaseline(),
				or(eq(scenarios.tariffId, tariffId), and(isNull(scenarios.tariffId), eq(sites.tariffId, tariffId)))
			)
		)
		.limit(REPRICE_LIMIT);
}

/** Prices this year's stored result of every baseline on the tariff that is not stored under its new key. */
export async function repriceBaselines(tariffId: string, now = new Date()) {
	const byWorkspace = new Map<string, { site: SiteRow; scenario: ScenarioRow }[]>();
	for (const row of await baselinesOn(tariffId)) {
		const list = byWorkspace.get(row.site.workspaceId) ?? [];
		list.push(row);
		byWorkspace.set(row.site.workspaceId, list);
	}
	const period = { start: `${now.getUTCFullYear()}-01`, months: 12 };
	// Workspace by workspace: each one's own tariffs rule (a private tariff is priced only for its owner).
	for (const [workspaceId, entries] of byWorkspace) await storedSummaries(workspaceId, entries, period);
}

const job = defineJob<{ tariffId: string }>('stored-results-reprice', ({ tariffId }) =>
	repriceBaselines(tariffId)
);

/**
 * Queues the re-pricing after a version was published. A queue that cannot take it costs nothing but a
 * slower first view, so the publish is never refused for it.
 */
export async function repriceAfterPublish(tariffId: string) {
	try {
		await job.send({ tariffId });
	} catch (error) {
		logger.warn({ err: error, tariffId }, 'stored results not queued for re-pricing');
	}
}
