/** Categories that are usually mains-powered equipment in the water itself (common practice, no source). */
export const IN_WATER_CATEGORIES = new Set(['water-pump', 'heater', 'uv', 'chiller']);

type Flagged = { category?: string; inWater?: boolean; outdoor?: boolean };

/**
 * True when a scenario holds mains-powered equipment marked as in water (pumps, heaters, UV, chillers),
 * or anything on an outdoor receptacle: the app then shows the electrical-safety caution.
 */
export function hasMainsInWater(devices: Flagged[]): boolean {
	return devices.some((d) => (d.inWater && IN_WATER_CATEGORIES.has(d.category ?? '')) || d.outdoor);
}

export const ELECTRICAL_CAUTION =
	'Mains-powered equipment in or near water can kill. Put every in-water pump, heater, UV steriliser and chiller, and every outdoor receptacle, on ground-fault protection (a GFCI or RCD), use weatherproof enclosures and drip loops, and have a licensed electrician do the wiring to your local electrical code, which comes before anything Runrate says.';
