import { and, asc, eq, inArray, isNull } from 'drizzle-orm';
import {
	airDesignSchema,
	EMPTY_SITE_WATER,
	scenarioDelivery,
	siteWaterSchema,
	type AirDesign,
	type Delivery,
	type SiteWater
} from '$lib/calc';
import { deliveryDevice } from '$lib/compare/delivery-device';
import { db } from '$lib/server/db';
import { devices, scenarios, sites, type DeviceSpec } from '$lib/server/db/schema';

/**
 * The stored design and water as the core's schemas read them today: a design or water that no longer
 * passes (written under older rules) counts as not given rather than stopping the page.
 */
export function storedDesign(stored: unknown): AirDesign | null {
	if (stored === null || stored === undefined) return null;
	const parsed = airDesignSchema.safeParse(stored);
	return parsed.success ? parsed.data : null;
}

export function storedWater(stored: unknown): SiteWater {
	const parsed = siteWaterSchema.safeParse(stored ?? EMPTY_SITE_WATER);
	return parsed.success ? parsed.data : EMPTY_SITE_WATER;
}

/** What one scenario delivers, from rows a caller already holds (no query). */
export function deliveryOf(specs: readonly DeviceSpec[], airDesign: unknown, water: unknown): Delivery {
	return scenarioDelivery(specs.map(deliveryDevice), storedDesign(airDesign), storedWater(water));
}

/** What the scenario page needs to show its delivery live as the list is edited. */
export interface DeliveryInputs {
	airDesign: AirDesign | null;
	water: SiteWater;
}

/**
 * What each of `scenarioIds` delivers, in two queries whatever their number (scenarios with their
 * sites' water, then all their devices). The caller has already checked that the person may read
 * each scenario; unknown or deleted ids are left out of the answer.
 */
export async function loadDeliveries(scenarioIds: readonly string[]): Promise<Map<string, Delivery>> {
	const answer = new Map<string, Delivery>();
	if (scenarioIds.length === 0) return answer;
	const ids = [...new Set(scenarioIds)];
	const rows = await db
		.select({ id: scenarios.id, airDesign: scenarios.airDesign, water: sites.water })
		.from(scenarios)
		.innerJoin(sites, eq(sites.id, scenarios.siteId))
		.where(and(inArray(scenarios.id, ids), isNull(scenarios.deletedAt)));
	const specs = new Map<string, DeviceSpec[]>(rows.map((r) => [r.id, []]));
	const stored = await db
		.select({ scenarioId: devices.scenarioId, spec: devices.spec })
		.from(devices)
		.where(inArray(devices.scenarioId, ids))
		.orderBy(asc(devices.scenarioId), asc(devices.position));
	for (const d of stored) specs.get(d.scenarioId)?.push(d.spec);
	for (const r of rows) answer.set(r.id, deliveryOf(specs.get(r.id) ?? [], r.airDesign, r.water));
	return answer;
}

/** The stored design and the site's water of one scenario the caller may read, for the scenario page. */
export function deliveryInputs(airDesign: unknown, water: unknown): DeliveryInputs {
	return { airDesign: storedDesign(airDesign), water: storedWater(water) };
}
