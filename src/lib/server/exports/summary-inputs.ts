import { type SheetWriter, a1, on } from './cells';
import type { SummaryInput } from './summary-sheet';
import { CO2_HOW_TO_SET, OUTPUT_LABELS } from '$lib/text/output-labels';

/** The named inputs: change one and the cash flows, lifecycle costs and CO₂ follow. */
export function writeInputs(out: SheetWriter, input: SummaryInput, start: number): void {
	const { finance, emissionFactorKgPerKwh } = input.request;
	const { formats } = input;
	out.text(start, 1, 'Inputs you can change (named cells)', 'heading');
	out.headers(start + 1, 1, ['Input', 'Value', 'Name']);
	const rows: Array<[string, number, string, string]> = [
		['Discount rate a year', finance.discountPercent / 100, formats.percent, 'DiscountRate'],
		[
			`${OUTPUT_LABELS.escalation} a year`,
			finance.escalationPercent / 100,
			formats.percent,
			'EscalationRate'
		],
		['Horizon (years)', finance.horizonYears, formats.whole, 'HorizonYears'],
		[
			`${OUTPUT_LABELS.emissionFactor} (kg CO₂ per kWh; 0 is not set)`,
			emissionFactorKgPerKwh,
			'0.000###',
			'EmissionFactor'
		]
	];
	rows.forEach(([label, value, format, name], i) => {
		const row = start + 2 + i;
		out.text(row, 1, label);
		out.number(row, 2, value, format, 'input');
		out.text(row, 3, name);
		out.sheet.workbook.definedNames.add(on(out.name, a1(2, row, true)), name);
	});
	const sourceRow = start + 2 + rows.length;
	out.text(sourceRow, 1, 'Source of the emission factor');
	out.text(sourceRow, 2, emissionFactorKgPerKwh > 0 ? input.emissionSource || 'not given' : CO2_HOW_TO_SET);
	out.line(
		sourceRow + 2,
		'The horizon also sets how many years the Cash flows sheet lists; see its note.',
		6,
		'note'
	);
}
