import type { CompareRequest, CompareResponse } from '$lib/calc';
import { type SheetWriter, a1, on } from './cells';
import type { SummaryCells } from './cashflow-sheet';
import { type Formats, madeText } from './formats';
import { OUTPUT_LABELS as L, STATUS_LABELS } from '$lib/text/output-labels';
import { writeInputs } from './summary-inputs';

export const SUMMARY_SHEET = 'Summary';
const FIRST_ROW = 5;
const COL = {
	name: 1,
	site: 2,
	tariff: 3,
	kwh: 4,
	cost: 5,
	capital: 6,
	maintenance: 7,
	savings: 8,
	payback: 9,
	lifecycle: 10,
	co2: 11,
	status: 12
};
/** The glossary's labels, so the workbook names each figure as the page and the report do. */
const HEADERS = [
	L.scenario,
	L.site,
	L.tariff,
	`${L.energy} (kWh)`,
	L.runningCost,
	`${L.capital}, year 0`,
	L.maintenance,
	L.saving,
	`${L.payback} (years)`,
	L.lifecycle,
	`${L.co2} (kg)`,
	L.status
];
/** Payback in years; 0 reads "at once" (it costs no more to buy than the baseline), as on the page. */
const PAYBACK_FORMAT = '[=0]"at once";0.00';
/** What a payback cell says when nothing is saved, as the page's "never". */
export const PAYBACK_NEVER = 'never';
/** What a CO₂ cell says while the emission factor is 0 (not set). */
export const CO2_CELL_NOT_SET = 'not set';

/** Formulas (over the other sheets) that give one scenario's row. */
export interface SummarySources {
	name: string;
	site: string;
	tariff: string;
	status: 'installed' | 'proposed';
	annualKwh: string;
	annualCost: string;
	capital: string;
	maintenance: string;
	lifecycle: string;
}

/** Where the named inputs sit: rows after the two tables. */
function inputsRow(scenarios: number): number {
	return FIRST_ROW + 2 * scenarios + 5;
}

/** The Summary cells the cash flows start from, for scenario s. */
export function summaryCells(s: number): SummaryCells {
	const cell = (col: number) => on(SUMMARY_SHEET, a1(col, FIRST_ROW + s, true));
	return { capital: cell(COL.capital), annualCost: cell(COL.cost), maintenance: cell(COL.maintenance) };
}

export interface SummaryInput {
	title: string;
	generatedAt: string;
	request: CompareRequest;
	response: CompareResponse;
	sources: SummarySources[];
	emissionSource: string;
	formats: Formats;
}

/** Writes the Summary: the comparison table, the differences from the baseline and the named inputs. */
export function writeSummarySheet(out: SheetWriter, input: SummaryInput): void {
	const { request, response, sources, formats } = input;
	const base = request.baseline;
	const count = sources.length;
	out.widths([30, 24, 26, 13, 13, 13, 13, 14, 12, 14, 12, 16]);
	out.line(1, `${input.title}: scenarios compared`, 12, 'title');
	out.line(
		2,
		`${L.made} ${madeText(input.generatedAt, request.timezone)}. These are estimates, not a bill. Baseline: ${sources[base]?.name ?? ''}. Every figure is a formula over the other sheets; change a pale input (here, on a scenario sheet or the Tariff sheet) and it follows. An installed scenario is already paid for: its purchase and installation is only its one-off costs.`,
		12,
		'note'
	);
	out.sheet.getRow(2).height = 45;
	out.headers(4, 1, HEADERS);
	const baseCell = (col: number) => a1(col, FIRST_ROW + base, true);
	const formats_ = [formats.kwh, formats.money, formats.money, formats.money];
	sources.forEach((source, s) => {
		const row = FIRST_ROW + s;
		const result = response.scenarios[s];
		if (!result) return;
		const at = (col: number) => a1(col, row);
		out.text(
			row,
			COL.name,
			s === base ? `${source.name} (baseline)` : source.name,
			s === base ? 'bold' : undefined
		);
		out.text(row, COL.site, source.site);
		out.text(row, COL.tariff, source.tariff);
		out.formula(row, COL.kwh, source.annualKwh, result.annualKwh, formats.kwh);
		out.formula(row, COL.cost, source.annualCost, result.annualCost, formats.money);
		out.formula(row, COL.capital, source.capital, result.capitalCost, formats.money);
		out.formula(row, COL.maintenance, source.maintenance, result.maintenancePerYear, formats.money);
		out.formula(
			row,
			COL.savings,
			`ROUND(${baseCell(COL.cost)}-${at(COL.cost)},2)`,
			result.savingsPerYear,
			formats.money
		);
		const payback = `IF(${at(COL.savings)}>0,MAX(0,${at(COL.capital)}-${baseCell(COL.capital)})/${at(COL.savings)},"none")`;
		out.formula(
			row,
			COL.payback,
			payback.replace('"none"', `"${PAYBACK_NEVER}"`),
			result.simplePaybackYears ?? PAYBACK_NEVER,
			PAYBACK_FORMAT
		);
		out.formula(row, COL.lifecycle, source.lifecycle, result.lifecycleCost, formats.money);
		out.formula(
			row,
			COL.co2,
			`IF(EmissionFactor>0,${at(COL.kwh)}*EmissionFactor,"${CO2_CELL_NOT_SET}")`,
			request.emissionFactorKgPerKwh > 0 ? result.co2KgPerYear : CO2_CELL_NOT_SET,
			formats.kwh
		);
		out.text(row, COL.status, STATUS_LABELS[source.status]);
	});

	const diffTitle = FIRST_ROW + count + 1;
	out.text(diffTitle, 1, 'Difference from the baseline (this scenario − the baseline)', 'heading');
	out.headers(diffTitle + 1, 1, HEADERS.slice(0, 7).concat(['', '', HEADERS[9] ?? '', HEADERS[10] ?? '']));
	const baseline = response.scenarios[base];
	sources.forEach((source, s) => {
		const row = diffTitle + 2 + s;
		const result = response.scenarios[s];
		if (!result || !baseline) return;
		out.text(row, COL.name, source.name);
		const diff = (col: number, value: number, format: string) =>
			out.formula(row, col, `${a1(col, FIRST_ROW + s)}-${baseCell(col)}`, value, format);
		const fields = [
			[COL.kwh, result.annualKwh - baseline.annualKwh],
			[COL.cost, result.annualCost - baseline.annualCost],
			[COL.capital, result.capitalCost - baseline.capitalCost],
			[COL.maintenance, result.maintenancePerYear - baseline.maintenancePerYear]
		] as const;
		fields.forEach(([col, value], i) => diff(col, value, formats_[i] ?? formats.money));
		diff(COL.lifecycle, result.lifecycleCost - baseline.lifecycleCost, formats.money);
		out.formula(
			row,
			COL.co2,
			`IF(EmissionFactor>0,${a1(COL.co2, FIRST_ROW + s)}-${baseCell(COL.co2)},"${CO2_CELL_NOT_SET}")`,
			request.emissionFactorKgPerKwh > 0 ? result.co2KgPerYear - baseline.co2KgPerYear : CO2_CELL_NOT_SET,
			formats.kwh
		);
	});
	writeInputs(out, input, inputsRow(count));
}
