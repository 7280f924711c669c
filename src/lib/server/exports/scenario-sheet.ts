import { monthHeading } from './formats';
import { OUTPUT_LABELS, STATUS_LABELS } from '$lib/text/output-labels';
import { type ScenarioSheetInput, writeDevices } from './scenario-devices';
import { writeTotals } from './scenario-totals';
import { DEVICE } from './scenario-layout';
import { writeSchedules } from './scenario-schedules';

export type { ScenarioSheetInput } from './scenario-devices';

const INPUT_HEADERS = [
	'Device',
	OUTPUT_LABELS.category,
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
	`${OUTPUT_LABELS.capital} (equipment)`,
	OUTPUT_LABELS.maintenance,
	OUTPUT_LABELS.kwhPerYear,
	OUTPUT_LABELS.costPerYear
];

const WIDTHS = [30, 12, 9, 10, 8, 8, 8, 7, 10, 10, 7, 16, 30, 10, 10, 10, 11, 11, 8, 11, 12, 12, 12, 12];

const SHEET_NOTE =
	'Pale cells are inputs you can change: kW, kWh and cost are formulas over them, the Tariff sheet and the values Runrate computed (the schedules table below the equipment). A device’s cost is its share of the bill as Runrate allocates it (its energy at the rates its own hours met, a tiered charge at the month’s average tier rate, riders, its kW at each demand peak, and taxes on those); fixed charges and the minimum bill are shared cost.';

/** Writes one scenario's sheet: the equipment table, its totals, one-off costs and the schedules table. */
export function writeScenarioSheet(input: ScenarioSheetInput, title: string): void {
	const { out, layout, figures, formats, scenario } = input;
	out.widths([...WIDTHS, ...Array<number>(24).fill(11)]);
	out.line(1, `${title} · ${STATUS_LABELS[scenario.status]}`, 13, 'title');
	out.line(2, SHEET_NOTE, 24, 'note');
	out.sheet.getRow(2).height = 48;
	out.text(3, DEVICE.name, 'Equipment (inputs)', 'bold');
	out.text(3, DEVICE.runKw, 'Results (formulas)', 'bold');
	out.text(3, DEVICE.kwh, 'kWh by month', 'bold');
	out.text(3, DEVICE.cost, 'Cost by month (the device’s share)', 'bold');
	const months = figures.months.map(monthHeading);
	out.headers(4, 1, [...INPUT_HEADERS, ...months, ...months]);
	writeDevices(input);
	writeTotals(input);

	const paid =
		scenario.status === 'installed'
			? `${OUTPUT_LABELS.oneOffCosts}: all of this scenario’s ${OUTPUT_LABELS.capital.toLowerCase()}, as it is installed (already paid for)`
			: `${OUTPUT_LABELS.oneOffCosts} (part of the ${OUTPUT_LABELS.capital.toLowerCase()}, with the equipment)`;
	out.text(layout.firstOneOff - 2, 1, paid, 'heading');
	out.headers(layout.firstOneOff - 1, 1, ['One-off cost', 'Amount', 'Note']);
	if (scenario.oneOffCosts.length === 0) out.text(layout.firstOneOff, 1, 'None');
	scenario.oneOffCosts.forEach((cost, i) => {
		out.text(layout.firstOneOff + i, 1, cost.label);
		out.number(layout.firstOneOff + i, 2, cost.amount, formats.money, 'input');
		if (cost.note) out.text(layout.firstOneOff + i, 3, cost.note);
	});
	writeSchedules(input);
	// The schedules table may reach past the monthly columns.
	const widths = WIDTHS.length + 24;
	if (layout.schedules.last > widths)
		out.widths(Array<number>(layout.schedules.last - widths).fill(11), widths + 1);
}
