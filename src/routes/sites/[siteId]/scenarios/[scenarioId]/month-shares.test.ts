import { describe, expect, it } from 'vitest';
import type { PeriodResult } from '$lib/calc';
import { AVERAGE_MONTH_HOURS, averageMonth } from './month-shares';

// Calendar arithmetic (common practice): 365 days × 24 h = 8,760 h a year, 730 h a twelfth; a leap
// year's 366 days give 8,784 h, 732 h a twelfth; 31 days are 744 h. Invented devices.

const DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const period = (days: number, kwhs: number[], costs: number[]): PeriodResult => ({
	label: 'month',
	from: '',
	to: '',
	days,
	hours: days * 24,
	kwh: 0,
	peakKw: 0,
	charges: [],
	total: 0,
	sharedCost: 0,
	equipment: kwhs.map((kwh, i) => ({ name: `d${i}`, kwh, cost: costs[i] ?? 0 }))
});

describe('an average month of the priced year', () => {
	it('is 730 h in an ordinary year, not the 744 h of a 31-day month', () => {
		const { hours } = averageMonth(
			DAYS.map((days) => period(days, [days * 24], [1])),
			1
		);
		expect(hours).toBe(730);
		expect(AVERAGE_MONTH_HOURS).toBe(8760 / 12);
	});

	it('is 732 h in a leap year', () => {
		const leap = DAYS.map((days, i) => period(i === 1 ? 29 : days, [0], [0]));
		expect(averageMonth(leap, 1).hours).toBe(732);
	});

	it('gives each row the year’s kWh and cost over twelve: a 1 kW pump always on uses 730 kWh', () => {
		const year = DAYS.map((days) => period(days, [days * 24, 10], [days * 24 * 0.1, 2]));
		const { shares } = averageMonth(year, 2);
		expect(shares[0]?.kwhPerMonth).toBeCloseTo(730, 9);
		expect(shares[0]?.costPerMonth).toBeCloseTo(73, 9);
		expect(shares[1]).toEqual({ kwhPerMonth: 10, costPerMonth: 2, monthHours: 730 });
	});

	it('gives no shares before there is a result', () => {
		expect(averageMonth([], 3)).toEqual({ hours: 730, shares: [] });
	});
});
