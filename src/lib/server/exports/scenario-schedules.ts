import { a1 } from './cells';
import { activeMonthsText, scheduleText } from './device-words';
import { monthHeading } from './formats';
import { DEVICE } from './scenario-layout';
import type { ScenarioSheetInput } from './scenario-devices';

const SCHEDULES_NOTE =
	'Values computed by Runrate, because these rules are no simple formula: the 15-minute grid in the site’s time zone (days when clocks change have 23 or 25 hours), weekdays, weekends and public holidays, time-of-use periods, and the moment of each demand peak. Hours in use: hours the devices draw power (standby or running) in their active months. Running hours: hours they run. Price-weighted hours: Σ price × hours over the month, for all hours and for the running hours. Share at peak: how much of its running power the schedule may draw at the interval the demand charge measures (blank: it draws nothing then). Change a schedule in Runrate, not here; everything above these values is a formula.';

/** The schedules table: per distinct schedule (and active months), the computed values per month. */
export function writeSchedules(input: ScenarioSheetInput): void {
	const { out, layout, figures, formats } = input;
	const cols = layout.schedules;
	const header = layout.firstSchedule - 2;
	out.text(layout.scheduleTitle, 1, 'Schedules as Runrate computed them (values)', 'heading');
	out.text(layout.scheduleTitle + 1, 1, SCHEDULES_NOTE, 'note');
	out.headers(header, 1, ['Schedule', 'Devices', 'Running kW (its devices)', 'Standby kW (its devices)']);
	const blocks: Array<[number, string]> = [
		[cols.hours, 'Hours in use'],
		[cols.onHours, 'Running hours']
	];
	for (const [e, block] of cols.tou) {
		const label = figures.tariff.energyCharges[e]?.label ?? '';
		blocks.push([block.weighted, `${label}: price-weighted hours`]);
		blocks.push([block.onWeighted, `${label}: running price-weighted hours`]);
	}
	figures.tariff.demandCharges.forEach((charge, k) => {
		const first = cols.atPeak[k];
		if (first !== undefined) blocks.push([first, `${charge.label}: share of running power at the peak`]);
	});
	for (const [first, label] of blocks) {
		out.headers(header, first, [label]);
		out.headers(header + 1, first, figures.months.map(monthHeading));
	}
	out.headers(header + 1, 1, ['', '', '', '']);
	const deviceRange = (col: number) =>
		`${a1(col, layout.firstDevice, true)}:${a1(col, layout.lastDevice, true)}`;
	figures.schedules.forEach((schedule, g) => {
		const row = layout.firstSchedule + g;
		const members = figures.deviceSchedule.flatMap((s, d) => (s === g ? [d] : []));
		const months = schedule.months.length === 12 ? undefined : schedule.months;
		out.text(row, 1, `${g + 1}: ${scheduleText(schedule.schedule)}; ${activeMonthsText(months)}`, 'bold');
		const sumIf = (col: number) => `SUMIF(${deviceRange(DEVICE.scheduleNo)},${g + 1},${deviceRange(col)})`;
		const total = (values: readonly number[]) => members.reduce((sum, d) => sum + (values[d] ?? 0), 0);
		out.formula(
			row,
			cols.devices,
			`COUNTIF(${deviceRange(DEVICE.scheduleNo)},${g + 1})`,
			members.length,
			formats.whole
		);
		out.formula(row, cols.runKw, sumIf(DEVICE.runKw), total(figures.runKw), formats.kw);
		out.formula(row, cols.standbyKw, sumIf(DEVICE.standbyKw), total(figures.standbyKw), formats.kw);
		const values = (first: number, list: ReadonlyArray<number | null>, format: string) =>
			list.forEach((value, m) => out.number(row, first + m, value, format));
		values(cols.hours, schedule.hours, formats.hours);
		values(cols.onHours, schedule.onHours, formats.hours);
		for (const [e, block] of cols.tou) {
			const sums = schedule.tou.get(e);
			values(block.weighted, sums?.weighted ?? [], formats.hours);
			values(block.onWeighted, sums?.onWeighted ?? [], formats.hours);
		}
		cols.atPeak.forEach((first, k) => values(first, schedule.atPeak[k] ?? [], formats.fraction));
	});
}
