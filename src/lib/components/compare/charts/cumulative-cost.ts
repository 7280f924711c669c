import type { ComparisonReport } from '$lib/compare/types';

/**
 * Cumulative cost over the horizon and where a scenario's line crosses below the baseline's. The
 * sums are of the cash flows as compare() gives them (capital in year 0, then each year's escalated
 * energy cost, maintenance and replacements), not discounted: the chart shows money spent, and the
 * lifecycle cost in the table carries the discounting.
 */

/** The money spent by the end of `year` (year 0: the capital alone). */
export interface YearPoint {
	year: number;
	cost: number;
}

/** Running sums of the cash flows: [1000, 300, 300] is 1000, 1300, 1600. */
export function cumulativeCosts(cashFlows: readonly number[]): YearPoint[] {
	let spent = 0;
	return cashFlows.map((flow, year) => ({ year, cost: (spent += flow) }));
}

/**
 * A scenario against the baseline: its line crosses below the baseline's at `year` (fractional),
 * having cost `cost` by then; or it never costs more than the baseline; or it is still dearer at
 * the horizon (or crossed back above and never below again).
 */
export type Payback =
	{ kind: 'crosses'; year: number; cost: number } | { kind: 'never-dearer' } | { kind: 'never' };

/**
 * The first year in which `scenario`'s cumulative cost, having been above `baseline`'s, comes down
 * to it, interpolated linearly within the year (money is taken to be spent evenly over a year).
 * Worked example: 1000 more at the end of year 2 and 600 less at the end of year 3 meet 1000 / 1600
 * of the way through year 3, at year 2.625.
 */
export function paybackCrossing(scenario: readonly YearPoint[], baseline: readonly YearPoint[]): Payback {
	const years = Math.min(scenario.length, baseline.length);
	const gap = (year: number) => (scenario[year]?.cost ?? 0) - (baseline[year]?.cost ?? 0);
	for (let year = 1; year < years; year++) {
		const before = gap(year - 1);
		const after = gap(year);
		if (before > 0 && after <= 0) {
			const fraction = before / (before - after);
			const from = scenario[year - 1]?.cost ?? 0;
			const to = scenario[year]?.cost ?? 0;
			return { kind: 'crosses', year: year - 1 + fraction, cost: from + fraction * (to - from) };
		}
	}
	const everDearer = Array.from({ length: years }, (_, year) => gap(year)).some((g) => g > 0);
	return years > 0 && !everDearer ? { kind: 'never-dearer' } : { kind: 'never' };
}

/** One scenario's line, and its payback against the baseline (null for the baseline itself). */
export interface CumulativeLine {
	index: number;
	points: YearPoint[];
	payback: Payback | null;
}

/** Every scenario's cumulative cost and payback crossing, in the order compared. */
export function cumulativeLines(report: ComparisonReport): CumulativeLine[] {
	const lines = report.result.scenarios.map((scenario) => cumulativeCosts(scenario.cashFlows));
	const baseline = lines[report.baseline] ?? [];
	return lines.map((points, index) => ({
		index,
		points,
		payback: index === report.baseline ? null : paybackCrossing(points, baseline)
	}));
}

/** The money axis: from zero (or a negative sum) to the highest point. */
export function lineExtent(lines: readonly CumulativeLine[]): [number, number] {
	const costs = lines.flatMap((line) => line.points.map((point) => point.cost));
	return [Math.min(0, ...costs), Math.max(0, ...costs)];
}

/** A fractional year to one decimal, as the marker reads: 2.667 is "year ~2.7". */
export function approxYear(year: number): string {
	return `year ~${(Math.round(year * 10) / 10).toLocaleString('en-US')}`;
}

/** How the chart and its table word a payback: "pays back in year ~3.4". */
export function paybackWords(payback: Payback, horizonYears: number): string {
	if (payback.kind === 'crosses') return `pays back in ${approxYear(payback.year)}`;
	if (payback.kind === 'never-dearer') return 'never costs more than the baseline';
	return `does not pay back within ${horizonYears} ${horizonYears === 1 ? 'year' : 'years'}`;
}
