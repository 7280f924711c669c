import type { CompareRequest, CompareResponse } from '$lib/calc';
import { ASSUMPTIONS_SHEET, writeAssumptionsSheet } from './assumptions-sheet';
import { CASH_FLOW_SHEET, lifecycleCell, writeCashFlowSheet } from './cashflow-sheet';
import { SheetWriter, columnRange, sumOf } from './cells';
import { scenarioFigures } from './figures';
import { formatsFor, scenarioSheetName } from './formats';
import { FIRST_MONTH_ROW, MONTHLY_SHEET, YEAR_ROW, monthlyCell } from './monthly-plan';
import { type MonthlyScenario, monthlyPlans, writeMonthlySheet } from './monthly-sheet';
import { DEVICE, scenarioLayout } from './scenario-layout';
import { writeScenarioSheet } from './scenario-sheet';
import { SUMMARY_SHEET, type SummarySources, summaryCells, writeSummarySheet } from './summary-sheet';
import { printSetup } from './print-setup';
import type { TariffOrigin } from './tariff-provenance';
import { writeTariffSheet } from './tariff-sheet';
import { tariffUses } from './tariff-uses';
import { WATER_AIR_SHEET, type WaterAirScenario, writeWaterAirSheet } from './water-air-sheet';
import { type Frozen, addSheet, streamingWorkbook, workbookFile } from './workbook-file';

export interface ComparisonExport {
	/** e.g. "Alder Creek hatchery (invented)"; used in sheet titles. */
	title: string;
	/** ISO timestamp the export was made. */
	generatedAt: string;
	/** The exact parsed request that was given to compare(). */
	request: CompareRequest;
	/** compare(request) — the figures the workbook must reproduce. */
	response: CompareResponse;
	/** Per scenario, same order: where it comes from, which tariff it was priced on and where that is from. */
	scenarios: {
		siteName: string;
		tariffName: string;
		tariffVersion: number | null;
		tariffOrigin: TariffOrigin | null;
	}[];
	/** The emission factor's source as the user typed it (e.g. "Example value, not a published factor"). */
	emissionSource: string;
	/** Safety cautions to print (plain sentences), may be empty. */
	cautions: string[];
	/** What each scenario delivers and its air design: the "Water and air" sheet (none when absent). */
	waterAir?: WaterAirScenario[];
}

const TARIFF_SHEET = 'Tariff';
/** The Monthly sheet's year row, as a month index. */
const YEAR = YEAR_ROW - FIRST_MONTH_ROW;
/** The panes most sheets keep in view: their title and header rows, and the name column. */
const HEADS: Frozen = { rows: 4, cols: 1 };

/**
 * The comparison as a workbook whose figures are live formulas: a spreadsheet program that
 * recalculates it gets `response` again, to the cent. Inputs are values; what no simple formula can
 * express (the 15-minute grid, time-of-use periods, demand peaks) is held as computed values, and the
 * sheets say so. Cached results are written too, for programs that show a file without recalculating.
 */
export async function comparisonWorkbook(input: ComparisonExport): Promise<Buffer> {
	const { request } = input;
	// Programs that keep cached results (Excel among them) recalculate it on opening (workbookFile()).
	const workbook = streamingWorkbook('Runrate', new Date(input.generatedAt));
	const formats = formatsFor(request.tariff.currency);
	const names = request.scenarios.map((scenario, s) => scenarioSheetName(s, scenario.name));
	const sheet = (name: string, frozen?: Frozen) => new SheetWriter(addSheet(workbook, name, frozen), name);
	const summary = sheet(SUMMARY_SHEET, HEADS);
	const scenarioSheets = names.map((name) => sheet(name, HEADS));
	const monthly = sheet(MONTHLY_SHEET, { rows: 4, cols: 2 });
	const tariffSheet = sheet(TARIFF_SHEET, { rows: 2, cols: 0 });
	const cashFlows = sheet(CASH_FLOW_SHEET, HEADS);
	const assumptions = sheet(ASSUMPTIONS_SHEET);

	const tariffs = request.scenarios.map((scenario) => scenario.tariff ?? request.tariff);
	const { uses, useOf } = tariffUses(tariffs, names, input.scenarios);
	const tariffCells = writeTariffSheet(tariffSheet, uses);
	const plans = monthlyPlans(tariffs);
	const blocks: MonthlyScenario[] = request.scenarios.map((scenario, s) => {
		const figures = scenarioFigures(request, scenario.equipment, tariffs[s] ?? request.tariff);
		const result = input.response.scenarios[s];
		const plan = plans[s];
		const tariff = tariffCells[useOf[s] ?? 0];
		const out = scenarioSheets[s];
		if (!result || !plan || !tariff || !out)
			throw new Error(`The comparison has no result for scenario ${s + 1}`);
		const layout = scenarioLayout(out.name, figures, scenario.equipment.length, scenario.oneOffCosts.length);
		const site = input.scenarios[s]?.siteName ?? input.title;
		const block = { name: scenario.name, layout, figures, result, plan, tariff };
		writeScenarioSheet(
			{ ...block, out, scenario, monthly: plan, formats },
			`${scenario.name} (${site}): equipment, kWh and cost by month`
		);
		for (const [suffix, col] of [
			['Quantity', DEVICE.quantity],
			['Watts', DEVICE.watts],
			['DutyPercent', DEVICE.dutyPercent]
		] as const) {
			const cells = columnRange(out.name, col, layout.firstDevice, layout.lastDevice);
			if (cells) workbook.definedNames.add(cells, `Scenario${s + 1}_${suffix}`);
		}
		return block;
	});
	writeMonthlySheet(monthly, blocks, formats);
	const cashFlowScenarios = blocks.map((block, s) => ({
		...block,
		equipment: request.scenarios[s]?.equipment ?? [],
		summary: summaryCells(s)
	}));
	writeCashFlowSheet(cashFlows, cashFlowScenarios, request.finance, formats);
	writeSummarySheet(summary, {
		...input,
		formats,
		sources: blocks.map((block, s) => sources(input, block, s))
	});
	writeAssumptionsSheet(assumptions, {
		...input,
		months: blocks[0]?.figures.months ?? [],
		scenarios: request.scenarios.map((scenario, s) => ({
			name: scenario.name,
			siteName: input.scenarios[s]?.siteName ?? '',
			tariffName: input.scenarios[s]?.tariffName ?? '',
			tariffVersion: input.scenarios[s]?.tariffVersion ?? null
		})),
		formats
	});
	if (input.waterAir?.length) {
		const waterAir = sheet(WATER_AIR_SHEET, HEADS);
		writeWaterAirSheet(waterAir, input.title, input.waterAir);
		printSetup(waterAir.sheet, { titleRows: '4:4', titleColumns: 'A:A', pagesWide: 2 });
	}
	printSetup(summary.sheet, { titleRows: '1:4' });
	for (const out of scenarioSheets)
		if (out) printSetup(out.sheet, { titleRows: '3:4', titleColumns: 'A:A', pagesWide: 3 });
	printSetup(monthly.sheet, { titleRows: '3:4', titleColumns: 'A:B', pagesWide: Math.min(3, names.length) });
	printSetup(tariffSheet.sheet, { titleRows: '1:1' });
	printSetup(cashFlows.sheet, { titleRows: '3:4', titleColumns: 'A:A' });
	printSetup(assumptions.sheet);
	return workbookFile(workbook);
}

/**
 * The formulas of a scenario's Summary row: the Monthly year row, its sheet's sums, its lifecycle cost.
 * Its purchase and installation follows the core's rule: a proposal's devices plus its one-off costs;
 * what is installed is already paid for, so only its one-off costs.
 */
function sources(input: ComparisonExport, block: MonthlyScenario, s: number): SummarySources {
	const { layout, plan } = block;
	const { firstDevice, lastDevice, firstOneOff, lastOneOff, sheet } = layout;
	return {
		name: block.name,
		site: input.scenarios[s]?.siteName ?? '',
		tariff: input.scenarios[s]?.tariffName ?? '',
		annualKwh: monthlyCell(plan.kwh, YEAR),
		annualCost: monthlyCell(plan.total, YEAR),
		capital: sumOf([
			input.request.scenarios[s]?.status === 'installed'
				? null
				: columnRange(sheet, DEVICE.capital, firstDevice, lastDevice),
			columnRange(sheet, 2, firstOneOff, lastOneOff)
		]),
		status: input.request.scenarios[s]?.status ?? 'proposed',
		maintenance: sumOf([columnRange(sheet, DEVICE.maintenancePerYear, firstDevice, lastDevice)]),
		lifecycle: lifecycleCell(s, input.request.finance.horizonYears)
	};
}
