import {
	dayProfile,
	EQUIPMENT_CATEGORIES,
	type EquipmentInput,
	equipmentSchema,
	INTERVAL_HOURS,
	SLOTS_PER_DAY,
	STANDARD_DAY,
	unitWatts
} from '$lib/calc';
import type { Category } from '$lib/components/charts/chart-style';

/**
 * The load over one representative day, drawn in the browser from the equipment list alone. It uses
 * the core's own schedule and power rules (`dayProfile`, `unitWatts`), so the chart
 * agrees with the calculation: in each quarter hour a device draws standby plus (running − standby) ×
 * the fraction of the quarter hour it runs, and nothing outside its active months. Standby runs on
 * days its schedule skips, as the calculation counts it. The day is an ordinary 24-hour one.
 */

export type DayType = 'weekday' | 'weekend';
export type { Category };

export interface ProfileOptions {
	dayType: DayType;
	/** 1–12. */
	month: number;
}

export interface ProfilePoint {
	/** Start of the quarter hour, in hours after midnight: 0, 0.25, … 23.75. */
	hour: number;
	kw: number;
}

/** The summed kW of one category's devices, one value per quarter hour (96). */
export interface CategoryLayer {
	category: Category;
	kw: number[];
}

export interface ProfileLayers {
	/** In the order of the categories list, only categories with a device drawing that day. */
	layers: CategoryLayer[];
	/** Devices left out because a field needs fixing (the calculation would refuse them too). */
	skipped: number;
}

/** The fields the load depends on; a device without a name or costs yet still draws. */
const loadSchema = equipmentSchema.pick({
	category: true,
	quantity: true,
	power: true,
	standbyWatts: true,
	dutyPercent: true,
	months: true,
	schedule: true
});

const hourOf = (slot: number) => slot * INTERVAL_HOURS;

/** Each category's kW over the day. */
export function profileLayers(equipment: readonly EquipmentInput[], options: ProfileOptions): ProfileLayers {
	const byCategory = new Map<Category, number[]>();
	let skipped = 0;
	for (const input of equipment) {
		const parsed = loadSchema.safeParse(input);
		if (!parsed.success) {
			skipped += 1;
			continue;
		}
		const device = parsed.data;
		if (device.months && !device.months.includes(options.month)) continue;
		const { onFraction } = dayProfile(device.schedule, options.dayType === 'weekend', STANDARD_DAY);
		// The core's runningKw and standbyKw, on the fields the load needs (they take a whole device).
		const runKw = (unitWatts(device.power) * device.quantity * device.dutyPercent) / 100 / 1000;
		const idleKw = (device.standbyWatts * device.quantity) / 1000;
		let kw = byCategory.get(device.category);
		if (!kw) byCategory.set(device.category, (kw = new Array<number>(SLOTS_PER_DAY).fill(0)));
		for (let slot = 0; slot < SLOTS_PER_DAY; slot++) {
			kw[slot] = (kw[slot] ?? 0) + idleKw + (runKw - idleKw) * (onFraction[slot] ?? 0);
		}
	}
	const layers = EQUIPMENT_CATEGORIES.flatMap((category) => {
		const kw = byCategory.get(category);
		return kw ? [{ category, kw }] : [];
	});
	return { layers, skipped };
}

/**
 * Total kW in each quarter hour of a representative day (96 points).
 * Example: a 120 W pump on 06:00–18:00 gives 0.12 kW at hours 6 to 17.75 and 0 elsewhere.
 */
export function dailyProfile(equipment: readonly EquipmentInput[], options: ProfileOptions): ProfilePoint[] {
	return totalPoints(profileLayers(equipment, options).layers);
}

/** The layers summed into one point per quarter hour. */
export function totalPoints(layers: readonly CategoryLayer[]): ProfilePoint[] {
	return Array.from({ length: SLOTS_PER_DAY }, (_, slot) => ({
		hour: hourOf(slot),
		kw: layers.reduce((sum, layer) => sum + (layer.kw[slot] ?? 0), 0)
	}));
}

/** One category's band of the stacked area: from `y0` up to `y1` kW in each quarter hour. */
export interface StackedLayer {
	category: Category;
	bands: { hour: number; y0: number; y1: number }[];
}

/** The layers stacked one on another, the first at the bottom. */
export function stackLayers(layers: readonly CategoryLayer[]): StackedLayer[] {
	const base = new Array<number>(SLOTS_PER_DAY).fill(0);
	return layers.map((layer) => ({
		category: layer.category,
		bands: base.map((y0, slot) => {
			const y1 = y0 + (layer.kw[slot] ?? 0);
			base[slot] = y1;
			return { hour: hourOf(slot), y0, y1 };
		})
	}));
}

/** The mean kW of each clock hour (24 rows), for the table beside the chart. */
export function hourlyKw(points: readonly ProfilePoint[]): ProfilePoint[] {
	const perHour = Math.round(1 / INTERVAL_HOURS);
	return Array.from({ length: 24 }, (_, hour) => {
		const slots = points.slice(hour * perHour, (hour + 1) * perHour);
		return { hour, kw: slots.reduce((sum, point) => sum + point.kw, 0) / perHour };
	});
}

/** kWh over the day: each quarter hour's kW × ¼ h. */
export function dayKwh(points: readonly ProfilePoint[]): number {
	return points.reduce((sum, point) => sum + point.kw * INTERVAL_HOURS, 0);
}

/**
 * The SVG path of one stacked band as steps, since each quarter hour's draw is flat across it: along
 * the tops from midnight to midnight, then back along the bottoms. `x` and `y` map hours and kW to
 * pixels (the chart's scales).
 */
export function stepAreaPath(
	bands: StackedLayer['bands'],
	x: (hour: number) => number,
	y: (kw: number) => number
): string {
	const at = (hour: number, kw: number) => `${round(x(hour))},${round(y(kw))}`;
	const tops = bands.flatMap((band) => [at(band.hour, band.y1), at(band.hour + INTERVAL_HOURS, band.y1)]);
	const bottoms = [...bands]
		.reverse()
		.flatMap((band) => [at(band.hour + INTERVAL_HOURS, band.y0), at(band.hour, band.y0)]);
	return tops.length ? `M${[...tops, ...bottoms].join('L')}Z` : '';
}

const round = (pixels: number) => Math.round(pixels * 100) / 100;
