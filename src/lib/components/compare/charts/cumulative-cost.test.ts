import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { inventedReport } from './compare-chart.fixture';
import {
	cumulativeCosts,
	cumulativeLines,
	lineExtent,
	paybackCrossing,
	paybackWords,
	type YearPoint
} from './cumulative-cost';

// Invented cash flows; the expected sums and crossings are worked by hand beside each case.

const points = (...costs: number[]): YearPoint[] => costs.map((cost, year) => ({ year, cost }));

describe('cumulative cost', () => {
	it('adds each year’s cash flow to what was spent before, capital first', () => {
		expect(cumulativeCosts([1800, 200, 200])).toEqual(points(1800, 2000, 2200));
	});

	it('gives each scenario of the comparison its line, and the baseline no payback', () => {
		const lines = cumulativeLines(inventedReport());
		expect(lines.map((line) => line.points.at(-1)?.cost)).toEqual([3000, 2600, 2980]);
		expect(lines[0]?.payback).toBeNull();
		expect(lineExtent(lines)).toEqual([0, 3000]);
	});
});

describe('a scenario that costs more up front and less each year', () => {
	// Baseline 1000, 1500, 2000, 2500, 3000; scenario 1800, 2000, 2200, 2400, 2600. The gap is
	// 800, 500, 200, −100, −400: it closes between years 2 and 3, 200 / 300 of the way.
	const baseline = points(1000, 1500, 2000, 2500, 3000);
	const scenario = points(1800, 2000, 2200, 2400, 2600);
	const payback = paybackCrossing(scenario, baseline);

	it('crosses below the baseline at the interpolated fraction of the year', () => {
		expect(payback.kind).toBe('crosses');
		if (payback.kind !== 'crosses') return;
		expect(payback.year).toBeCloseTo(2 + 2 / 3, 10);
		// 2200 + ⅔ × 200, which is also the baseline's 2000 + ⅔ × 500.
		expect(payback.cost).toBeCloseTo(2333.3333, 3);
	});

	it('is worded with the year to one decimal', () => {
		expect(paybackWords(payback, 4)).toBe('pays back in year ~2.7');
	});

	it('comes out the same from the invented comparison', () => {
		const payback = cumulativeLines(inventedReport())[1]?.payback;
		expect(payback?.kind === 'crosses' && payback.year).toBeCloseTo(2.6667, 4);
	});
});

describe('a scenario whose line meets the baseline at a year’s end', () => {
	it('pays back in that very year', () => {
		// Gap 300, 150, 0.
		const payback = paybackCrossing(points(1300, 1450, 1600), points(1000, 1300, 1600));
		expect(payback).toEqual({ kind: 'crosses', year: 2, cost: 1600 });
	});
});

describe('a scenario that never crosses', () => {
	it('does not pay back when it is still dearer at the horizon', () => {
		const payback = paybackCrossing(points(2000, 2300, 2600), points(1000, 1500, 2000));
		expect(payback).toEqual({ kind: 'never' });
		expect(paybackWords(payback, 2)).toBe('does not pay back within 2 years');
	});

	it('says so when it never costs more than the baseline', () => {
		// The invented timer scenario: gap −100, −80, −60, −40, −20.
		expect(cumulativeLines(inventedReport())[2]?.payback).toEqual({ kind: 'never-dearer' });
	});

	it('does not pay back when it starts cheaper and ends dearer', () => {
		expect(paybackCrossing(points(900, 1600, 2300), points(1000, 1500, 2000))).toEqual({ kind: 'never' });
	});
});

describe('a scenario that crosses back and forth', () => {
	it('marks the first time it comes down to the baseline', () => {
		// Gap 100, −100 (crossing at 1.5), then 100 after a replacement, then −100.
		const payback = paybackCrossing(points(1100, 1400, 2200, 2500), points(1000, 1500, 2100, 2600));
		expect(payback.kind === 'crosses' && payback.year).toBe(0.5);
	});
});

describe('any cash flows', () => {
	const flows = fc.array(fc.integer({ min: 0, max: 100_000 }), { minLength: 2, maxLength: 31 });

	it('crosses where both lines, drawn straight within each year, cost the same', () => {
		fc.assert(
			fc.property(flows, flows, (a, b) => {
				const scenario = cumulativeCosts(a);
				const baseline = cumulativeCosts(b);
				const payback = paybackCrossing(scenario, baseline);
				if (payback.kind !== 'crosses') {
					expect(payback.kind).toMatch(/^never/);
					return;
				}
				const year = Math.floor(payback.year);
				const fraction = payback.year - year;
				const at = (line: YearPoint[]) => {
					const from = line[year]?.cost ?? NaN;
					const to = line[year + 1]?.cost ?? from;
					return from + fraction * (to - from);
				};
				expect(payback.year).toBeGreaterThan(0);
				expect(payback.year).toBeLessThanOrEqual(Math.min(a.length, b.length) - 1);
				expect(payback.cost).toBeCloseTo(at(baseline), 4);
			})
		);
	});
});
