// A scenario's equipment list: reading it, and saving the whole list against a revision.
import { and, asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { devices, scenarios, type DeviceSpec } from '../db/schema';
import { audit, type Actor } from '../workspaces/audit';
import type { ScenarioRow } from './scenario.service';
import { StaleWrite, type SiteRow } from './site.service';
import { deviceTrail, onlyReordered } from './device-trail';

/** A scenario's devices in list order. */
export async function listDevices(scenarioId: string) {
	return db.select().from(devices).where(eq(devices.scenarioId, scenarioId)).orderBy(asc(devices.position));
}

/**
 * Saves a scenario's whole equipment list (order included) if nobody saved since `expectedRevision`.
 * The trail records each device added, removed or changed, with the old and new value of each field
 * changed; a save that changes nothing records nothing.
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
		const old = before.sort((a, b) => a.position - b.position).map((d) => d.spec);
		const entries = deviceTrail(old, specs, site.currency);
		const event = {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'device' as const,
			entityId: scenario.id
		};
		// One event a device actually added, removed or changed; rows sent back untouched record nothing.
		for (const entry of entries)
			await audit(tx, actor, {
				...event,
				action: entry.action,
				summary: `Equipment of "${scenario.name}": ${entry.words}`,
				changes: entry.changes ?? undefined
			});
		if (entries.length === 0 && onlyReordered(old, specs))
			await audit(tx, actor, {
				...event,
				action: 'reordered',
				summary: `Equipment of "${scenario.name}": reordered`
			});
		return bumped.revision;
	});
}
