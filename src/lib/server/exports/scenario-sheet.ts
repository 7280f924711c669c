import { monthHeading } from './formats';
import { type ScenarioSheetInput, writeDevices } from './scenario-devices';
import { writeTotals } from './scenario-totals';
import { DEVICE } from './scenario-layout';
import { writeSchedules } from './scenario-schedules';

export type { ScenarioSheetInput } from './scenario-devices';

const INPUT_HEADERS = [
	'Device',
	'Category',
	'Quantity',
	'Watts per unit',
	'Amps',
	'Volts',
	'Power factor',
	'Phases',
	'Unit watts',
	'Standby watts per unit',
	'Duty %',
	'Active months',
	'Schedule',
	'Schedule no. (table below)',
	'Running kW',
	'Standby kW',
	'Purchase per unit',
	'Installation per unit',
	'Life (years)',
	'Maintenance per unit a year',
	'Capital cost',
	'Maintenance a year',
	'kWh a year',
	'Cost a year'
];

const WIDTHS = [30, 12, 9, 10, 8, 8, 8, 7, 10, 10, 7, 16, 30, 10, 10, 10, 11, 11, 8, 11, 12, 12, 12, 12];

const SHEET_NOTE =
	'Pale cells are inputs you can change: kW, kWh and cost are formulas over them, the Tariff sheet and the values Runrate computed (the schedules table below the equipment). A device’s cost is its share of the bill as Runrate allocates it (its energy at the rates its own hours met, a tiered charge at the month’s average tier rate, riders, its kW at each demand peak, and taxes on those); fixed charges and the minimum bill are shared cost.';

/** Writes one scenario's sheet: the equipment table, its totals, one-off costs and the schedules table. */
export function writeScenarioSheet(input: ScenarioSheetInput, title: string): void {
	const { out, layout, figures, formats, scenario } = input;
	out.widths([...WIDTHS, ...Array<number>(24).fill(11)]);
	out.line(1, title, 13, 'title');
	out.line(2, SHEET_NOTE, 24, 'note');
	out.sheet.getRow(2).height = 48;
	out.text(3, DEVICE.name, 'Equipment (inputs)', 'bold');
	out.text(3, DEVICE.runKw, 'Results (formulas)', 'bold');
	out.text(3, DEVICE.kwh, 'kWh by month', 'bold');
	out.text(3, DEVICE.cost, 'Cost by month (the device’s share)', 'bold');
	const months = figures.months.map(monthHeading);
	out.headers(4, 1, [...INPUT_HEADERS, ...months, ...months]);
	out.freeze(4, 1);
	writeDevices(input);
	writeTotals(input);

	out.text(layout.firstOneOff - 2, 1, 'One-off costs (part of the capital cost)', 'heading');
	out.headers(layout.firstOneOff - 1, 1, ['One-off cost', 'Amount']);
	if (scenario.oneOffCosts.length === 0) out.text(layout.firstOneOff, 1, 'None');
	scenario.oneOffCosts.forEach((cost, i) => {
		out.text(layout.firstOneOff + i, 1, cost.label);
		out.number(layout.firstOneOff + i, 2, cost.amount, formats.money, 'input');
	});
	writeSchedules(input);
	// The schedules table may reach past the monthly columns.
	const widths = WIDTHS.length + 24;
	if (layout.schedules.last > widths)
		out.widths(Array<number>(layout.schedules.last - widths).fill(11), widths + 1);
}
