import { describe, expect, it } from 'vitest';
import { againstSavedText, yearlyDifference } from './against-saved';

// Invented yearly costs; plain subtraction to the cent. en-US currency formats as Node's ICU prints
// them (from memory).

describe('the unsaved list against the saved one', () => {
	it('is the unsaved yearly cost minus the saved one, to the cent', () => {
		expect(yearlyDifference(1683.3, 3265.42)).toBe(-1582.12);
		expect(yearlyDifference(120.1, 115.72)).toBe(4.38);
		expect(yearlyDifference(0.1 + 0.2, 0.3)).toBe(0);
	});

	it('is unknown while either cost is', () => {
		expect(yearlyDifference(null, 10)).toBeNull();
		expect(yearlyDifference(10, null)).toBeNull();
	});

	it.each([
		[-1582.12, 'USD', '−$1,582 a year against the saved list'],
		[4.38, 'USD', '+$4.38 a year against the saved list'],
		[-99.5, 'USD', '−$99.50 a year against the saved list'],
		[250, 'EUR', '+€250 a year against the saved list'],
		[0, 'USD', 'The same yearly cost as the saved list'],
		[-0.001, 'USD', 'The same yearly cost as the saved list']
	])('says %d %s as "%s"', (difference, currency, words) => {
		expect(againstSavedText(difference, currency)).toBe(words);
	});
});
