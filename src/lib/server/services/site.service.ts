import { and, asc, eq, inArray, isNull, or } from 'drizzle-orm';
import type { SiteInput } from '$lib/forms/site.schema';
import { db } from '../db';
import { devices, scenarios, sites, type DeviceSpec } from '../db/schema';
import { audit, changedFields, type Actor } from '../workspaces/audit';

export type SiteRow = typeof sites.$inferSelect;
export type ScenarioRow = typeof scenarios.$inferSelect;

/** A write based on a stale copy: someone else saved first. */
export class StaleWrite extends Error {
	constructor(readonly currentRevision: number) {
		super('Someone else saved a change here while you were editing.');
	}
}

export async function listSites(workspaceId: string) {
	return db
		.select()
		.from(sites)
		.where(and(eq(sites.workspaceId, workspaceId), isNull(sites.archivedAt)))
		.orderBy(asc(sites.name));
}

export async function findSite(siteId: string) {
	const [site] = await db.select().from(sites).where(eq(sites.id, siteId));
	return site ?? null;
}

/** A new site starts with an empty baseline scenario, so there is always one to compare against. */
export async function createSite(workspaceId: string, input: SiteInput, actor: Actor): Promise<string> {
	return db.transaction(async (tx) => {
		const [site] = await tx
			.insert(sites)
			.values({ ...input, workspaceId })
			.returning({ id: sites.id });
		const [baseline] = await tx
			.insert(scenarios)
			.values({ siteId: site!.id, name: 'What is installed now', isBaseline: true })
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

export async function updateSite(site: SiteRow, expectedRevision: number, input: SiteInput, actor: Actor) {
	await db.transaction(async (tx) => {
		const [row] = await tx
			.update(sites)
			.set({ ...input, revision: site.revision + 1, updatedAt: new Date() })
			.where(and(eq(sites.id, site.id), eq(sites.revision, expectedRevision)))
			.returning({ id: sites.id });
		if (!row) throw new StaleWrite(site.revision);
		const changes = changedFields(site as unknown as Record<string, unknown>, input);
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'site',
			entityId: site.id,
			action: 'updated',
			summary: `Changed ${Object.keys(changes).join(', ') || 'nothing'}`,
			changes
		});
	});
}

/** Live scenarios first by position; archived ones after; deleted ones only while they can be undone. */
export async function listScenarios(siteId: string) {
	return db
		.select()
		.from(scenarios)
		.where(eq(scenarios.siteId, siteId))
		.orderBy(asc(scenarios.position), asc(scenarios.createdAt));
}

export async function findScenario(scenarioId: string) {
	const [row] = await db.select().from(scenarios).where(eq(scenarios.id, scenarioId));
	return row ?? null;
}

export async function listDevices(scenarioId: string) {
	return db.select().from(devices).where(eq(devices.scenarioId, scenarioId)).orderBy(asc(devices.position));
}

/** A blank scenario, or a copy of another one's equipment to try a change on. */
export async function createScenario(
	site: SiteRow,
	input: { name: string; description: string | null },
	fromId: string | null,
	actor: Actor
) {
	return db.transaction(async (tx) => {
		const existing = await tx
			.select({ position: scenarios.position })
			.from(scenarios)
			.where(eq(scenarios.siteId, site.id));
		const position = Math.max(0, ...existing.map((s) => s.position)) + 1;
		const source = fromId
			? (
					await tx
						.select()
						.from(scenarios)
						.where(and(eq(scenarios.id, fromId), eq(scenarios.siteId, site.id)))
				)[0]
			: null;
		const [created] = await tx
			.insert(scenarios)
			.values({
				siteId: site.id,
				name: input.name,
				description: input.description,
				position,
				tariffId: source?.tariffId ?? null,
				tariffVersion: source?.tariffVersion ?? null
			})
			.returning({ id: scenarios.id });
		if (source) {
			const rows = await tx
				.select()
				.from(devices)
				.where(eq(devices.scenarioId, source.id))
				.orderBy(asc(devices.position));
			if (rows.length)
				await tx
					.insert(devices)
					.values(rows.map((d) => ({ scenarioId: created!.id, position: d.position, spec: d.spec })));
		}
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'scenario',
			entityId: created!.id,
			action: 'created',
			summary: source ? `Duplicated "${source.name}" as "${input.name}"` : `Created scenario "${input.name}"`
		});
		return created!.id;
	});
}

type ScenarioChange =
	| { kind: 'rename'; name: string; description: string | null }
	| { kind: 'baseline' }
	| { kind: 'archive' }
	| { kind: 'unarchive' }
	| { kind: 'delete' }
	| { kind: 'restore' }
	| { kind: 'tariff'; tariffId: string | null; tariffVersion: number | null };

const WORDS: Record<ScenarioChange['kind'], string> = {
	rename: 'Renamed or described',
	baseline: 'Made the baseline',
	archive: 'Archived',
	unarchive: 'Brought back from the archive',
	delete: 'Deleted (can be undone for 10 minutes)',
	restore: 'Restored',
	tariff: 'Changed the tariff of'
};

export const UNDO_MS = 10 * 60 * 1000;

export async function changeScenario(
	site: SiteRow,
	scenario: ScenarioRow,
	change: ScenarioChange,
	actor: Actor
) {
	await db.transaction(async (tx) => {
		const now = new Date();
		const set: Partial<typeof scenarios.$inferInsert> =
			change.kind === 'rename'
				? { name: change.name, description: change.description }
				: change.kind === 'archive'
					? { archivedAt: now, isBaseline: false }
					: change.kind === 'unarchive'
						? { archivedAt: null }
						: change.kind === 'delete'
							? { deletedAt: now, isBaseline: false }
							: change.kind === 'restore'
								? { deletedAt: null }
								: change.kind === 'tariff'
									? { tariffId: change.tariffId, tariffVersion: change.tariffVersion }
									: { isBaseline: true };
		if (change.kind === 'baseline')
			await tx.update(scenarios).set({ isBaseline: false }).where(eq(scenarios.siteId, site.id));
		await tx
			.update(scenarios)
			.set({ ...set, revision: scenario.revision + 1, updatedAt: now })
			.where(eq(scenarios.id, scenario.id));
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'scenario',
			entityId: scenario.id,
			action: change.kind,
			summary: `${WORDS[change.kind]} "${scenario.name}"${change.kind === 'rename' && change.name !== scenario.name ? ` → "${change.name}"` : ''}`
		});
	});
}

/**
 * Saves a scenario's whole equipment list (order included) if nobody saved since `expectedRevision`.
 * The trail records which devices were added, removed or changed.
 */
export async function saveDevices(
	site: SiteRow,
	scenario: ScenarioRow,
	expectedRevision: number,
	specs: DeviceSpec[],
	actor: Actor
): Promise<number> {
	return db.transaction(async (tx) => {
		const [bumped] = await tx
			.update(scenarios)
			.set({ revision: expectedRevision + 1, updatedAt: new Date() })
			.where(and(eq(scenarios.id, scenario.id), eq(scenarios.revision, expectedRevision)))
			.returning({ revision: scenarios.revision });
		if (!bumped) throw new StaleWrite(scenario.revision);
		const before = await tx.select().from(devices).where(eq(devices.scenarioId, scenario.id));
		await tx.delete(devices).where(eq(devices.scenarioId, scenario.id));
		if (specs.length)
			await tx
				.insert(devices)
				.values(specs.map((spec, position) => ({ scenarioId: scenario.id, position, spec })));
		const names = (list: DeviceSpec[]) => new Map(list.map((d) => [d.name, JSON.stringify(d)]));
		const old = names(before.map((d) => d.spec));
		const now = names(specs);
		const added = [...now.keys()].filter((n) => !old.has(n));
		const removed = [...old.keys()].filter((n) => !now.has(n));
		const changed = [...now.keys()].filter((n) => old.has(n) && old.get(n) !== now.get(n));
		const parts = [
			added.length && `added ${added.join(', ')}`,
			removed.length && `removed ${removed.join(', ')}`,
			changed.length && `changed ${changed.join(', ')}`
		].filter(Boolean);
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'device',
			entityId: scenario.id,
			action: 'saved',
			summary: `Equipment of "${scenario.name}": ${parts.join('; ') || 'reordered'}`
		});
		return bumped.revision;
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
