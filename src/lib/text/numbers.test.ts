import { describe, expect, it } from 'vitest';
import {
	figure,
	kwText,
	kwhText,
	money,
	moneyCents,
	moneyFormat,
	moneyPerKwh,
	moneyWhole,
	percentText,
	yearsText
} from './numbers';

describe('money', () => {
	it.each([
		[1234.5, 'USD', '$1,234.50'],
		[0.1, 'EUR', '€0.10'],
		[1250, 'JPY', '¥1,250'],
		[-3.456, 'USD', '-$3.46']
	])('shows %d %s in the currency’s minor digits as %s', (amount, currency, text) => {
		expect(money(amount, currency)).toBe(text);
	});
	it('shows an amount in a code the browser does not know as the figure and the code', () => {
		expect(money(1234.5, 'XX')).toBe('1,234.5 XX');
		expect(money(12, '')).toBe('12 ');
	});
	it('gives cents, whole units, prices per kWh and compact axis labels', () => {
		expect(moneyCents(12.5, 'USD')).toBe('$12.50');
		expect(moneyCents(1250, 'JPY')).toBe('¥1,250.00');
		expect(moneyWhole(1234.56, 'USD')).toBe('$1,235');
		expect(moneyPerKwh(0.123456, 'USD')).toBe('$0.1235');
		expect(moneyPerKwh(0.1, 'USD')).toBe('$0.10');
		expect(money(1234, 'USD', 'compact')).toBe('$1.2K');
	});
	it('returns one cached formatter per code and precision, and none for an unknown code', () => {
		expect(moneyFormat('USD', 'cents')).toBe(moneyFormat('USD', 'cents'));
		expect(moneyFormat('USD', 'cents')).not.toBe(moneyFormat('USD'));
		expect(moneyFormat('US$')).toBeNull();
	});
});

describe('figures with units', () => {
	it('rounds to at most the digits asked, with thousands separators', () => {
		expect(figure(3187.3, 0)).toBe('3,187');
		expect(figure(2.345, 1)).toBe('2.3');
		expect(figure(2, 2)).toBe('2');
	});
	it('writes kWh, kW, percent and years', () => {
		expect(kwhText(1234.56)).toBe('1,235 kWh');
		expect(kwhText(12.34, 1)).toBe('12.3 kWh');
		expect(kwText(1.25)).toBe('1.3 kW');
		expect(percentText(0.254)).toBe('25 %');
		expect(yearsText(2.345)).toBe('2.3 years');
	});
});
