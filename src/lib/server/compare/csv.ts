import Papa from 'papaparse';
import { MONTH_NAMES } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import { neutraliseFormula } from '$lib/server/exports/safe-text';

/** The comparison and monthly tables as CSV: plain numbers (dot decimals, no thousands separators). */
const fixed = (n: number | null, digits: number) => (n === null ? '' : n.toFixed(digits));
const text = (value: string) => neutraliseFormula(value);
const csv = (fields: string[], data: (string | number)[][]) => `${Papa.unparse({ fields, data })}\r\n`;

export function comparisonCsv(report: ComparisonReport): string {
	const base = report.result.scenarios[report.baseline];
	const c = report.currency;
	const fields = [
		'scenario',
		'site',
		'tariff',
		'baseline',
		'annual_kwh',
		`annual_cost_${c}`,
		`capital_cost_${c}`,
		`maintenance_per_year_${c}`,
		`savings_per_year_${c}`,
		'simple_payback_years',
		`lifecycle_cost_${c}`,
		'co2_kg_per_year',
		'annual_kwh_vs_baseline',
		`annual_cost_vs_baseline_${c}`,
		`capital_cost_vs_baseline_${c}`,
		`lifecycle_cost_vs_baseline_${c}`
	];
	const rows = report.result.scenarios.map((r, i) => {
		const s = report.scenarios[i]!;
		return [
			text(s.name),
			text(s.siteName),
			text(`${s.tariffName} v${s.tariffVersion}`),
			i === report.baseline ? 'yes' : 'no',
			fixed(r.annualKwh, 1),
			fixed(r.annualCost, 2),
			fixed(r.capitalCost, 2),
			fixed(r.maintenancePerYear, 2),
			fixed(r.savingsPerYear, 2),
			fixed(r.simplePaybackYears, 2),
			fixed(r.lifecycleCost, 2),
			fixed(r.co2KgPerYear, 1),
			fixed(r.annualKwh - (base?.annualKwh ?? 0), 1),
			fixed(r.annualCost - (base?.annualCost ?? 0), 2),
			fixed(r.capitalCost - (base?.capitalCost ?? 0), 2),
			fixed(r.lifecycleCost - (base?.lifecycleCost ?? 0), 2)
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
