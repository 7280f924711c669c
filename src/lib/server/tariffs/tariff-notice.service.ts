import { and, desc, eq, isNull, or, sql } from 'drizzle-orm';
import { env } from '$env/dynamic/private';
import { money } from '$lib/text/numbers';
import { db } from '../db';
import { notices, scenarios, sites, tariffs, tariffVersions, workspaces } from '../db/schema';
import { defineJob } from '../jobs';
import { deliverMail } from '../mail';
import { tariffUsableBy } from '../tariffs/usable';
import { storedPrice } from '../sites/stored-results';
import { listScenarios } from '$lib/server/sites/scenario.service';
import { noticeLinks, noticeRecipients } from './notice-audience';

type Published = { tariffId: string; versionNumber: number };
type ForWorkspace = Published & { workspaceId: string };

/**
 * The workspaces with a site (or a scenario's override) on this tariff that may use it: a private tariff's
 * news never goes to another workspace, whatever ids its sites hold.
 */
async function affectedWorkspaces(tariffId: string): Promise<string[]> {
	const [tariff] = await db
		.select({ workspaceId: tariffs.workspaceId })
		.from(tariffs)
		.where(eq(tariffs.id, tariffId));
	if (!tariff) return [];
	const rows = await db
		.selectDistinct({ workspaceId: sites.workspaceId })
		.from(sites)
		.leftJoin(scenarios, eq(scenarios.siteId, sites.id))
		.where(and(isNull(sites.archivedAt), or(eq(sites.tariffId, tariffId), eq(scenarios.tariffId, tariffId))));
	return rows.map((r) => r.workspaceId).filter((id) => tariffUsableBy(id, tariff));
}

/** Per affected site, the baseline's annual cost on the previous version and on the new one, over the new version's first year. */
export async function costChanges(job: ForWorkspace) {
	const [tariff] = await db.select().from(tariffs).where(eq(tariffs.id, job.tariffId));
	const versions = await db.select().from(tariffVersions).where(eq(tariffVersions.tariffId, job.tariffId));
	const now = versions.find((v) => v.number === job.versionNumber);
	const before = versions.filter((v) => v.number < job.versionNumber).sort((a, b) => b.number - a.number)[0];
	if (!tariff || !now || !before || !tariffUsableBy(job.workspaceId, tariff)) return null;
	const year = Number(now.effectiveFrom.slice(0, 4));
	const affected = await db
		.select()
		.from(sites)
		.where(and(eq(sites.workspaceId, job.workspaceId), isNull(sites.archivedAt)));
	const lines = [];
	for (const site of affected) {
		const baseline = (await listScenarios(site.id)).find(
			(s) => s.isBaseline && !s.deletedAt && !s.archivedAt
		);
		if (!baseline || (baseline.tariffId ?? site.tariffId) !== job.tariffId) continue;
		const period = { start: `${year}-01`, months: 12 };
		// Each pinned version is its own stored slot: a retried job, or the next notice, reads them back.
		const [old, next] = await Promise.all([
			storedPrice(site, baseline, period, before.number),
			storedPrice(site, baseline, period, now.number)
		]);
		if (!old.ok || !next.ok) continue;
		lines.push({
			site: site.name,
			siteId: site.id,
			currency: site.currency,
			before: old.result.totals.cost,
			after: next.result.totals.cost
		});
	}
	return { tariff, now, before, year, lines };
}

/**
 * Who published, in the notice's words: a public version comes from the library's curator (never "the
 * utility": Runrate copies the utility's rates, the utility publishes nothing here); a workspace's own
 * tariff from one of its members.
 */
export function publisherWords(tariff: { workspaceId: string | null }): string {
	return tariff.workspaceId === null ? "The library's curator" : 'A member of your workspace';
}

/** The notice's first line: who published which version of which tariff, from when. */
export function noticeTitle(
	tariff: { workspaceId: string | null; name: string; utility: string },
	version: { number: number; effectiveFrom: string }
): string {
	const verb = tariff.workspaceId === null ? 'published' : 'saved';
	return `${publisherWords(tariff)} ${verb} version ${version.number} of ${tariff.name} (${tariff.utility}), in force from ${version.effectiveFrom}`;
}

/**
 * One workspace's notice: recorded for its pages (the workspace page and the sites dashboard) and
 * e-mailed to its owners and editors (`noticeRecipients`: the members who can act on it), with links to
 * the tariff and to each affected site.
 */
const perWorkspace = defineJob<ForWorkspace>('tariff-version-notice', async (job) => {
	const changes = await costChanges(job);
	if (!changes || changes.lines.length === 0) return;
	const [ws] = await db.select().from(workspaces).where(eq(workspaces.id, job.workspaceId));
	const recipients = await noticeRecipients(job.workspaceId);
	const { tariff, now, year, lines } = changes;
	const title = noticeTitle(tariff, now);
	const body = [
		`What the baseline of each of your sites on this tariff would cost in ${year}, on the previous version and on the new one:`,
		...lines.map((l) => {
			const delta = l.after - l.before;
			return `- ${l.site}: ${money(l.before, l.currency)} → ${money(l.after, l.currency)} a year (${delta >= 0 ? '+' : '−'}${money(Math.abs(delta), l.currency)})`;
		}),
		now.changeNote ? `\nThe curator's note: ${now.changeNote}` : '',
		'\nEstimates, not bills.'
	].join('\n');
	const origin = env.ORIGIN ?? 'http://127.0.0.1:3000';
	const links = [
		`The tariff: ${origin}/tariffs/${tariff.id}`,
		...lines.map((l) => `${l.site}: ${origin}/sites/${l.siteId}`)
	].join('\n');
	for (const to of recipients)
		await deliverMail({
			to,
			subject: `Tariff change: ${tariff.name} (${ws?.name ?? 'your workspace'})`,
			text: `${title}.\n\n${body}\n\n${links}\n\nYou get this as an owner or editor of ${ws?.name ?? 'the workspace'}.\n`
		});
	// Recorded after the mail went out: a retried job sends again rather than silently dropping the e-mail.
	await db
		.insert(notices)
		.values({ workspaceId: job.workspaceId, dedupeKey: `${now.id}:${job.workspaceId}`, title, body })
		.onConflictDoNothing();
});

const fanOut = defineJob<Published>('tariff-version-published', async (job) => {
	for (const workspaceId of await affectedWorkspaces(job.tariffId))
		await perWorkspace.send({ ...job, workspaceId });
});

/** Queues the notices of a new public version; returns at once, the queue does the work (and retries it). */
export const announceVersion = (job: Published) => fanOut.send(job);

/** A workspace's latest notices, each with its links (the tariff, the sites billed on it). */
// Built once: the dashboard and the workspace page show the latest notices on every view.
const recentNoticesQuery = db
	.select()
	.from(notices)
	.where(eq(notices.workspaceId, sql.placeholder('workspaceId')))
	.orderBy(desc(notices.createdAt))
	.limit(sql.placeholder('limit'))
	.prepare('recent_notices');

export async function recentNotices(workspaceId: string, limit = 10) {
	const rows = await recentNoticesQuery.execute({ workspaceId, limit });
	return Promise.all(
		rows.map(async (row) => ({
			id: row.id,
			title: row.title,
			body: row.body,
			createdAt: row.createdAt.toISOString(),
			links: await noticeLinks(workspaceId, row.dedupeKey)
		}))
	);
}
