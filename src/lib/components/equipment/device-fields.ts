import { type EQUIPMENT_CATEGORIES, type EquipmentInput, MONTH_NAMES } from '$lib/calc';
import { figure } from '$lib/text/numbers';

export type PowerInput = EquipmentInput['power'];
export type PowerForm = 'watts' | 'amps';

/** Words for the categories, in the order the core lists them. */
export const CATEGORY_NAMES: Record<(typeof EQUIPMENT_CATEGORIES)[number], string> = {
	'water-pump': 'Water pump',
	'air-pump': 'Air pump',
	aerator: 'Aerator',
	lighting: 'Lighting',
	heater: 'Heater',
	chiller: 'Chiller',
	uv: 'UV steriliser',
	fan: 'Fan',
	controls: 'Controls',
	other: 'Other'
};

/** Which form a power is entered in: amps × volts once either of those is there, else watts. */
export function powerForm(power: unknown): PowerForm {
	if (power !== null && typeof power === 'object' && ('amps' in power || 'volts' in power)) return 'amps';
	return 'watts';
}

const finite = (value: unknown): number | undefined =>
	typeof value === 'number' && Number.isFinite(value) ? value : undefined;

/** Real watts per unit as typed so far, or undefined while a needed figure is missing. */
export function typedWatts(power: unknown): number | undefined {
	if (power === null || typeof power !== 'object') return undefined;
	const p = power as Record<string, unknown>;
	if (powerForm(power) === 'watts') return finite(p.watts);
	const amps = finite(p.amps);
	const volts = finite(p.volts);
	if (amps === undefined || volts === undefined) return undefined;
	const powerFactor = p.powerFactor === undefined ? 1 : finite(p.powerFactor);
	if (powerFactor === undefined) return undefined;
	return (p.phases === 3 ? Math.sqrt(3) : 1) * volts * amps * powerFactor;
}

/** A figure with up to `digits` decimals and thousands separators (one cached formatter per precision). */
export { figure };

/** The voltage assumed where a site gives none: 120 V receptacles (North American common practice). */
export const FALLBACK_VOLTS = 120;

/**
 * The voltage the equipment editor works at: the site's supply voltage (a 240 V site's amps echo and a
 * switched power entry use 240 V), or 120 V only when the site has none.
 */
export function editorVolts(supplyVolts: number | null | undefined): number {
	return typeof supplyVolts === 'number' && Number.isFinite(supplyVolts) && supplyVolts > 0
		? supplyVolts
		: FALLBACK_VOLTS;
}

/**
 * The other form of a power, as it is computed: "≈ 108 W" beside amps × volts, "0.83 A at 120 V"
 * beside watts (at the site's supply voltage, single phase, power factor 1). Empty while incomplete.
 */
export function powerEcho(power: unknown, supplyVolts = FALLBACK_VOLTS): string {
	const watts = typedWatts(power);
	if (watts === undefined) return '';
	if (powerForm(power) === 'amps') return `≈ ${figure(watts, watts < 10 ? 1 : 0)} W`;
	return `${figure(watts / supplyVolts, 2)} A at ${figure(supplyVolts, 0)} V`;
}

/**
 * The same device's power in the other form, so switching forms keeps what was typed: watts become
 * amps at the supply voltage (power factor 1, single phase); amps × volts become their watts.
 */
export function switchPower(power: unknown, form: PowerForm, supplyVolts = FALLBACK_VOLTS): PowerInput {
	const watts = typedWatts(power);
	if (form === 'watts') return { watts: watts === undefined ? 0 : round(watts, 1) };
	const amps = watts === undefined ? 0 : round(watts / supplyVolts, 2);
	return { amps, volts: supplyVolts, powerFactor: 1, phases: 1 };
}

function round(value: number, digits: number): number {
	const scale = 10 ** digits;
	return Math.round(value * scale) / scale;
}

/**
 * Writes a field of a device while it is being typed. The Equipment type says "number" because that
 * is the valid shape; an empty box holds nothing until the person fills it, which the schema reports.
 */
export function writeField(target: object, key: string, value: unknown): void {
	(target as Record<string, unknown>)[key] = value;
}

export { MONTH_NAMES };

/**
 * Active months after a toggle. No list means all year, and a toggle back to all twelve returns to no
 * list, so a device that runs all year stores nothing. An empty list stays (the schema refuses it).
 */
export function toggleMonth(months: readonly number[] | undefined, month: number): number[] | undefined {
	const current = months ?? [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12];
	const next = current.includes(month)
		? current.filter((m) => m !== month)
		: [...current, month].sort((a, b) => a - b);
	return next.length === 12 ? undefined : next;
}
