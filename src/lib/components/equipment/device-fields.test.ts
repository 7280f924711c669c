import { describe, expect, it } from 'vitest';
import { editorVolts, powerEcho, powerForm, switchPower, toggleMonth, typedWatts } from './device-fields';

// Power figures follow P = V × I × PF (single phase) and P = √3 × V × I × PF (balanced three phase,
// line-to-line volts), the usual handbook power formulas; the figures are invented examples.

describe('the power shown beside what was typed', () => {
	it.each<[string, object, string]>([
		['amps × volts as watts', { amps: 0.9, volts: 120 }, '≈ 108 W'],
		['with a motor power factor', { amps: 1, volts: 120, powerFactor: 0.8 }, '≈ 96 W'],
		['three phase, line-to-line volts', { amps: 10, volts: 230, powerFactor: 0.8, phases: 3 }, '≈ 3,187 W'],
		['a small load with a decimal', { amps: 0.05, volts: 120 }, '≈ 6 W'],
		['watts as amps at the supply voltage', { watts: 108 }, '0.9 A at 120 V'],
		['watts with two decimals of amps', { watts: 100 }, '0.83 A at 120 V']
	])('shows %s', (_situation, power, text) => {
		expect(powerEcho(power)).toBe(text);
	});

	it('uses the site supply voltage for the amps of a watts entry', () => {
		expect(powerEcho({ watts: 460 }, 230)).toBe('2 A at 230 V');
	});

	it('shows nothing while a needed figure is missing', () => {
		expect(powerEcho({ amps: 2 })).toBe('');
		expect(powerEcho({ watts: undefined })).toBe('');
		expect(powerEcho(undefined)).toBe('');
		expect(typedWatts({ amps: 1, volts: 120, powerFactor: undefined })).toBe(120);
	});

	it('tells the two forms apart by the fields present', () => {
		expect(powerForm({ watts: 5 })).toBe('watts');
		expect(powerForm({ amps: undefined, volts: 120 })).toBe('amps');
		expect(powerForm({})).toBe('watts');
		expect(powerForm(null)).toBe('watts');
	});
});

describe('switching the power form', () => {
	it('turns watts into amps at the supply voltage, and back', () => {
		expect(switchPower({ watts: 240 }, 'amps')).toEqual({ amps: 2, volts: 120, powerFactor: 1, phases: 1 });
		expect(switchPower({ amps: 2, volts: 120, powerFactor: 0.5 }, 'watts')).toEqual({ watts: 120 });
	});

	it('starts from zero when nothing usable was typed', () => {
		expect(switchPower({ watts: undefined }, 'amps')).toEqual({
			amps: 0,
			volts: 120,
			powerFactor: 1,
			phases: 1
		});
		expect(switchPower({ amps: 3 }, 'watts')).toEqual({ watts: 0 });
	});
});

describe('active months', () => {
	it('turns a month off from all year, and back on to all year', () => {
		const withoutJuly = toggleMonth(undefined, 7);
		expect(withoutJuly).toEqual([1, 2, 3, 4, 5, 6, 8, 9, 10, 11, 12]);
		expect(toggleMonth(withoutJuly, 7)).toBeUndefined();
	});

	it('keeps the months in calendar order', () => {
		expect(toggleMonth([11, 12], 1)).toEqual([1, 11, 12]);
	});

	it('keeps an empty list, for the schema to refuse', () => {
		expect(toggleMonth([5], 5)).toEqual([]);
	});
});

describe('the voltage the editor works at', () => {
	it('is the site supply voltage when the site gives one', () => {
		expect(editorVolts(240)).toBe(240);
		expect(editorVolts(230)).toBe(230);
	});

	it('is 120 V only when the site has none (North American receptacles, common practice)', () => {
		expect(editorVolts(null)).toBe(120);
		expect(editorVolts(undefined)).toBe(120);
		expect(editorVolts(0)).toBe(120);
	});

	it('gives a 240 V site a new 180 W device as 0.75 A at 240 V, and switches it to 240 V', () => {
		const volts = editorVolts(240);
		expect(powerEcho({ watts: 180 }, volts)).toBe('0.75 A at 240 V');
		expect(switchPower({ watts: 180 }, 'amps', volts)).toEqual({
			amps: 0.75,
			volts: 240,
			powerFactor: 1,
			phases: 1
		});
	});
});
