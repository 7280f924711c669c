import Papa from 'papaparse';
import { MONTH_NAMES } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import { neutraliseFormula } from '$lib/server/exports/safe-text';
import { emissionFactorSet, paybackYears } from '$lib/compare/format';
import { CO2_NOT_SET, csvColumn, STATUS_LABELS } from '$lib/text/output-labels';
import { deliveryCsvColumns, deliveryCsvValues } from './delivery-csv';

/** The comparison and monthly tables as CSV: plain numbers (dot decimals, no thousands separators). */
const fixed = (n: number | null, digits: number) => (n === null ? '' : n.toFixed(digits));
const text = (value: string) => neutraliseFormula(value);
const csv = (fields: string[], data: (string | number)[][]) => `${Papa.unparse({ fields, data })}\r\n`;

/**
 * The comparison table, one row per scenario; the column names are the glossary's labels
 * (`$lib/text/output-labels`) in lower case with their unit.
 *
 * Payback is two columns, so a spreadsheet can sort by it and a reader is never misled:
 * `simple_payback_years` is a number — `0` when it pays back at once (it costs no more to buy than the
 * baseline), empty when it never does (it saves nothing) and for the baseline — and
 * `simple_payback_note` says the same in words ("0.74 years", "at once: …", "never: …").
 * CO₂ is empty with `co2_note` "not set" until an emission factor is given.
 */
export function comparisonCsv(report: ComparisonReport): string {
	const base = report.result.scenarios[report.baseline];
	const c = report.currency;
	const co2Set = emissionFactorSet(report.query);
	const fields = [
		csvColumn('scenario'),
		csvColumn('site'),
		csvColumn('tariff'),
		csvColumn('baseline'),
		csvColumn('status'),
		csvColumn('energy', 'kWh'),
		csvColumn('runningCost', c),
		csvColumn('oneOffCosts', c),
		csvColumn('capital', c),
		csvColumn('maintenance', c),
		csvColumn('saving', c),
		`${csvColumn('payback')}_years`,
		`${csvColumn('payback')}_note`,
		csvColumn('lifecycle', c),
		csvColumn('co2', 'kg'),
		'co2_note',
		`${csvColumn('energy', 'kWh')}_vs_baseline`,
		`${csvColumn('runningCost', c)}_vs_baseline`,
		`${csvColumn('capital', c)}_vs_baseline`,
		`${csvColumn('lifecycle', c)}_vs_baseline`,
		...deliveryCsvColumns,
		`${csvColumn('oneOffCosts')}_items`,
		csvColumn('description')
	];
	const rows = report.result.scenarios.map((r, i) => {
		const s = report.scenarios[i]!;
		const isBase = i === report.baseline;
		const oneOff = s.oneOffCosts.reduce((sum, cost) => sum + cost.amount, 0);
		return [
			text(s.name),
			text(s.siteName),
			text(`${s.tariffName} v${s.tariffVersion}`),
			isBase ? 'yes' : 'no',
			STATUS_LABELS[s.status],
			fixed(r.annualKwh, 1),
			fixed(r.annualCost, 2),
			fixed(oneOff, 2),
			fixed(r.capitalCost, 2),
			fixed(r.maintenancePerYear, 2),
			fixed(r.savingsPerYear, 2),
			isBase ? '' : fixed(r.simplePaybackYears, 2),
			isBase ? 'baseline' : paybackYears(r.simplePaybackYears),
			fixed(r.lifecycleCost, 2),
			co2Set ? fixed(r.co2KgPerYear, 1) : '',
			co2Set ? '' : CO2_NOT_SET,
			fixed(r.annualKwh - (base?.annualKwh ?? 0), 1),
			fixed(r.annualCost - (base?.annualCost ?? 0), 2),
			fixed(r.capitalCost - (base?.capitalCost ?? 0), 2),
			fixed(r.lifecycleCost - (base?.lifecycleCost ?? 0), 2),
			...deliveryCsvValues(s.delivery),
			text(
				s.oneOffCosts
					.map((cost) => `${cost.label}: ${cost.amount.toFixed(2)}${cost.note ? ` (${cost.note})` : ''}`)
					.join('; ')
			),
			text(s.description)
		];
	});
	return csv(fields, rows);
}

/** One row per month; per scenario its kWh and its bill. */
export function monthlyCsv(report: ComparisonReport): string {
	const c = report.currency;
	const fields = [
		'month',
		...report.scenarios.flatMap((s) => [`${text(s.name)} kWh`, `${text(s.name)} cost ${c}`])
	];
	const months = report.result.scenarios[0]?.periods ?? [];
	const rows = months.map((period, m) => [
		`${MONTH_NAMES[Number(period.label.slice(5, 7)) - 1] ?? ''} ${period.label.slice(0, 4)}`,
		...report.result.scenarios.flatMap((r) => [
			fixed(r.periods[m]?.kwh ?? 0, 1),
			fixed(r.periods[m]?.total ?? 0, 2)
		])
	]);
	return csv(fields, rows);
}
