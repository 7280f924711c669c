import type { ScenarioResult, Tariff } from '$lib/calc';
import { type SheetWriter, a1 } from './cells';
import type { ScenarioFigures } from './figures';
import { type Formats, monthHeading } from './formats';
import { monthCells } from './monthly-lines';
import { FIRST_MONTH_ROW, type MonthlyPlan, YEAR_ROW, monthlyPlan } from './monthly-plan';
import type { ScenarioLayout } from './scenario-layout';
import type { TariffCells } from './tariff-sheet';

export interface MonthlyScenario {
	name: string;
	plan: MonthlyPlan;
	layout: ScenarioLayout;
	figures: ScenarioFigures;
	tariff: TariffCells;
	result: ScenarioResult;
}

/** The scenarios' blocks side by side from column C, one empty column between them. */
export function monthlyPlans(tariffs: readonly Tariff[]): MonthlyPlan[] {
	let first = 3;
	return tariffs.map((tariff) => {
		const plan = monthlyPlan(tariff, first);
		first = plan.last + 2;
		return plan;
	});
}

const NOTE_TEXT =
	'Each month’s bill as formulas: kWh is the sum of the devices’ kWh; each charge line is rounded to the cent on its own (halves away from zero), as a bill does; a minimum-bill line adds the difference when the subtotal is below the minimum; each tax is its percent of the subtotal (with the minimum); the total is the sum of the rounded lines. Grey columns are working figures (kWh in the tiers, the exact tiered amount and its average rate, the kW at each demand peak).';

/** Writes the Monthly sheet: 12 months × scenarios, each charge line as a formula. */
export function writeMonthlySheet(
	out: SheetWriter,
	scenarios: readonly MonthlyScenario[],
	formats: Formats
): void {
	out.line(1, 'Monthly bills by scenario', 8, 'title');
	out.line(2, NOTE_TEXT, 16, 'note');
	out.sheet.getRow(2).height = 45;
	out.widths([12, 7]);
	out.headers(4, 1, ['Month', 'Days']);
	const months = scenarios[0]?.figures.months ?? [];
	months.forEach((month, m) => {
		out.text(FIRST_MONTH_ROW + m, 1, monthHeading(month));
		out.number(FIRST_MONTH_ROW + m, 2, month.days, formats.whole);
	});
	out.text(YEAR_ROW, 1, 'Year', 'bold');
	out.formula(
		YEAR_ROW,
		2,
		`SUM(${a1(2, FIRST_MONTH_ROW)}:${a1(2, YEAR_ROW - 1)})`,
		months.reduce((s, x) => s + x.days, 0),
		formats.whole
	);
	for (const scenario of scenarios) writeBlock(out, scenario, formats);
}

function writeBlock(out: SheetWriter, scenario: MonthlyScenario, formats: Formats): void {
	const { plan } = scenario;
	out.text(3, plan.first, scenario.name, 'bold');
	out.headers(4, plan.first, plan.headers);
	out.widths(Array<number>(plan.last - plan.first + 1).fill(13), plan.first);
	const totals = new Map<number, number>();
	scenario.result.periods.forEach((period, m) => {
		const row = FIRST_MONTH_ROW + m;
		const cells = monthCells({ ...scenario, period, m, row });
		for (const cell of cells) {
			// Working figures (tier kWh, exact amounts, average rates, peaks) are grey beside the lines.
			const shown = plan.lines.includes(cell.col) || [plan.kwh, plan.subtotal, plan.total].includes(cell.col);
			const look = shown ? 'plain' : 'helper';
			if (cell.formula === null) out.number(row, cell.col, cell.result, formats[cell.format], look);
			else out.formula(row, cell.col, cell.formula, cell.result, formats[cell.format], look);
			totals.set(cell.col, (totals.get(cell.col) ?? 0) + cell.result);
		}
	});
	const column = (col: number) => `SUM(${a1(col, FIRST_MONTH_ROW)}:${a1(col, YEAR_ROW - 1)})`;
	for (const col of [plan.kwh, ...plan.lines, plan.subtotal]) {
		const format = col === plan.kwh ? formats.kwh : formats.money;
		out.formula(YEAR_ROW, col, column(col), totals.get(col) ?? 0, format);
	}
	const annualCost = scenario.result.annualCost;
	out.formula(YEAR_ROW, plan.total, `ROUND(${column(plan.total)},2)`, annualCost, formats.money, 'bold');
}
