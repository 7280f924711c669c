import { describe, expect, it } from 'vitest';
import { roundMoney } from './rounding';

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
