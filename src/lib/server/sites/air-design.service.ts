// A scenario's air design: kept with the scenario so the designer reopens it, and its air pumps put in
// the equipment list as one row the designer owns (a second save replaces that row, never adds one).
// The form action and the API's PUT both save through `saveAirDesign`, after the guard's editor check.
import { and, asc, eq } from 'drizzle-orm';
import {
	type AirDesign,
	type AirDesignResult,
	designAir,
	designConditions,
	type RequestIssue,
	TYPICAL_AIR_PUMPS
} from '$lib/calc';
import { figure } from '$lib/text/numbers';
import { db } from '../db';
import { devices, scenarios, type DeviceSpec } from '../db/schema';
import { listAirPumps } from '../workspaces/air-pumps';
import { audit, type Actor } from '../workspaces/audit';
import { deviceSpecSchema } from './device-specs';
import { airDesignWords, withAirPumpRow } from './air-pump-row';
import type { ScenarioRow } from './scenario.service';
import type { SiteRow } from './site.service';

/** Who saves, on which scenario of which site; `viaGrant` marks a guest of the site. */
export type AirDesignAccess = { site: SiteRow; scenario: ScenarioRow; user: Actor; viaGrant: boolean };

export type AirDesignSaved =
	| { ok: true; revision: number; device: DeviceSpec; devices: DeviceSpec[]; result: AirDesignResult }
	| { ok: false; conflict: number }
	| { ok: false; issues: RequestIssue[] };

/** The most rows a scenario holds (the equipment list's own limit). */
const MAX_DEVICES = 2000;

/** The design and its figures in the site's water, as the designer shows them. */
export function workOut(site: SiteRow, design: AirDesign): AirDesignResult {
	return designAir(design, designConditions(site.water, design.aeration?.tankId ?? null));
}

/**
 * Why the design cannot be saved on this scenario: a tank that is not the site's, a pump source that
 * is not one the caller may choose (a typical class, one of the workspace's own pumps for its members,
 * or the one already saved), or a pump that cannot reach the design's pressure.
 */
async function problems(access: AirDesignAccess, design: AirDesign, result: AirDesignResult) {
	const issues: RequestIssue[] = [];
	const tankId = design.aeration?.tankId ?? null;
	if (tankId !== null && !access.site.water.tanks.some((tank) => tank.id === tankId))
		issues.push({
			path: 'aeration.tankId',
			message: "That tank is not among the site's tanks: choose another"
		});
	const source = design.pumpSource;
	const saved = access.scenario.airDesign?.pumpSource;
	const keptAsSaved = saved && source && saved.kind === source.kind && saved.id === source.id;
	if (source?.kind === 'typical' && !keptAsSaved && !TYPICAL_AIR_PUMPS.some((p) => p.id === source.id))
		issues.push({ path: 'pumpSource', message: 'That is not one of the typical air pumps' });
	if (source?.kind === 'workspace' && !keptAsSaved) {
		const own = access.viaGrant ? [] : await listAirPumps(access.site.workspaceId);
		if (!own.some((p) => p.id === source.id))
			issues.push({ path: 'pumpSource', message: "That pump is not one of this workspace's air pumps" });
	}
	if (!result.pump)
		issues.push({
			path: 'pump',
			message:
				result.totalAirLpm > 0
					? `${design.pump.name} cannot deliver the ${figure(result.pressureKPa, 1)} kPa this design needs: choose a stronger pump`
					: 'This design needs no air, so there is no air pump to add'
		});
	return issues;
}

/**
 * Saves the design and its pumps' row if the scenario is still at `expectedRevision`: one transaction
 * bumps the revision, keeps the design, rewrites the list with the row and records it in the trail.
 */
export async function saveAirDesign(
	access: AirDesignAccess,
	expectedRevision: number,
	design: AirDesign
): Promise<AirDesignSaved> {
	const { site, scenario, user } = access;
	if (expectedRevision !== scenario.revision) return { ok: false, conflict: scenario.revision };
	const result = workOut(site, design);
	const issues = await problems(access, design, result);
	if (issues.length || !result.pump) return { ok: false, issues };
	// Read before the write: any save of the list since would have moved the revision the write checks.
	const stored = await db
		.select()
		.from(devices)
		.where(eq(devices.scenarioId, scenario.id))
		.orderBy(asc(devices.position));
	const list = withAirPumpRow(
		stored.map((d) => d.spec),
		result.pump
	);
	const device = list.find((d) => d.fromAirDesign)!;
	if (list.length > MAX_DEVICES)
		return { ok: false, issues: [{ path: '', message: 'A scenario holds at most 2000 devices' }] };
	if (!deviceSpecSchema.safeParse(device).success)
		return {
			ok: false,
			issues: [
				{
					path: 'pump',
					message: `This design would need ${result.pump.count} of this pump: choose a bigger one`
				}
			]
		};
	const selection = result.pump;
	return db.transaction(async (tx) => {
		const [bumped] = await tx
			.update(scenarios)
			.set({ airDesign: design, revision: expectedRevision + 1, updatedAt: new Date() })
			.where(and(eq(scenarios.id, scenario.id), eq(scenarios.revision, expectedRevision)))
			.returning({ revision: scenarios.revision });
		if (!bumped) {
			const [now] = await tx
				.select({ revision: scenarios.revision })
				.from(scenarios)
				.where(eq(scenarios.id, scenario.id));
			return { ok: false as const, conflict: now?.revision ?? scenario.revision };
		}
		await tx.delete(devices).where(eq(devices.scenarioId, scenario.id));
		await tx
			.insert(devices)
			.values(list.map((spec, position) => ({ scenarioId: scenario.id, position, spec })));
		await audit(tx, user, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'scenario',
			entityId: scenario.id,
			action: 'air-design',
			summary: airDesignWords(selection)
		});
		return { ok: true as const, revision: bumped.revision, device, devices: list, result };
	});
}
