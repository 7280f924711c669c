import type { Equipment, Power } from './equipment.schema';

/**
 * Real power per unit, watts: `watts` as given, or volts × amps × power factor for single phase, or
 * √3 × volts × amps × power factor for balanced three phase with line-to-line volts. Power factor
 * defaults to 1, so nameplate amps × volts overstates a motor's real power.
 * Example: 10 A at 230 V three phase, power factor 0.8 → √3 × 230 × 10 × 0.8 ≈ 3187 W.
 */
export function unitWatts(power: Power): number {
	if (power.watts !== undefined) return power.watts;
	const phaseFactor = power.phases === 3 ? Math.sqrt(3) : 1;
	return phaseFactor * power.volts * power.amps * power.powerFactor;
}

/** Running power of all units, kW: per unit × quantity × duty percent. */
export function runningKw(device: Equipment): number {
	return (unitWatts(device.power) * device.quantity * device.dutyPercent) / 100 / 1000;
}

/** Power drawn by all units when the schedule has them off, kW. */
export function standbyKw(device: Equipment): number {
	return (device.standbyWatts * device.quantity) / 1000;
}
