import { describe, expect, it } from 'vitest';
import { differenceFigure, differenceWords, loadWords, monthWords, versionNumbersWords } from './words';

const version = (number: number) => ({
	number,
	effectiveFrom: '2027-01-01',
	effectiveTo: null,
	source: 'https://rates.example.org',
	checkedOn: '2026-11-20'
});

describe('the cheapest-tariff figures in words', () => {
	it('names a month', () => {
		expect(monthWords('2027-03')).toBe('March 2027');
		expect(monthWords('2027-03-01/2027-03-31')).toBe('2027-03-01/2027-03-31');
	});

	it('says the difference to the current tariff in words on the page and as a signed figure in print', () => {
		expect(differenceWords(-120, 'USD', false)).toBe('saves $120.00 a year (−$120.00)');
		expect(differenceWords(40, 'USD', false)).toBe('costs $40.00 more a year (+$40.00)');
		expect(differenceWords(0, 'USD', true)).toBe('current tariff');
		expect(differenceWords(null, 'USD', false)).toBe('—');
		expect([-120, 40, 0.001].map((d) => differenceFigure(d, 'USD', false))).toEqual([
			'−$120.00',
			'+$40.00',
			'$0.00'
		]);
		expect(differenceFigure(0, 'USD', true)).toBe('current');
	});

	it('lists the versions priced and names the load', () => {
		expect(versionNumbersWords({ urdbLabel: null, versions: [version(2)] })).toBe('version 2');
		expect(versionNumbersWords({ urdbLabel: null, versions: [1, 2, 3].map(version) })).toBe(
			'versions 1, 2 and 3'
		);
		expect(versionNumbersWords({ urdbLabel: null, versions: [] })).toBe('no stored version');
		expect(loadWords(null)).toBe('The site’s metered usage');
		expect(loadWords('Night pumping')).toBe('The scenario “Night pumping” (estimated load)');
	});
});
