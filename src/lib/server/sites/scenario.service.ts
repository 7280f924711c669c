// Scenarios of a site: listing, creating (blank or as a copy) and the one-step changes (rename, baseline,
// archive, delete, restore, tariff).
import { and, asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { devices, scenarios } from '../db/schema';
import { audit, type Actor } from '../services/audit.service';
import type { SiteRow } from './site.service';

/** A scenario as stored. */
export type ScenarioRow = typeof scenarios.$inferSelect;

/** Live scenarios first by position; archived ones after; deleted ones only while they can be undone. */
export async function listScenarios(siteId: string) {
	return db
		.select()
		.from(scenarios)
		.where(eq(scenarios.siteId, siteId))
		.orderBy(asc(scenarios.position), asc(scenarios.createdAt));
}

/** One scenario by id, or null; the caller checks access (guard). */
export async function findScenario(scenarioId: string) {
	const [row] = await db.select().from(scenarios).where(eq(scenarios.id, scenarioId));
	return row ?? null;
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

/** One change to a scenario; a request carries exactly one. */
export type ScenarioChange =
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

/** How long a deleted scenario can be restored. */
export const UNDO_MS = 10 * 60 * 1000;

/** Applies one change and records it in the trail; making a baseline unmarks the old one. */
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
