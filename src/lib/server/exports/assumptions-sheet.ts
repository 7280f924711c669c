import type { CompareRequest } from '$lib/calc';
import { type SheetWriter } from './cells';
import { holidaysText } from './device-words';
import type { MonthFigures } from './figures';
import { type Formats, madeText } from './formats';
import { RULES, VALUES_NOTE } from './rules-text';
import { CO2_HOW_TO_SET, OUTPUT_LABELS, STATUS_LABELS } from '$lib/text/output-labels';

export const ASSUMPTIONS_SHEET = 'Assumptions & sources';

export interface AssumptionsInput {
	title: string;
	generatedAt: string;
	request: CompareRequest;
	months: readonly MonthFigures[];
	scenarios: ReadonlyArray<{
		name: string;
		siteName: string;
		tariffName: string;
		tariffVersion: number | null;
	}>;
	emissionSource: string;
	cautions: readonly string[];
	formats: Formats;
}

/** Writes the rules in words, the sources, the emission factor, the cautions and "estimates, not a bill". */
export function writeAssumptionsSheet(out: SheetWriter, input: AssumptionsInput): void {
	const { request, formats } = input;
	out.widths([34, 110]);
	let row = 1;
	const pair = (label: string, text: string) => {
		out.text(row, 1, label, 'bold');
		out.text(row++, 2, text, 'wrap');
	};
	const heading = (text: string) => {
		row++;
		out.text(row++, 1, text, 'heading');
	};
	out.text(row++, 1, `${input.title}: assumptions and sources`, 'title');
	out.line(
		row++,
		'These are estimates, not a bill. They follow the rules below from the equipment, schedules and tariffs as entered; a real bill depends on what the equipment really draws and on the utility’s meter readings.',
		2,
		'bold'
	);
	heading('The comparison');
	const first = input.months[0];
	const last = input.months[input.months.length - 1];
	pair(
		'Period',
		first && last ? `${first.label} to ${last.label} (12 calendar months)` : '12 calendar months'
	);
	pair('Time zone', request.timezone);
	pair('Public holidays', holidaysText(request.holidays));
	pair(OUTPUT_LABELS.made, madeText(input.generatedAt, request.timezone));
	heading('Scenarios and where they come from');
	input.scenarios.forEach((scenario, s) => {
		const version =
			scenario.tariffVersion === null ? 'no version number' : `version ${scenario.tariffVersion}`;
		const baseline = s === request.baseline ? ' (baseline)' : '';
		const status = request.scenarios[s]?.status ?? 'proposed';
		pair(
			`${scenario.name}${baseline}`,
			`Site: ${scenario.siteName}. Tariff: ${scenario.tariffName} (${version}). ${OUTPUT_LABELS.status}: ${STATUS_LABELS[status]}${
				status === 'installed' ? ', so its year 0 holds only its one-off costs' : ''
			}.`
		);
	});
	heading('Finance and emissions (change them on the Summary sheet)');
	const named = (label: string, name: string, value: number, format: string) => {
		out.text(row, 1, label, 'bold');
		out.formula(row++, 2, name, value, format);
	};
	const { finance } = request;
	named('Discount rate a year', 'DiscountRate', finance.discountPercent / 100, formats.percent);
	named(
		`${OUTPUT_LABELS.escalation} a year`,
		'EscalationRate',
		finance.escalationPercent / 100,
		formats.percent
	);
	named('Horizon (years)', 'HorizonYears', finance.horizonYears, formats.whole);
	named('Emission factor (kg CO₂ per kWh)', 'EmissionFactor', request.emissionFactorKgPerKwh, '0.000###');
	pair(
		OUTPUT_LABELS.emissionSource,
		request.emissionFactorKgPerKwh > 0 ? input.emissionSource || 'not given' : CO2_HOW_TO_SET
	);
	heading('The rules');
	for (const [title, text] of RULES) pair(title, text);
	heading('What is a formula, and what is a value');
	for (const text of VALUES_NOTE) pair('', text);
	heading('Safety');
	if (input.cautions.length === 0) pair('', 'No cautions for these scenarios.');
	for (const caution of input.cautions) pair('Caution', caution);
	pair(
		'',
		'Follow your local electrical code and licensed practice; they come before anything in this workbook.'
	);
	row++;
	out.line(row, 'Runrate: an estimate for planning, not a bill and not electrical advice.', 2, 'note');
}
