/**
 * The electrical-safety caution and the two things it is shown for: mains-powered equipment in the
 * water, and equipment on an outdoor circuit. Both are common practice for ground-fault protection
 * (GFCI in the US National Electrical Code 210.8, RCD in IEC 60364-7-702 for pools and fountains;
 * cited from memory); the app carries no code text and tells growers to follow their local code.
 */

/** Categories that are usually mains-powered equipment in the water itself (common practice, no source). */
export const IN_WATER_CATEGORIES = new Set(['water-pump', 'heater', 'uv', 'chiller']);

/** Whether the equipment editor asks "Is it in the water?" in the row itself for a device of this category. */
export function asksInWater(category: string | undefined): boolean {
	return IN_WATER_CATEGORIES.has(category ?? '');
}

type Flagged = { category?: string; inWater?: boolean; outdoor?: boolean };

/** True when a device marked as in water is one that usually sits in it on mains power (pump, heater, UV, chiller). */
export function hasMainsInWater(devices: readonly Flagged[]): boolean {
	return devices.some((d) => Boolean(d.inWater) && IN_WATER_CATEGORIES.has(d.category ?? ''));
}

/** True when any device, whatever its category, is on an outdoor circuit or receptacle. */
export function hasOutdoorCircuit(devices: readonly Flagged[]): boolean {
	return devices.some((d) => Boolean(d.outdoor));
}

/**
 * Whether the electrical-safety caution shows: its words name both mains in water and outdoor
 * receptacles, so either one is reason enough.
 */
export function needsElectricalCaution(devices: readonly Flagged[]): boolean {
	return hasMainsInWater(devices) || hasOutdoorCircuit(devices);
}

/** The caution's words, the same on the scenario page, the comparison and the workbook. */
export const ELECTRICAL_CAUTION =
	'Mains-powered equipment in or near water can kill. Put every in-water pump, heater, UV steriliser and chiller, and every outdoor receptacle, on ground-fault protection (a GFCI or RCD), use weatherproof enclosures and drip loops, and have a licensed electrician do the wiring to your local electrical code, which comes before anything Runrate says.';

/**
 * The air and water designer's caution: the air pump stays out of the water, which is what keeps
 * mains power away from it, and its circuit still gets ground-fault protection (common practice).
 */
export const AIR_PUMP_CAUTION =
	'Keep air pumps above the water line, dry and out of splash, with a loop in the air line or a check valve so water cannot run back into the pump. Plug them into a circuit with ground-fault protection (a GFCI or RCD). Your local electrical code and a licensed electrician have the last word on the wiring, before anything Runrate says.';
