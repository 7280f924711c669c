import { describe, expect, it } from 'vitest';
import { CATEGORY_COLOURS, KIND_COLOURS, figureLabel, moneyLabel } from './chart-style';

describe('money on the charts', () => {
	it('shows cents as a bill does, and compact figures on an axis', () => {
		expect(moneyLabel(12.5, 'USD')).toBe('$12.50');
		expect(moneyLabel(1234.567, 'USD')).toBe('$1,234.57');
		expect(moneyLabel(1234.567, 'usd', true)).toBe('$1.2K');
	});

	it('keeps the currency’s own minor digits', () => {
		// Intl gives the yen no minor unit (ISO 4217).
		expect(moneyLabel(1500.4, 'JPY')).toBe('¥1,500');
	});

	it('shows a malformed currency code as typed instead of failing', () => {
		expect(moneyLabel(3.5, 'US')).toBe('US 3.5');
	});

	it('rounds plain figures to the digits asked', () => {
		expect(figureLabel(1234.56)).toBe('1,234.6');
		expect(figureLabel(0.126, 2)).toBe('0.13');
	});
});

describe('the palettes', () => {
	it('give every charge kind and every category a colour of its own', () => {
		for (const colours of [KIND_COLOURS, CATEGORY_COLOURS]) {
			const values = Object.values(colours);
			expect(new Set(values).size).toBe(values.length);
		}
	});
});
