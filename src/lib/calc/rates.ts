import type { Calendar, DayClass } from './calendar';
import { INTERVAL_HOURS, daysMatch, windowMask } from './clock';
import { demandWindowsOn } from './demand-windows';
import { type EnergyColumn, energyColumns } from './rate-columns';
import type { Tariff, TouCharge } from './tariff.schema';

function monthMask(months: readonly number[] | undefined): Uint8Array {
	const mask = new Uint8Array(13);
	if (!months) return mask.fill(1);
	for (const month of months) mask[month] = 1;
	return mask;
}

/**
 * How a tariff prices each 15-minute interval of the calendar's day classes. For tariff periods and
 * demand windows a holiday counts as a weekend when the tariff says `holidaysAsWeekends` (the default).
 */
export class RateBook {
	private readonly weights: Array<Array<number | Float64Array | undefined>>;
	private readonly masks: Array<Array<Uint8Array | null | undefined>>;
	private readonly touPrices = new Map<string, Float64Array>();
	private readonly touSlots = new Map<string, Uint8Array>();
	private readonly totals = new Map<Float64Array, number>();
	/** The sums an energy charge needs (see `EnergyColumn`); weights are per column. */
	readonly columns: readonly EnergyColumn[];
	/** Per energy charge, the index of its first column (found once: it is asked per charge and device). */
	private readonly firstColumns: readonly number[];

	constructor(
		readonly tariff: Tariff,
		readonly calendar: Calendar
	) {
		this.columns = energyColumns(tariff);
		this.firstColumns = tariff.energyCharges.map((_, e) =>
			this.columns.findIndex((column) => column.charge === e)
		);
		this.weights = this.columns.map(() => new Array(calendar.classes.length));
		this.masks = tariff.demandCharges.map(() => new Array(calendar.classes.length));
	}

	/** Saturdays, Sundays and, when the tariff says so, public holidays price as weekends. */
	pricesAsWeekend(day: DayClass): boolean {
		return day.weekend || (day.holiday && this.tariff.holidaysAsWeekends);
	}

	private touWeights(index: number, charge: TouCharge, day: DayClass): Float64Array {
		const season = charge.seasons.findIndex((entry) => entry.months.includes(day.month));
		const weekend = this.pricesAsWeekend(day);
		const key = `${index}|${season}|${weekend}|${day.shape.key}`;
		const known = this.touPrices.get(key);
		if (known) return known;
		const { periods = [], otherPerKwh = 0 } = charge.seasons[season] ?? {};
		const prices = new Float64Array(day.shape.minutes.length).fill(otherPerKwh);
		const assigned = new Uint8Array(prices.length);
		for (const period of periods) {
			if (!daysMatch(period.days, weekend)) continue;
			const mask = windowMask(period.windows, day.shape);
			for (let i = 0; i < prices.length; i++) {
				if (mask[i] === 1 && assigned[i] === 0) {
					prices[i] = period.perKwh;
					assigned[i] = 1;
				}
			}
		}
		this.touPrices.set(key, prices);
		return prices;
	}

	/**
	 * Each interval's slot in a tiered time-of-use season: the first matching period's index, else
	 * `periods.length` (the hours of no period).
	 */
	private slotsOf(index: number, charge: TouCharge, season: number, day: DayClass): Uint8Array {
		const weekend = this.pricesAsWeekend(day);
		const key = `${index}|${season}|${weekend}|${day.shape.key}`;
		const known = this.touSlots.get(key);
		if (known) return known;
		const periods = charge.seasons[season]?.periods ?? [];
		const slots = new Uint8Array(day.shape.minutes.length).fill(periods.length);
		for (let p = periods.length - 1; p >= 0; p--) {
			const period = periods[p];
			if (!period || !daysMatch(period.days, weekend)) continue;
			const mask = windowMask(period.windows, day.shape);
			for (let i = 0; i < slots.length; i++) if (mask[i] === 1) slots[i] = p;
		}
		this.touSlots.set(key, slots);
		return slots;
	}

	private slotWeights(index: number, column: Extract<EnergyColumn, { kind: 'tou-kwh' }>, day: DayClass) {
		const charge = this.tariff.energyCharges[column.charge] as TouCharge;
		const season = charge.seasons.findIndex((entry) => entry.months.includes(day.month));
		if (season !== column.season) return 0;
		const slots = this.slotsOf(column.charge, charge, season, day);
		const key = `slot|${index}|${this.pricesAsWeekend(day)}|${day.shape.key}`;
		let weights = this.touPrices.get(key);
		if (!weights) {
			weights = Float64Array.from(slots, (slot) => (slot === column.slot ? 1 : 0));
			this.touPrices.set(key, weights);
		}
		return weights;
	}

	/**
	 * Weights of an energy column on each interval of a day class: its price per kWh (flat, or
	 * time-of-use: the first matching period of the month's season, else `otherPerKwh`), or 1 where a
	 * tiered charge, or a tiered time-of-use season's period, counts kWh (its price depends on the
	 * billing period's total). A number when equal all day; a charge with `months` (any type,
	 * time-of-use included) weighs 0 outside them.
	 */
	energyWeights(index: number, classIndex: number): number | Float64Array {
		const known = this.weights[index]?.[classIndex];
		if (known !== undefined) return known;
		const column = this.columns[index];
		const charge = column && this.tariff.energyCharges[column.charge];
		const day = this.calendar.classes[classIndex];
		if (!column || !charge || !day) return 0;
		let weights: number | Float64Array;
		if (charge.months && !charge.months.includes(day.month)) weights = 0;
		else if (column.kind === 'tou-kwh') weights = this.slotWeights(index, column, day);
		else if (charge.type === 'tou') weights = this.touWeights(column.charge, charge, day);
		else weights = charge.type === 'flat' ? charge.perKwh : 1;
		const row = this.weights[index];
		if (row) row[classIndex] = weights;
		return weights;
	}

	/** The first column of energy charge e (its only one unless it is a tiered time-of-use charge). */
	firstColumn(charge: number): number {
		return this.firstColumns[charge] ?? -1;
	}

	/** Σ weight × hours over one day of the class. */
	weightedHours(index: number, classIndex: number): number {
		const weights = this.energyWeights(index, classIndex);
		if (typeof weights === 'number') return weights * (this.calendar.classes[classIndex]?.shape.hours ?? 0);
		let total = this.totals.get(weights);
		if (total === undefined) {
			total = weights.reduce((sum, weight) => sum + weight, 0) * INTERVAL_HOURS;
			this.totals.set(weights, total);
		}
		return total;
	}

	/**
	 * Intervals of a day class that a demand charge measures (months, days, windows; weekend windows on
	 * a day that prices as a weekend), or null for none.
	 */
	demandMask(index: number, classIndex: number): Uint8Array | null {
		const known = this.masks[index]?.[classIndex];
		if (known !== undefined) return known;
		const charge = this.tariff.demandCharges[index];
		const day = this.calendar.classes[classIndex];
		let mask: Uint8Array | null = null;
		const weekend = !!day && this.pricesAsWeekend(day);
		if (charge && day && monthMask(charge.months)[day.month] === 1 && daysMatch(charge.days, weekend)) {
			mask = windowMask(demandWindowsOn(charge, weekend), day.shape);
		}
		const row = this.masks[index];
		if (row) row[classIndex] = mask;
		return mask;
	}
}
