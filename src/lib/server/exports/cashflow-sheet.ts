import type { CompareRequest, ScenarioResult } from '$lib/calc';
import { type SheetWriter, a1, columnRange, on } from './cells';
import type { Formats } from './formats';
import { OUTPUT_LABELS } from '$lib/text/output-labels';
import { DEVICE, type ScenarioLayout } from './scenario-layout';

export const CASH_FLOW_SHEET = 'Cash flows';
const FIRST_YEAR_ROW = 5;
const PER_SCENARIO = 6;
const HEADERS = [
	OUTPUT_LABELS.capital,
	OUTPUT_LABELS.escalatedBill,
	OUTPUT_LABELS.maintenance,
	OUTPUT_LABELS.replacements,
	OUTPUT_LABELS.cashFlow
];

/** The Summary cells a scenario's cash flows start from. */
export interface SummaryCells {
	capital: string;
	annualCost: string;
	maintenance: string;
}

export interface CashFlowScenario {
	name: string;
	layout: ScenarioLayout;
	equipment: CompareRequest['scenarios'][number]['equipment'];
	result: ScenarioResult;
	summary: SummaryCells;
}

/** Column of a scenario's cash flow, and the row of the lifecycle cost, for the Summary. */
export function lifecycleCell(index: number, horizonYears: number): string {
	const col = 2 + index * PER_SCENARIO + 4;
	return on(CASH_FLOW_SHEET, a1(col, FIRST_YEAR_ROW + horizonYears + 1, true));
}

/**
 * Years 0 to the horizon per scenario: year 0 is the capital cost; year t is the annual cost grown by
 * the escalation rate for t − 1 years, the yearly maintenance, and the purchase price of every device
 * whose life ends at t before the horizon. Lifecycle cost: year 0 + NPV(discount rate, years 1…).
 */
export function writeCashFlowSheet(
	out: SheetWriter,
	scenarios: readonly CashFlowScenario[],
	finance: CompareRequest['finance'],
	formats: Formats
): void {
	const horizon = finance.horizonYears;
	out.line(1, 'Cash flows over the horizon, and the lifecycle cost', 8, 'title');
	out.line(
		2,
		'Formulas over the Summary and the named inputs DiscountRate, EscalationRate and HorizonYears (Summary sheet). Replacements: the purchase price (installation is not repeated) of each device whose life ends in that year, before the horizon. A year beyond a shortened horizon counts as 0; to lengthen it, copy the last year’s row down and widen the NPV range.',
		20,
		'note'
	);
	out.sheet.getRow(2).height = 45;
	out.widths([10]);
	out.headers(4, 1, ['Year']);
	for (let year = 0; year <= horizon; year++) out.number(FIRST_YEAR_ROW + year, 1, year, formats.whole);
	const lifecycleRow = FIRST_YEAR_ROW + horizon + 1;
	out.text(lifecycleRow, 1, `${OUTPUT_LABELS.lifecycle} (present value)`, 'bold');
	scenarios.forEach((scenario, s) => writeScenario(out, scenario, 2 + s * PER_SCENARIO, finance, formats));
}

function writeScenario(
	out: SheetWriter,
	scenario: CashFlowScenario,
	first: number,
	finance: CompareRequest['finance'],
	formats: Formats
): void {
	const { layout, equipment, result, summary } = scenario;
	const horizon = finance.horizonYears;
	const escalation = finance.escalationPercent / 100;
	const [capitalCol, energyCol, maintenanceCol, replacementCol, flowCol] = [0, 1, 2, 3, 4].map(
		(i) => first + i
	) as [number, number, number, number, number];
	out.text(3, first, scenario.name, 'bold');
	out.headers(4, first, HEADERS);
	out.widths([13, 13, 13, 13, 14], first);
	const range = (col: number) => columnRange(layout.sheet, col, layout.firstDevice, layout.lastDevice);
	const life = range(DEVICE.lifeYears);
	const quantity = range(DEVICE.quantity);
	const purchase = range(DEVICE.purchase);
	out.formula(FIRST_YEAR_ROW, capitalCol, summary.capital, result.capitalCost, formats.money);
	out.formula(
		FIRST_YEAR_ROW,
		flowCol,
		a1(capitalCol, FIRST_YEAR_ROW),
		result.cashFlows[0] ?? 0,
		formats.money
	);
	for (let year = 1; year <= horizon; year++) {
		const row = FIRST_YEAR_ROW + year;
		const t = `$A${row}`;
		const energy = result.annualCost * (1 + escalation) ** (year - 1);
		const replacements = equipment.reduce((sum, device) => {
			const due = device.lifeYears !== null && year % device.lifeYears === 0 && year < horizon;
			return due ? sum + device.quantity * device.purchaseCost : sum;
		}, 0);
		out.formula(
			row,
			energyCol,
			`IF(${t}>HorizonYears,0,${summary.annualCost}*(1+EscalationRate)^(${t}-1))`,
			energy,
			formats.money
		);
		out.formula(
			row,
			maintenanceCol,
			`IF(${t}>HorizonYears,0,${summary.maintenance})`,
			result.maintenancePerYear,
			formats.money
		);
		const due =
			life && quantity && purchase
				? `IF(${t}<HorizonYears,SUMPRODUCT((${life}>0)*(MOD(${t},${life}+(${life}=0))=0)*${quantity}*${purchase}),0)`
				: '0';
		out.formula(row, replacementCol, due, replacements, formats.money);
		const cells = [energyCol, maintenanceCol, replacementCol].map((col) => a1(col, row)).join('+');
		out.formula(row, flowCol, cells, result.cashFlows[year] ?? 0, formats.money);
	}
	const year0 = a1(flowCol, FIRST_YEAR_ROW);
	const later = `${a1(flowCol, FIRST_YEAR_ROW + 1)}:${a1(flowCol, FIRST_YEAR_ROW + horizon)}`;
	out.formula(
		FIRST_YEAR_ROW + horizon + 1,
		flowCol,
		`${year0}+NPV(DiscountRate,${later})`,
		result.lifecycleCost,
		formats.money,
		'bold'
	);
}
