import { describe, expect, it } from 'vitest';
import { listText, moneyText, monthsText, whenText } from './rate-phrases';

describe('monthsText', () => {
	// Expected wording: runs of the calendar as a person would say them (common practice, no source).
	it.each([
		{ months: [6, 7, 8, 9], text: 'June–September' },
		{ months: [10, 11, 12, 1, 2, 3, 4, 5], text: 'October–May' },
		{ months: [1, 2, 6], text: 'January–February and June' },
		{ months: [12, 1, 6], text: 'June and December–January' },
		{ months: [3], text: 'March' },
		{ months: [9, 8, 7, 6], text: 'June–September' },
		{ months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], text: 'all year' },
		{ months: [], text: 'no months' }
	])('reads $months as "$text"', ({ months, text }) => {
		expect(monthsText(months)).toBe(text);
	});
});

describe('moneyText', () => {
	// en-US currency formats as the ICU data in Node's Intl prints them (from memory).
	it.each([
		{ amount: 12.5, currency: 'USD', text: '$12.50' },
		{ amount: 0.031, currency: 'USD', text: '$0.031' },
		{ amount: 0.031255, currency: 'USD', text: '$0.03126' },
		{ amount: 1200, currency: 'JPY', text: '¥1,200' },
		{ amount: 3, currency: 'EUR', text: '€3.00' }
	])('writes $amount $currency as $text', ({ amount, currency, text }) => {
		expect(moneyText(amount, currency)).toBe(text);
	});

	it('falls back to the code as typed when it is not a currency code', () => {
		expect(moneyText(1.5, 'US dollars')).toBe('US dollars 1.5');
	});
});

describe('whenText', () => {
	it('names the days and joins several windows with "and"', () => {
		const windows = [
			{ start: '07:00', end: '11:00' },
			{ start: '17:00', end: '20:00' }
		];
		expect(whenText('weekdays', windows)).toBe('on weekdays 07:00–11:00 and 17:00–20:00');
	});

	it('says every day when a period has no day limit', () => {
		expect(whenText(undefined, [{ start: '22:00', end: '06:00' }])).toBe('every day 22:00–06:00');
	});
});

describe('listText', () => {
	it.each([
		{ items: [], text: '' },
		{ items: ['a'], text: 'a' },
		{ items: ['a', 'b'], text: 'a and b' },
		{ items: ['a', 'b', 'c'], text: 'a, b and c' }
	])('joins $items as "$text"', ({ items, text }) => {
		expect(listText(items)).toBe(text);
	});
});
