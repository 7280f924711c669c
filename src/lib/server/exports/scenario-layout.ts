import { a1, columnName, on } from './cells';
import type { ScenarioFigures } from './figures';

/** Columns of a scenario sheet's equipment table, one row per device. */
export const DEVICE = {
	name: 1,
	category: 2,
	quantity: 3,
	watts: 4,
	amps: 5,
	volts: 6,
	powerFactor: 7,
	phases: 8,
	unitWatts: 9,
	standbyWatts: 10,
	dutyPercent: 11,
	months: 12,
	schedule: 13,
	scheduleNo: 14,
	runKw: 15,
	standbyKw: 16,
	purchase: 17,
	install: 18,
	lifeYears: 19,
	maintenance: 20,
	capital: 21,
	maintenancePerYear: 22,
	annualKwh: 23,
	annualCost: 24,
	/** First of 12 monthly kWh columns, then 12 monthly cost columns. */
	kwh: 25,
	cost: 37
} as const;

/** Columns of the schedules table below the equipment: the computed values per schedule and month. */
export interface ScheduleColumns {
	devices: number;
	runKw: number;
	standbyKw: number;
	hours: number;
	onHours: number;
	/** Per time-of-use energy charge index: first columns of its two 12-month blocks. */
	tou: Map<number, { weighted: number; onWeighted: number }>;
	/** Per demand charge: first column of its 12-month block. */
	atPeak: number[];
	last: number;
}

/** Where everything sits on one scenario's sheet. */
export interface ScenarioLayout {
	sheet: string;
	firstDevice: number;
	lastDevice: number;
	totalRow: number;
	sharedRow: number;
	billRow: number;
	roundingRow: number;
	/** Per month, in the cost columns: the rate every kWh pays (riders, flat charges, tiered average). */
	rateRow: number;
	firstOneOff: number;
	lastOneOff: number;
	scheduleTitle: number;
	firstSchedule: number;
	lastSchedule: number;
	schedules: ScheduleColumns;
}

export const FIRST_DEVICE_ROW = 5;

export function scenarioLayout(
	sheet: string,
	figures: ScenarioFigures,
	devices: number,
	oneOffs: number
): ScenarioLayout {
	const lastDevice = FIRST_DEVICE_ROW + devices - 1;
	const totalRow = lastDevice + 1;
	const firstOneOff = totalRow + 7;
	const lastOneOff = firstOneOff + oneOffs - 1;
	const scheduleTitle = Math.max(lastOneOff, firstOneOff) + 2;
	const firstSchedule = scheduleTitle + 4;
	let col = 5;
	const block = () => {
		const first = col;
		col += 12;
		return first;
	};
	const hours = block();
	const onHours = block();
	const tou = new Map<number, { weighted: number; onWeighted: number }>();
	figures.tariff.energyCharges.forEach((charge, e) => {
		if (charge.type === 'tou') tou.set(e, { weighted: block(), onWeighted: block() });
	});
	const atPeak = figures.tariff.demandCharges.map(() => block());
	return {
		sheet,
		firstDevice: FIRST_DEVICE_ROW,
		lastDevice,
		totalRow,
		sharedRow: totalRow + 1,
		billRow: totalRow + 2,
		roundingRow: totalRow + 3,
		rateRow: totalRow + 4,
		firstOneOff,
		lastOneOff,
		scheduleTitle,
		firstSchedule,
		lastSchedule: firstSchedule + figures.schedules.length - 1,
		schedules: { devices: 2, runKw: 3, standbyKw: 4, hours, onHours, tou, atPeak, last: col - 1 }
	};
}

/** A cell of the schedules table, for schedule g (0-based), as a same-sheet fixed reference. */
export function scheduleCell(layout: ScenarioLayout, g: number, col: number): string {
	return a1(col, layout.firstSchedule + g, true);
}

/** A column of the schedules table for INDEX by schedule number: `E$30:E$41`, its column free to shift. */
export function scheduleColumn(layout: ScenarioLayout, col: number): string {
	const name = columnName(col);
	return `${name}$${layout.firstSchedule}:${name}$${layout.lastSchedule}`;
}

/** A device's kWh (or cost) cell for month m (0-based), from another sheet. */
export function deviceMonthRange(layout: ScenarioLayout, first: number, m: number): string | null {
	if (layout.lastDevice < layout.firstDevice) return null;
	const col = first + m;
	return on(layout.sheet, `${a1(col, layout.firstDevice, true)}:${a1(col, layout.lastDevice, true)}`);
}

/** A range of the schedules table's column, from another sheet (null when there are no schedules). */
export function scheduleRange(layout: ScenarioLayout, col: number): string | null {
	if (layout.lastSchedule < layout.firstSchedule) return null;
	return on(layout.sheet, `${a1(col, layout.firstSchedule, true)}:${a1(col, layout.lastSchedule, true)}`);
}
