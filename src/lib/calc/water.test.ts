import { describe, expect, it } from 'vitest';
import {
	barometricPressureAtm,
	oxygenSaturationMgL,
	waterDensityKgPerM3,
	waterVapourPressureAtm,
	waterViscosityPaS
} from './water';

describe('dissolved-oxygen saturation in fresh water at 1 atm', () => {
	// Source: the published table of the Benson & Krause (1984) equation, APHA Standard Methods 4500-O
	// (ISO 5814 rounds the same values), as quoted in the issue.
	it.each([
		[0, 14.621],
		[10, 11.288],
		[20, 9.092],
		[25, 8.263],
		[30, 7.559],
		[40, 6.413]
	])('holds the table value at %i °C', (temperatureC, mgL) => {
		expect(oxygenSaturationMgL(temperatureC)).toBeCloseTo(mgL, 3);
	});
});

describe('dissolved-oxygen saturation with salt and altitude', () => {
	it('falls in sea water', () => {
		// Derived from the equation's salinity term (Benson & Krause 1984): 20 °C, 35 g/kg → 7.396 mg/L;
		// the Standard Methods table near that salinity reads about 7.4 mg/L (from memory).
		expect(oxygenSaturationMgL(20, 35)).toBeCloseTo(7.396, 2);
	});

	it('falls with pressure a little more than in proportion, because of the water vapour', () => {
		// Derived from the Green & Carritt equation: at 0.8870 atm (1,000 m) C_p / C* ≈ 0.884 at 20 °C.
		const ratio = oxygenSaturationMgL(20, 0, 0.887) / oxygenSaturationMgL(20);
		expect(ratio).toBeGreaterThan(0.88);
		expect(ratio).toBeLessThan(0.887);
	});
});

describe('barometric pressure by altitude', () => {
	// Source: US Standard Atmosphere 1976 tables: 1,000 m 89,875 Pa; 2,000 m 79,495 Pa; 0 m 101,325 Pa.
	it.each([
		[0, 101_325],
		[1000, 89_875],
		[2000, 79_495]
	])('at %i m is %i Pa', (altitudeM, pascals) => {
		expect(barometricPressureAtm(altitudeM) * 101_325).toBeCloseTo(pascals, -1);
	});
});

describe('water density', () => {
	it.each([
		// Source: UNESCO (1983) Technical Papers in Marine Science 44, check values of the EOS-80
		// one-atmosphere equation (from memory): S 0, 5 °C 999.96675; S 35, 5 °C 1027.67547; S 35, 25 °C 1023.34306.
		[5, 0, 999.96675],
		[5, 35, 1027.67547],
		[25, 35, 1023.34306],
		// Source: CRC Handbook of Chemistry and Physics, density of water at 20 °C 998.21 kg/m³ (from memory).
		[20, 0, 998.21]
	])('at %i °C and %i g/kg is %f kg/m³', (temperatureC, salinity, density) => {
		expect(waterDensityKgPerM3(temperatureC, salinity)).toBeCloseTo(density, 1);
	});
});

describe('water viscosity', () => {
	it('is about 1.0 mPa·s at 20 °C (Vogel; CRC Handbook gives 1.0016 mPa·s, from memory)', () => {
		expect(waterViscosityPaS(20) * 1000).toBeCloseTo(1.0016, 2);
	});

	it('is about 0.89 mPa·s at 25 °C (CRC Handbook 0.8900 mPa·s, from memory)', () => {
		expect(waterViscosityPaS(25) * 1000).toBeCloseTo(0.89, 2);
	});

	it('rises with salt: 35 g/kg at 20 °C about 1.08 mPa·s (Sharqawy et al. 2010, Table 3 gives 1.077, from memory)', () => {
		expect(waterViscosityPaS(20, 35) * 1000).toBeCloseTo(1.077, 2);
	});
});

describe('water vapour pressure', () => {
	it('is 2.34 kPa at 20 °C (CRC Handbook 2.339 kPa, from memory)', () => {
		expect(waterVapourPressureAtm(20) * 101.325).toBeCloseTo(2.339, 1);
	});
});
