import { describe, expect, it } from 'vitest';
import { kwhText, moneyFormat, monthsText, powerText } from './readout-text';

// Invented figures; three-phase watts by P = √3 × V × I × PF (the usual handbook formula).

describe('figures for the share of a device', () => {
	it('rounds kWh to one decimal below 100 and to whole numbers above', () => {
		expect(kwhText(12.345)).toBe('12.3');
		expect(kwhText(1234.5)).toBe('1,235');
	});

	it('formats money in the scenario currency', () => {
		expect(moneyFormat('USD')(29.376)).toBe('$29.38');
		expect(moneyFormat('EUR')(3)).toBe('€3.00');
	});

	it('falls back to plain figures for a code the browser does not know', () => {
		expect(moneyFormat('not a code')(2.5)).toBe('2.5 not a code');
	});
});

describe('a device as a viewer reads it', () => {
	it('gives the power as it was entered, with its watts', () => {
		expect(powerText({ watts: 100 })).toBe('100 W');
		expect(powerText({ amps: 10, volts: 230, powerFactor: 0.8, phases: 3 })).toBe(
			'10 A × 230 V, power factor 0.8, three phase (≈ 3,187 W)'
		);
		expect(powerText({ amps: 1, volts: 120, powerFactor: 1, phases: 1 })).toBe('1 A × 120 V (≈ 120 W)');
	});

	it('names the active months', () => {
		expect(monthsText(undefined)).toBe('All year');
		expect(monthsText([1, 2, 12])).toBe('Jan, Feb, Dec');
		expect(monthsText([])).toBe('None');
	});
});
