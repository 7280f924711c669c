// Sites: listing, creating and editing a site, and where a tariff is used across sites.
import { and, asc, eq, inArray, isNull, or } from 'drizzle-orm';
import type { SiteInput } from '$lib/forms/site.schema';
import { db } from '../db';
import { scenarios, sites, workspaces } from '../db/schema';
import type { RequestIssue, SiteWater } from '$lib/calc';
import { audit, changedFields, type Actor } from '../workspaces/audit';
import { chooserFor } from '../tariffs/usable';
import { tariffChoiceIssue } from './tariff-choice';
import { waterChangeWords } from './water-change-words';

/** A site as stored. */
export type SiteRow = typeof sites.$inferSelect;

/**
 * A site's fields as the form and the API give them. `water` (altitude and tanks) is optional: left
 * out, a new site starts with none and an edited one keeps what it has, so a caller that does not know
 * about tanks never erases them.
 */
export type SiteFields = SiteInput & { water?: SiteWater };

/** A write based on a stale copy: someone else saved first. */
export class StaleWrite extends Error {
	constructor(readonly currentRevision: number) {
		super('Someone else saved a change here while you were editing.');
	}
}

/** The workspace's live sites, by name. */
export async function listSites(workspaceId: string) {
	return db
		.select()
		.from(sites)
		.where(and(eq(sites.workspaceId, workspaceId), isNull(sites.archivedAt)))
		.orderBy(asc(sites.name));
}

/** One site by id, or null; the caller checks access (guard). */
export async function findSite(siteId: string) {
	const [site] = await db.select().from(sites).where(eq(sites.id, siteId));
	return site ?? null;
}

/** The workspace a site belongs to, as its pages name it (id and name). */
export async function siteWorkspace(site: SiteRow) {
	const [workspace] = await db
		.select({ id: workspaces.id, name: workspaces.name })
		.from(workspaces)
		.where(eq(workspaces.id, site.workspaceId));
	return workspace;
}

/** A new site starts with an empty baseline scenario, so there is always one to compare against. */
export async function createSite(workspaceId: string, input: SiteFields, actor: Actor): Promise<string> {
	return db.transaction(async (tx) => {
		const [site] = await tx
			.insert(sites)
			.values({ ...input, workspaceId })
			.returning({ id: sites.id });
		const [baseline] = await tx
			.insert(scenarios)
			.values({ siteId: site!.id, name: 'What is installed now', isBaseline: true, status: 'installed' })
			.returning({ id: scenarios.id });
		await audit(tx, actor, {
			workspaceId,
			siteId: site!.id,
			entity: 'site',
			entityId: site!.id,
			action: 'created',
			summary: `Created site ${input.name}`
		});
		await audit(tx, actor, {
			workspaceId,
			siteId: site!.id,
			entity: 'scenario',
			entityId: baseline!.id,
			action: 'created',
			summary: 'Created the baseline scenario'
		});
		return site!.id;
	});
}

/**
 * Saves a site's fields if nobody saved since `expectedRevision`; the trail records what changed, the
 * water in words (each tank added, removed or changed). Without `water` the stored one stays.
 */
export async function updateSite(site: SiteRow, expectedRevision: number, input: SiteFields, actor: Actor) {
	const { water, ...fields } = input;
	await db.transaction(async (tx) => {
		const [row] = await tx
			.update(sites)
			.set({ ...fields, ...(water ? { water } : {}), revision: site.revision + 1, updatedAt: new Date() })
			.where(and(eq(sites.id, site.id), eq(sites.revision, expectedRevision)))
			.returning({ id: sites.id });
		if (!row) throw new StaleWrite(site.revision);
		const changes = changedFields(site as unknown as Record<string, unknown>, fields);
		const waterWords = water ? waterChangeWords(site.water, water) : [];
		if (waterWords.length) changes.water = { from: site.water, to: water };
		const named = Object.keys(changes).filter((key) => key !== 'water');
		const summary = [...(named.length ? [`Changed ${named.join(', ')}`] : []), ...waterWords];
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'site',
			entityId: site.id,
			action: 'updated',
			summary: summary.join('; ') || 'Changed nothing',
			changes
		});
	});
}

/** Where a tariff is used, among the workspaces given: sites on it, and scenarios that override to it. */
export async function tariffUsage(tariffId: string, workspaceIds: string[]) {
	if (workspaceIds.length === 0) return [];
	const rows = await db
		.select({
			siteId: sites.id,
			siteName: sites.name,
			siteTariff: sites.tariffId,
			scenarioId: scenarios.id,
			scenarioName: scenarios.name,
			scenarioTariff: scenarios.tariffId,
			deletedAt: scenarios.deletedAt
		})
		.from(sites)
		.leftJoin(scenarios, eq(scenarios.siteId, sites.id))
		.where(
			and(
				inArray(sites.workspaceId, workspaceIds),
				isNull(sites.archivedAt),
				or(eq(sites.tariffId, tariffId), eq(scenarios.tariffId, tariffId))
			)
		);
	const bySite = new Map<
		string,
		{ siteId: string; siteName: string; wholeSite: boolean; scenarios: string[] }
	>();
	for (const r of rows) {
		const entry = bySite.get(r.siteId) ?? {
			siteId: r.siteId,
			siteName: r.siteName,
			wholeSite: r.siteTariff === tariffId,
			scenarios: []
		};
		if (r.scenarioTariff === tariffId && r.scenarioName && !r.deletedAt) entry.scenarios.push(r.scenarioName);
		bySite.set(r.siteId, entry);
	}
	return [...bySite.values()];
}

/**
 * Saves a site's fields for the API: a tariff the caller may choose, and `expectedRevision` the site's
 * own (checked here as well as in the write, so the new revision is always the one after the caller's).
 * Answers the new revision, or why nothing was written (a 409 names the revision now stored).
 */
export async function changeSite(
	access: { site: SiteRow; user: Actor; viaGrant: boolean },
	expectedRevision: number,
	input: SiteFields
): Promise<
	{ ok: true; revision: number } | { ok: false; issues: RequestIssue[] } | { ok: false; conflict: number }
> {
	const { site, user } = access;
	const tariffIssue = await tariffChoiceIssue(chooserFor(access), input);
	if (tariffIssue) return { ok: false, issues: [tariffIssue] };
	if (expectedRevision !== site.revision) return { ok: false, conflict: site.revision };
	try {
		await updateSite(site, expectedRevision, input, user);
	} catch (e) {
		if (e instanceof StaleWrite)
			return { ok: false, conflict: (await findSite(site.id))?.revision ?? e.currentRevision };
		throw e;
	}
	return { ok: true, revision: site.revision + 1 };
}
