import { describe, expect, it } from 'vitest';
import { apportionMoney, roundMoney } from './rounding';

describe('rounding a charge line to cents', () => {
	it.each([
		[0.125, 0.13],
		[-0.125, -0.13],
		[1.005, 1.01],
		[2.675, 2.68],
		[29.376, 29.38],
		[0.004, 0],
		[-0.004, 0],
		[1234567.895, 1234567.9],
		[10.1, 10.1]
	])('rounds %d half away from zero to %d', (amount, cents) => {
		expect(roundMoney(amount)).toBe(cents);
	});

	it('never returns negative zero', () => {
		expect(Object.is(roundMoney(-0.001), 0)).toBe(true);
	});
});

describe('rounding shares together so they add up', () => {
	it.each([
		// Worked by hand: each third is 3.333…; the left-over cent goes to the first of the ties.
		[[10 / 3, 10 / 3, 10 / 3], 10, [3.34, 3.33, 3.33]],
		// Rounded alone these are 1.01 + 2.01 + 3.01 = 6.03 against 6.02; the cents left after cutting
		// to 1.00 + 2.00 + 3.00 go to the two that lost most (0.9 and 0.6 of a cent), not to 1.005.
		[[1.005, 2.006, 3.009], 6.02, [1, 2.01, 3.01]],
		// A bill whose lines rounded up by 2 cents: the gap goes to the shares by size.
		[[5.001, 0.001, 4.998], 10.02, [5.01, 0, 5.01]],
		[[0, 7.004, 2.996], 10, [0, 7, 3]],
		[[-1.005, 3.004], 2, [-1, 3]]
	])('rounds %j to %d as %j', (exact, total, shares) => {
		expect(apportionMoney(exact, total)).toEqual(shares);
		expect(shares.reduce((sum, share) => sum + Math.round(share * 100), 0)).toBe(Math.round(total * 100));
	});

	it('leaves every share at zero when all are zero', () => {
		expect(apportionMoney([0, 0], 0.01)).toEqual([0, 0]);
	});
});
