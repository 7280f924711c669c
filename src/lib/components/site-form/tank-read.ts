// Reads the site form's water (as typed) into the core's siteWaterSchema: volumes to litres, depths to
// metres, twelve monthly temperatures or one, and every message keyed by the box it belongs to.
import { MONTH_NAMES, siteWaterSchema, type SiteWater } from '$lib/calc';
import { type NumberDraft, numberDraft } from '$lib/components/fields/number-text';
import { isBlank, newTankId, type TankDraft, type WaterDraft } from './tank-form';
import {
	isUnit,
	litersFrom,
	metersFrom,
	TANK_DEPTH_UNITS,
	type TankDepthUnit,
	VOLUME_UNITS,
	type VolumeUnit
} from './tank-units';

const TANK_ID = /^[A-Za-z0-9_-]{1,40}$/;

/** A typed number in a unit, converted; text that is not a number goes on for the schema to name. */
function converted<U extends string>(
	text: string,
	unit: string,
	units: readonly U[],
	to: (n: number, u: U) => number
) {
	const draft = numberDraft(text);
	return typeof draft === 'number' && (units as readonly string[]).includes(unit)
		? to(draft, unit as U)
		: draft;
}

/**
 * The one temperature stored beside twelve monthly ones: the warmest month's, since warm water holds
 * the least oxygen and the designer sizes the air for it when no month is named (`designConditions`).
 * Held within the schema's bounds, so a bad month is named at its own box and not again at the
 * (hidden) single box.
 */
function yearTemperature(months: NumberDraft[]): number {
	const numbers = months.filter((m): m is number => typeof m === 'number');
	return Math.min(40, Math.max(0, numbers.length ? Math.max(...numbers) : 20));
}

/** A tank row as the schema's input; an id the form did not make (missing, malformed, repeated) is made anew. */
function tankInput(tank: TankDraft, seen: Set<string>) {
	const id = TANK_ID.test(tank.id) && !seen.has(tank.id) ? tank.id : newTankId();
	seen.add(id);
	const months = tank.monthlyTemperatureC.map(numberDraft);
	return {
		id,
		name: tank.name,
		volumeLiters: converted<VolumeUnit>(tank.volume, tank.volumeUnit, VOLUME_UNITS, litersFrom),
		depthM: converted<TankDepthUnit>(tank.depth, tank.depthUnit, TANK_DEPTH_UNITS, metersFrom),
		water: tank.water,
		salinityGPerKg: numberDraft(tank.salinityGPerKg),
		temperatureC: tank.byMonth ? yearTemperature(months) : numberDraft(tank.temperatureC),
		monthlyTemperatureC: tank.byMonth ? months : null,
		fishKg: numberDraft(tank.fishKg),
		feedKgPerDay: numberDraft(tank.feedKgPerDay),
		proteinPercent: numberDraft(tank.proteinPercent)
	};
}

/** The form's box for a schema path: `tanks.0.volumeLiters` is typed in `tanks.0.volume`. */
const BOX: Record<string, string> = { volumeLiters: 'volume', depthM: 'depth' };

/**
 * Where a problem shows: at its box, or above the form for one about the whole list. `rows` are the
 * posted row numbers of the tanks checked (blank rows were left out), by their place in the list.
 */
function boxOf(path: PropertyKey[], rows: number[]): string {
	const [first, index, field, month] = path.map(String);
	if (first !== 'tanks') return first ?? 'form';
	if (index === undefined || field === undefined) return 'form';
	const row = rows[Number(index)] ?? index;
	return ['tanks', row, BOX[field] ?? field, ...(month === undefined ? [] : [month])].join('.');
}

/** "Monthly water temperature must be…" said of the month it is: "March water temperature must be…". */
function worded(path: PropertyKey[], message: string): string {
	const month = path[2] === 'monthlyTemperatureC' ? MONTH_NAMES[Number(path[3])] : undefined;
	return month ? message.replace('Monthly water temperature', `${month} water temperature`) : message;
}

/**
 * The site's water from the form, in litres, metres and °C; or the messages by box name
 * ("tanks.0.volume": "Volume must be more than 0"), one a box.
 */
export function readWaterDraft(
	draft: WaterDraft
): { ok: true; water: SiteWater } | { ok: false; errors: Record<string, string> } {
	const errors: Record<string, string> = {};
	const tanks = draft.tanks.filter((tank) => !isBlank(tank));
	const rows = tanks.map((tank, i) => tank.row ?? i);
	tanks.forEach((tank, i) => {
		if (!isUnit(VOLUME_UNITS, tank.volumeUnit))
			errors[`tanks.${rows[i]}.volumeUnit`] = 'Pick the volume’s unit: litres, US gallons or m³';
		if (!isUnit(TANK_DEPTH_UNITS, tank.depthUnit))
			errors[`tanks.${rows[i]}.depthUnit`] = 'Pick the depth’s unit: metres or feet';
	});
	const seen = new Set<string>();
	const parsed = siteWaterSchema.safeParse({
		altitudeM: numberDraft(draft.altitudeM),
		tanks: tanks.map((tank) => tankInput(tank, seen))
	});
	if (!parsed.success)
		for (const issue of parsed.error.issues)
			errors[boxOf(issue.path, rows)] ??= worded(issue.path, issue.message);
	if (!parsed.success || Object.keys(errors).length) return { ok: false, errors };
	return { ok: true, water: parsed.data };
}
