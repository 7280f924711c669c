import { describe, expect, it } from 'vitest';
import {
	altitudeEcho,
	depthEcho,
	fahrenheitFrom,
	feetFrom,
	LITERS_PER_US_GALLON,
	litersFrom,
	metersFrom,
	temperatureEcho,
	usGallonsFrom,
	volumeEcho
} from './tank-units';

describe('the units a tank is typed in', () => {
	it('has the US gallon at 231 cubic inches, 3.785 411 784 L exactly (NIST SP 811, Appendix B)', () => {
		expect(LITERS_PER_US_GALLON).toBeCloseTo(3.785411784, 12);
	});

	it.each([
		// [volume, unit, litres, source]
		[1, 'L', 1, 'definition'],
		[100, 'gal', 378.5411784, 'NIST SP 811: 1 gal (US) = 3.785 411 784 L'],
		[2.5, 'm3', 2500, 'SI: 1 m³ = 1000 L']
	] as const)('reads %d %s as %d L (%s)', (volume, unit, liters, _source) => {
		expect(litersFrom(volume, unit)).toBeCloseTo(liters, 9);
	});

	it('reads feet as metres at 0.3048 m a foot (international foot, NIST SP 811)', () => {
		expect(metersFrom(4, 'ft')).toBeCloseTo(1.2192, 12);
		expect(metersFrom(1.5, 'm')).toBe(1.5);
		expect(feetFrom(0.3048)).toBeCloseTo(1, 12);
	});

	it('turns degrees Celsius into Fahrenheit (the scales’ definition: 0 °C = 32 °F, 100 °C = 212 °F)', () => {
		expect(fahrenheitFrom(0)).toBe(32);
		expect(fahrenheitFrom(100)).toBe(212);
		expect(fahrenheitFrom(20)).toBe(68);
	});

	it('turns litres back into US gallons', () => {
		expect(usGallonsFrom(3.785411784)).toBeCloseTo(1, 12);
	});
});

describe('the echo beside each box', () => {
	it('shows a volume in litres as US gallons, and any other unit as litres', () => {
		expect(volumeEcho('1000', 'L')).toBe('= 264.2 US gal');
		expect(volumeEcho('100', 'gal')).toBe('= 378.5 L');
		expect(volumeEcho('1.2', 'm3')).toBe('= 1,200 L');
	});

	it('shows a depth in the other unit, a temperature in °F and the altitude in feet', () => {
		expect(depthEcho('1', 'm')).toBe('= 3.28 ft');
		expect(depthEcho('4', 'ft')).toBe('= 1.22 m');
		expect(temperatureEcho('25')).toBe('= 77 °F');
		expect(altitudeEcho('1000')).toBe('= 3,281 ft');
	});

	it('says nothing while a box is empty or holds something that is not a number', () => {
		expect(volumeEcho('', 'L')).toBeUndefined();
		expect(depthEcho('1.2.3', 'm')).toBeUndefined();
		expect(temperatureEcho('warm')).toBeUndefined();
		expect(altitudeEcho(' ')).toBeUndefined();
	});
});
