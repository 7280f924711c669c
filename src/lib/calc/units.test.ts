import { describe, expect, it } from 'vitest';
import {
	LITERS_PER_US_GALLON,
	METERS_PER_FOOT,
	PASCALS_PER_INCH_OF_WATER,
	PASCALS_PER_PSI,
	STANDARD_GRAVITY_M_PER_S2,
	WATTS_PER_HORSEPOWER,
	flowToCubicMetersPerSecond,
	lengthToMeters
} from './units';

describe('conversion factors', () => {
	it.each([
		// [name, value, reference, digits, source]
		['horsepower (550 ft·lbf/s) in W', WATTS_PER_HORSEPOWER, 745.699872, 5, 'NIST SP 811 B.9'],
		['US gallon in L', LITERS_PER_US_GALLON, 3.785411784, 12, 'NIST SP 811 B.9'],
		['foot in m', METERS_PER_FOOT, 0.3048, 12, 'NIST SP 811 B.9'],
		['psi in kPa', PASCALS_PER_PSI / 1000, 6.894757, 6, 'NIST SP 811 B.9'],
		['standard gravity in m/s²', STANDARD_GRAVITY_M_PER_S2, 9.80665, 12, 'CGPM 1901'],
		['inch of water (conventional) in Pa', PASCALS_PER_INCH_OF_WATER, 249.0889, 4, 'NIST SP 811 B.9']
	])('gives the %s', (_name, value, reference, digits) => {
		expect(value).toBeCloseTo(reference, digits);
	});

	it('puts 1 psi at about 2.31 ft of fresh water (handbook)', () => {
		const feet = PASCALS_PER_PSI / (1000 * STANDARD_GRAVITY_M_PER_S2) / METERS_PER_FOOT;
		expect(feet).toBeCloseTo(2.31, 2);
	});
});

describe('flows and lengths', () => {
	it('converts every flow unit to the same cubic metres per second', () => {
		const gpm = flowToCubicMetersPerSecond(1, 'gpm');
		expect(flowToCubicMetersPerSecond(60, 'gph')).toBeCloseTo(gpm, 15);
		expect(flowToCubicMetersPerSecond(LITERS_PER_US_GALLON, 'lpm')).toBeCloseTo(gpm, 15);
		expect(flowToCubicMetersPerSecond((LITERS_PER_US_GALLON * 60) / 1000, 'm3h')).toBeCloseTo(gpm, 15);
	});

	it('converts lengths to metres', () => {
		expect(lengthToMeters(12, 'in')).toBeCloseTo(lengthToMeters(1, 'ft'), 15);
		expect(lengthToMeters(254, 'mm')).toBeCloseTo(lengthToMeters(10, 'in'), 15);
		expect(lengthToMeters(150, 'cm')).toBe(1.5);
	});
});
