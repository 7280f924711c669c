import { type Equipment, type Scenario, type ScenarioResult, unitWatts } from '$lib/calc';
import { type SheetWriter, a1, columnName } from './cells';
import { activeMonthsText, categoryWords, scheduleText } from './device-words';
import type { ScenarioFigures } from './figures';
import type { Formats } from './formats';
import type { MonthlyPlan } from './monthly-plan';
import { DEVICE, type ScenarioLayout, scheduleColumn } from './scenario-layout';
import type { TariffCells } from './tariff-sheet';
import { devicesAsValues } from './value-lines';

export interface ScenarioSheetInput {
	out: SheetWriter;
	layout: ScenarioLayout;
	scenario: Scenario;
	figures: ScenarioFigures;
	result: ScenarioResult;
	tariff: TariffCells;
	monthly: MonthlyPlan;
	formats: Formats;
}

const sum = (values: readonly number[]) => values.reduce((total, value) => total + value, 0);

/**
 * The formulas of the first device's row; every other row holds copies of them (shared formulas), and
 * the monthly ones also shift across the 12 months. A device finds its schedule's computed values by
 * its schedule number: INDEX(column of the schedules table, schedule no.).
 */
function masterFormulas(input: ScenarioSheetInput) {
	const { layout, tariff } = input;
	const r = (col: number) => a1(col, layout.firstDevice);
	const fixed = (col: number) => `$${columnName(col)}${layout.firstDevice}`;
	const run = fixed(DEVICE.runKw);
	const standby = fixed(DEVICE.standbyKw);
	const schedule = (col: number) => `INDEX(${scheduleColumn(layout, col)},${fixed(DEVICE.scheduleNo)})`;
	const drawn = (weighted: number, onWeighted: number) =>
		`${standby}*${schedule(weighted)}+(${run}-${standby})*${schedule(onWeighted)}`;
	// The cost: kWh × the rate every kWh pays this month, each time-of-use charge at the device's own
	// price-weighted hours, each demand rate × its kW at the peak; with taxes; rounded to the cent.
	const terms = [`${r(DEVICE.kwh)}*${columnName(DEVICE.cost)}$${layout.rateRow}`];
	for (const block of layout.schedules.tou.values()) terms.push(drawn(block.weighted, block.onWeighted));
	tariff.demand.forEach((cells, k) => {
		const first = layout.schedules.atPeak[k];
		// Tiered or ratcheted demand has no one price per kW: the costs are then values (value-lines.ts).
		const perKw = 'perKw' in cells ? cells.perKw : '0';
		if (first === undefined) return;
		const share = schedule(first);
		terms.push(`${perKw}*IF(ISNUMBER(${share}),${standby}+${share}*(${run}-${standby}),0)`);
	});
	const taxed = tariff.taxRate ? `(${terms.join('+')})*(1+${tariff.taxRate})` : terms.join('+');
	return {
		unitWatts: `IF(ISNUMBER(${r(DEVICE.watts)}),${r(DEVICE.watts)},IF(${r(DEVICE.phases)}=3,SQRT(3),1)*${r(DEVICE.volts)}*${r(DEVICE.amps)}*${r(DEVICE.powerFactor)})`,
		runKw: `${r(DEVICE.unitWatts)}*${r(DEVICE.quantity)}*${r(DEVICE.dutyPercent)}/100/1000`,
		standbyKw: `${r(DEVICE.standbyWatts)}*${r(DEVICE.quantity)}/1000`,
		capital: `${r(DEVICE.quantity)}*(${r(DEVICE.purchase)}+${r(DEVICE.install)})`,
		maintenancePerYear: `${r(DEVICE.quantity)}*${r(DEVICE.maintenance)}`,
		annualKwh: `SUM(${r(DEVICE.kwh)}:${r(DEVICE.kwh + 11)})`,
		annualCost: `SUM(${r(DEVICE.cost)}:${r(DEVICE.cost + 11)})`,
		kwh: drawn(layout.schedules.hours, layout.schedules.onHours),
		cost: `ROUND(${taxed},2)`
	};
}

type Masters = ReturnType<typeof masterFormulas>;

function writeInputs(
	input: ScenarioSheetInput,
	device: Equipment,
	d: number,
	row: number,
	texts: string[]
): void {
	const { out, figures, formats } = input;
	const put = (col: number, value: number | null, format: string) =>
		out.number(row, col, value, format, 'input');
	out.text(row, DEVICE.name, device.name);
	out.text(row, DEVICE.category, categoryWords(device.category));
	put(DEVICE.quantity, device.quantity, formats.whole);
	if (device.power.watts !== undefined) put(DEVICE.watts, device.power.watts, '#,##0.##');
	else {
		put(DEVICE.amps, device.power.amps, '0.00');
		put(DEVICE.volts, device.power.volts, '0');
		put(DEVICE.powerFactor, device.power.powerFactor, '0.00');
		put(DEVICE.phases, device.power.phases, formats.whole);
	}
	put(DEVICE.standbyWatts, device.standbyWatts, '#,##0.##');
	put(DEVICE.dutyPercent, device.dutyPercent, '0.##');
	out.text(row, DEVICE.months, activeMonthsText(device.months));
	const g = figures.deviceSchedule[d] ?? 0;
	out.text(row, DEVICE.schedule, texts[g] ?? '');
	out.number(row, DEVICE.scheduleNo, g + 1, formats.whole, 'input');
	put(DEVICE.purchase, device.purchaseCost, formats.money);
	put(DEVICE.install, device.installCost, formats.money);
	put(DEVICE.lifeYears, device.lifeYears, formats.whole);
	put(DEVICE.maintenance, device.maintenancePerYear, formats.money);
}

function writeResults(input: ScenarioSheetInput, masters: Masters, d: number, row: number): void {
	const { out, layout, figures, result, formats } = input;
	const device = input.scenario.equipment[d];
	if (!device) return;
	const first = row === layout.firstDevice;
	// A formula is written once, in the first device's row; `last` is the last column its copies fill.
	const put = (
		col: number,
		key: keyof Masters,
		value: number,
		format: string,
		masterCol = col,
		last = col
	) => {
		const master = a1(masterCol, layout.firstDevice);
		if (!first || col !== masterCol) out.shared(row, col, master, value, format);
		else if (last === col && layout.lastDevice === row) out.formula(row, col, masters[key], value, format);
		else out.master(row, col, masters[key], `${master}:${a1(last, layout.lastDevice)}`, value, format);
	};
	put(DEVICE.unitWatts, 'unitWatts', unitWatts(device.power), '#,##0.##');
	put(DEVICE.runKw, 'runKw', figures.runKw[d] ?? 0, formats.kw);
	put(DEVICE.standbyKw, 'standbyKw', figures.standbyKw[d] ?? 0, formats.kw);
	put(DEVICE.capital, 'capital', device.quantity * (device.purchaseCost + device.installCost), formats.money);
	put(
		DEVICE.maintenancePerYear,
		'maintenancePerYear',
		device.quantity * device.maintenancePerYear,
		formats.money
	);
	const asValues = devicesAsValues(input.figures.tariff);
	const kwh = result.periods.map((period) => period.equipment[d]?.kwh ?? 0);
	const cost = result.periods.map((period) => period.equipment[d]?.cost ?? 0);
	kwh.forEach((value, m) => {
		put(DEVICE.kwh + m, 'kwh', value, formats.kwh, DEVICE.kwh, DEVICE.kwh + kwh.length - 1);
		if (asValues) out.number(row, DEVICE.cost + m, cost[m] ?? 0, formats.money);
		else
			put(DEVICE.cost + m, 'cost', cost[m] ?? 0, formats.money, DEVICE.cost, DEVICE.cost + cost.length - 1);
	});
	put(DEVICE.annualKwh, 'annualKwh', sum(kwh), formats.kwh);
	put(DEVICE.annualCost, 'annualCost', sum(cost), formats.money);
}

/** One row per device: its inputs as values, its kW, kWh and cost per month as formulas over them. */
export function writeDevices(input: ScenarioSheetInput): void {
	const masters = masterFormulas(input);
	const texts = input.figures.schedules.map((schedule) => scheduleText(schedule.schedule));
	input.scenario.equipment.forEach((device, d) => {
		const row = input.layout.firstDevice + d;
		writeInputs(input, device, d, row, texts);
		writeResults(input, masters, d, row);
	});
}
