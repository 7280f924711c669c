// A scenario's equipment list: reading it, and saving the whole list against a revision.
import { and, asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { devices, scenarios, type DeviceSpec } from '../db/schema';
import { audit, type Actor } from '../workspaces/audit';
import type { ScenarioRow } from './scenario.service';
import { StaleWrite, type SiteRow } from './site.service';

/** A scenario's devices in list order. */
export async function listDevices(scenarioId: string) {
	return db.select().from(devices).where(eq(devices.scenarioId, scenarioId)).orderBy(asc(devices.position));
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
