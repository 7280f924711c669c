import { describe, expect, it } from 'vitest';
import {
	airText,
	cfmOf,
	KPA_PER_INCH_OF_WATER,
	KPA_PER_PSI,
	LITERS_PER_CUBIC_FOOT,
	pressureParts
} from './air-units';

describe('units growers read off pumps and gauges', () => {
	it.each([
		// NIST SP 811 (2008), Appendix B.8: cubic foot = 2.831 685 E-02 m³ (exact from the foot).
		['litres per cubic foot', LITERS_PER_CUBIC_FOOT, 28.316846592, 9],
		// NIST SP 811 (2008), Appendix B.8: psi = 6.894 757 E+03 Pa.
		['kPa per psi', KPA_PER_PSI, 6.894757, 6],
		// Conventional inch of water, 1000 kg/m³ × 9.806 65 m/s² × 0.0254 m = 249.088 91 Pa (derived from the definition).
		['kPa per inch of water', KPA_PER_INCH_OF_WATER, 0.24908891, 8]
	])('%s', (_name, value, expected, digits) => {
		expect(value).toBeCloseTo(expected, digits);
	});

	it('writes free air in L/min and cfm, and a gauge pressure in kPa, psi and inches of water', () => {
		// Issue 18's worked example (derived from the equation): about 29.5 L/min at about 6.9 kPa.
		expect(cfmOf(29.5)).toBeCloseTo(1.0418, 4);
		expect(airText(29.5)).toBe('29.5 L/min (1.04 cfm)');
		expect(pressureParts(6.9)).toEqual({
			kPa: '6.9 kPa',
			psi: '1 psi',
			inchesOfWater: '27.7 inches of water'
		});
	});
});
