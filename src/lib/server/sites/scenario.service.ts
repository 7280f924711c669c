// Scenarios of a site: listing, creating (blank or as a copy) and the one-step changes (rename, baseline,
// archive, delete, restore, tariff).
import { and, asc, eq, isNull } from 'drizzle-orm';
import { z } from 'zod';
import { parseRequest, type RequestIssue, type ScenarioStatus } from '$lib/calc';
import { db } from '../db';
import { devices, scenarios } from '../db/schema';
import { audit, type Actor } from '../workspaces/audit';
import { MAX_REVISION } from '$lib/forms/storable';
import type { SiteRow } from './site.service';
import {
	descriptionSchema,
	nameSchema,
	oneOffCostsSchema,
	statusSchema,
	type ScenarioDetails
} from './scenario-details.schema';
import { saveScenarioDetails } from './scenario-details';

/** SQL: the scenario is its site's live baseline (neither deleted nor archived): the one the site is priced on. */
export const isLiveBaseline = () =>
	and(eq(scenarios.isBaseline, true), isNull(scenarios.deletedAt), isNull(scenarios.archivedAt));

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

/** A scenario as the machine API answers it; `tariff` null means the site's tariff. */
export const scenarioJson = (s: ScenarioRow) => ({
	id: s.id,
	siteId: s.siteId,
	name: s.name,
	description: s.description,
	isBaseline: s.isBaseline,
	status: s.status,
	oneOffCosts: s.oneOffCosts,
	archived: !!s.archivedAt,
	tariff: s.tariffId ? { tariffId: s.tariffId, tariffVersion: s.tariffVersion } : null,
	revision: s.revision,
	updatedAt: s.updatedAt
});

/** One scenario by id, or null; the caller checks access (guard). */
export async function findScenario(scenarioId: string) {
	const [row] = await db.select().from(scenarios).where(eq(scenarios.id, scenarioId));
	return row ?? null;
}

/** A blank scenario, or a copy of another one's equipment to try a change on. */
export async function createScenario(
	site: SiteRow,
	input: { name: string; description: string | null; status?: ScenarioStatus },
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
				status: input.status ?? 'proposed',
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

/** Whether a scenario deleted at `deletedAt` can still be restored (the undo window is open). */
export const undoWindowOpen = (deletedAt: Date) => deletedAt.getTime() > Date.now() - UNDO_MS;

/** Whether a PATCH body asks to undo a deletion: the one request that may reach a deleted scenario. */
export const asksToRestore = (body: unknown) =>
	!!body && typeof body === 'object' && (body as Record<string, unknown>).restored === true;

const ONE_CHANGE =
	'Send one change per request: the details (name, description, status, one-off costs), archived, baseline, restored or tariff';

/** The changes PATCH takes; the description also takes null (none). */
const changeSchema = z.strictObject({
	expectedRevision: z
		.number({ error: 'expectedRevision is the revision you edited, a whole number' })
		.int('expectedRevision is the revision you edited, a whole number')
		.min(0)
		.max(MAX_REVISION)
		.optional(),
	name: nameSchema.optional(),
	description: descriptionSchema,
	status: statusSchema.optional(),
	oneOffCosts: oneOffCostsSchema.optional(),
	archived: z.boolean({ error: 'archived is true or false' }).optional(),
	baseline: z
		.literal(true, { error: 'Send baseline: true; to move the baseline, make another scenario it' })
		.optional(),
	restored: z.literal(true, { error: 'Send restored: true to undo a deletion' }).optional(),
	tariff: z
		.object({
			tariffId: z.uuid({ error: 'Pick a tariff from the library' }),
			tariffVersion: z
				.number({ error: 'Pinned version must be a whole number' })
				.int('Pinned version must be a whole number')
				.min(1, 'Pinned version must be a whole number from 1')
				.nullable()
				.optional()
		})
		.nullable()
		.optional()
});

/**
 * Why a PATCH was refused: field issues (400), a stale `expectedRevision` (409 with the current one), or a
 * restore of a scenario that is not deleted (409).
 */
export type PatchRefusal = { issues: RequestIssue[] } | { conflict: number } | { notDeleted: true };

/**
 * Applies a PATCH body to a scenario: exactly one change (the details — name, description, status and
 * one-off costs — together count as one), a baseline only of a live scenario, a restore only of a
 * deleted one, a tariff the caller may choose. The details and the tariff are saved against
 * `expectedRevision` when it is sent, and recorded field by field in the trail.
 * Answers null when the change is saved, else why it was refused.
 */
export async function patchScenario(
	access: { site: SiteRow; scenario: ScenarioRow; user: Actor; viaGrant: boolean },
	body: unknown
): Promise<PatchRefusal | null> {
	const { site, scenario, user } = access;
	const parsed = parseRequest(changeSchema, body);
	if (!parsed.success) return { issues: parsed.error.issues };
	const change = parsed.data;
	const has = (key: string) => Object.hasOwn(body as object, key);
	const kinds = [
		['name', 'description', 'status', 'oneOffCosts'].some(has),
		...['archived', 'baseline', 'restored', 'tariff'].map(has)
	];
	if (kinds.filter(Boolean).length !== 1) return { issues: [{ path: '', message: ONE_CHANGE }] };

	if (change.restored) {
		if (!scenario.deletedAt) return { notDeleted: true };
		await changeScenario(site, scenario, { kind: 'restore' }, user);
	} else if (change.archived !== undefined) {
		await changeScenario(site, scenario, { kind: change.archived ? 'archive' : 'unarchive' }, user);
	} else if (change.baseline) {
		if (scenario.archivedAt)
			return { issues: [{ path: 'baseline', message: 'Bring the scenario back from the archive first' }] };
		await changeScenario(site, scenario, { kind: 'baseline' }, user);
	} else {
		const details: ScenarioDetails =
			change.tariff !== undefined
				? {
						tariff: change.tariff && {
							tariffId: change.tariff.tariffId,
							tariffVersion: change.tariff.tariffVersion ?? null
						}
					}
				: {
						name: change.name,
						description: has('description') ? change.description : undefined,
						status: change.status,
						oneOffCosts: change.oneOffCosts
					};
		const saved = await saveScenarioDetails(access, details, change.expectedRevision ?? null);
		if ('conflict' in saved || 'issues' in saved) return saved;
	}
	return null;
}
