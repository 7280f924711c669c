import { describe, expect, it } from 'vitest';
import { formatsFor, monthHeading, scenarioSheetName } from './formats';

describe('sheet names from scenario names', () => {
	it('number the scenario and keep its words', () => {
		expect(scenarioSheetName(0, 'Baseline pump')).toBe('1 Baseline pump');
	});
	// Sheet names may not hold \ / ? * [ ] : and are at most 31 characters (spreadsheet rule, from memory).
	it('drop the characters a sheet name may not hold, and apostrophes', () => {
		expect(scenarioSheetName(2, "Bob's [new] pump: 1/2?")).toBe('3 Bob s new pump 1 2');
	});
	it('stop at 31 characters', () => {
		expect(scenarioSheetName(9, 'A very long scenario name that goes on and on')).toHaveLength(31);
	});
});

describe('number formats', () => {
	it('show money with the currency’s symbol and cents', () => {
		expect(formatsFor('USD').money).toBe('"$"#,##0.00');
		expect(formatsFor('EUR').money).toBe('"€"#,##0.00');
	});
	it('fall back to the code for a currency the formatter does not know', () => {
		expect(formatsFor('XQZ').money).toBe('"XQZ"#,##0.00');
	});
	it('head a month column with its short name and year', () => {
		expect(monthHeading({ label: '2027-03', month: 3, year: 2027, days: 31, hours: 743 })).toBe('Mar 2027');
	});
});
