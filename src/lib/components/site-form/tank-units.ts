// The units the site form offers for a tank's water and the echoes beside each box. A site's water is
// stored in metric (litres, metres, °C; the core's siteWaterSchema); the form lets a person type a
// volume in litres, US gallons or cubic metres and a depth in metres or feet, and converts to litres
// and metres when it reads the post. After a save the form shows the stored litres and metres, each
// with the other unit echoed beside it, so nothing typed is rounded away.
import { METERS_PER_FOOT } from '$lib/calc';
import { numberDraft } from '$lib/components/fields/number-text';
import { figure } from '$lib/text/numbers';

/**
 * The US liquid gallon is 231 cubic inches exactly (NIST SP 811, Appendix B): 3.785 411 784 L, derived
 * here from the international foot so the two factors agree to the last digit.
 */
export const LITERS_PER_US_GALLON = 231 * (METERS_PER_FOOT / 12) ** 3 * 1000;

export const VOLUME_UNITS = ['L', 'gal', 'm3'] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];
export const VOLUME_UNIT_WORDS: Record<VolumeUnit, string> = { L: 'litres', gal: 'US gallons', m3: 'm³' };
const LITERS_PER: Record<VolumeUnit, number> = { L: 1, gal: LITERS_PER_US_GALLON, m3: 1000 };

export const TANK_DEPTH_UNITS = ['m', 'ft'] as const;
export type TankDepthUnit = (typeof TANK_DEPTH_UNITS)[number];
export const DEPTH_UNIT_WORDS: Record<TankDepthUnit, string> = { m: 'metres', ft: 'feet' };
const METERS_PER: Record<TankDepthUnit, number> = { m: 1, ft: METERS_PER_FOOT };

/** A volume typed in `unit` as litres (the stored unit). */
export const litersFrom = (volume: number, unit: VolumeUnit): number => volume * LITERS_PER[unit];

/** A depth typed in `unit` as metres (the stored unit). */
export const metersFrom = (depth: number, unit: TankDepthUnit): number => depth * METERS_PER[unit];

/** Degrees Fahrenheit from Celsius: °F = °C × 9/5 + 32 (the definition of the two scales). */
export const fahrenheitFrom = (celsius: number): number => (celsius * 9) / 5 + 32;

/** Litres as US gallons. */
export const usGallonsFrom = (liters: number): number => liters / LITERS_PER_US_GALLON;

/** Metres as feet. */
export const feetFrom = (meters: number): number => meters / METERS_PER_FOOT;

/** Whether `unit` is one of `units` (a posted unit may be anything). */
export const isUnit = <U extends string>(units: readonly U[], unit: string): unit is U =>
	(units as readonly string[]).includes(unit);

/** The number a box's text stands for, or null while it is empty or not a number. */
function typed(text: string): number | null {
	const draft = numberDraft(text);
	return typeof draft === 'number' ? draft : null;
}

/** Beside the volume: the other unit ("= 264.2 US gal" for litres, "= 3,785.4 L" for gallons). */
export function volumeEcho(text: string, unit: string): string | undefined {
	const volume = typed(text);
	if (volume === null || !isUnit(VOLUME_UNITS, unit)) return undefined;
	const liters = litersFrom(volume, unit);
	return unit === 'L' ? `= ${figure(usGallonsFrom(liters), 1)} US gal` : `= ${figure(liters, 1)} L`;
}

/** Beside the depth: metres as feet, feet as metres. */
export function depthEcho(text: string, unit: string): string | undefined {
	const depth = typed(text);
	if (depth === null || !isUnit(TANK_DEPTH_UNITS, unit)) return undefined;
	return unit === 'm' ? `= ${figure(feetFrom(depth), 2)} ft` : `= ${figure(metersFrom(depth, 'ft'), 2)} m`;
}

/** Beside a water temperature in °C: the same in °F. */
export function temperatureEcho(text: string): string | undefined {
	const celsius = typed(text);
	return celsius === null ? undefined : `= ${figure(fahrenheitFrom(celsius), 1)} °F`;
}

/** Beside the altitude in metres: the same in feet. */
export function altitudeEcho(text: string): string | undefined {
	const meters = typed(text);
	return meters === null ? undefined : `= ${figure(feetFrom(meters), 0)} ft`;
}
