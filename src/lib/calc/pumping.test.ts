import { describe, expect, it } from 'vitest';
import { airInjectionPressure, hazenWilliamsHeadLossM, pumpInputPower, pumping } from './pumping';
import { type Pump, pumpingRequestSchema } from './pumping.schema';
import {
	LITERS_PER_US_GALLON,
	METERS_PER_FOOT,
	METERS_PER_INCH,
	PASCALS_PER_PSI,
	WATTS_PER_HORSEPOWER
} from './units';

function pump(more: Partial<Pump> = {}): Pump {
	return {
		flow: 100,
		flowUnit: 'gpm',
		staticLift: 50,
		staticLiftUnit: 'ft',
		pipeLength: 0,
		pipeLengthUnit: 'ft',
		innerDiameter: 2,
		innerDiameterUnit: 'in',
		hazenWilliamsC: 150,
		efficiencyPercent: 100,
		...more
	};
}

describe('hydraulic power', () => {
	// Hydraulic Institute, US units: water horsepower = gpm × ft of head / 3960 (water, SG 1). The 3960
	// assumes 8.33 lb/gal; with 1000 kg/m³ the SI value is about 0.15 % higher, hence 0.5 % tolerance.
	it.each([
		[100, 50],
		[10, 4],
		[600, 120]
	])('matches water horsepower for %d gpm against %d ft', (gpm, feet) => {
		const result = pumpInputPower(pump({ flow: gpm, staticLift: feet }), 'fresh');
		const waterHorsepower = (gpm * feet) / 3960;
		expect(result.hydraulicWatts / WATTS_PER_HORSEPOWER / waterHorsepower).toBeCloseTo(1, 2);
		expect(Math.abs(result.hydraulicWatts / WATTS_PER_HORSEPOWER / waterHorsepower - 1)).toBeLessThan(0.005);
	});

	it('divides by wire-to-water efficiency to give input watts', () => {
		const result = pumpInputPower(pump({ efficiencyPercent: 40 }), 'fresh');
		expect(result.inputWatts).toBeCloseTo(result.hydraulicWatts / 0.4, 9);
	});

	it('needs 2.5 % more power for sea water (1025 vs 1000 kg/m³, from memory)', () => {
		const fresh = pumpInputPower(pump(), 'fresh').inputWatts;
		expect(pumpInputPower(pump(), 'sea').inputWatts / fresh).toBeCloseTo(1.025, 9);
	});
});

describe('pipe friction by Hazen–Williams', () => {
	// From memory: the US form h_f = 4.52·L·Q^1.852 / (C^1.852·d^4.87) psi (Q gpm, d in, L ft; the form
	// sprinkler standards use) and the SI form 10.67·L·Q^1.852 / (C^1.852·d^4.8704) m; they must agree.
	it.each([
		[50, 2, 150, 100],
		[10, 1, 140, 50],
		[300, 4, 120, 500]
	])('agrees with the US-units form for %d gpm in %d-inch pipe, C %d, %d ft', (gpm, inches, c, feet) => {
		const usPsi = (4.52 * feet * gpm ** 1.852) / (c ** 1.852 * inches ** 4.87);
		const headM = hazenWilliamsHeadLossM(
			feet * METERS_PER_FOOT,
			(gpm * LITERS_PER_US_GALLON) / 1000 / 60,
			inches * METERS_PER_INCH,
			c
		);
		const siPsi = (headM * 1000 * 9.80665) / PASCALS_PER_PSI;
		expect(Math.abs(siPsi / usPsi - 1)).toBeLessThan(0.01);
	});

	it('adds friction head to the static lift', () => {
		const result = pumpInputPower(pump({ pipeLength: 100 }), 'fresh');
		expect(result.frictionHeadM).toBeGreaterThan(0);
		expect(result.totalHeadM).toBeCloseTo(result.staticHeadM + result.frictionHeadM, 12);
	});

	it('has no friction without flow or pipe', () => {
		expect(hazenWilliamsHeadLossM(0, 0.01, 0.05, 150)).toBe(0);
		expect(pumpInputPower(pump({ flow: 0, pipeLength: 100 }), 'fresh').inputWatts).toBe(0);
	});
});

describe('air injection pressure', () => {
	it('needs about 2 psi to inject air 4.6 ft deep (common practice, no source)', () => {
		expect(airInjectionPressure({ depth: 4.6, depthUnit: 'ft' }, 'fresh').psi).toBeCloseTo(2, 1);
	});

	it('gives inches of water equal to the depth in inches for fresh water (conventional inch of water)', () => {
		const result = airInjectionPressure({ depth: 36, depthUnit: 'in' }, 'fresh');
		expect(result.inchesOfWater).toBeCloseTo(36, 9);
		expect(result.kPa).toBeCloseTo((result.psi * PASCALS_PER_PSI) / 1000, 9);
	});

	it('needs more pressure in sea water', () => {
		const fresh = airInjectionPressure({ depth: 1, depthUnit: 'm' }, 'fresh').kPa;
		expect(fresh).toBeCloseTo(9.80665, 9);
		expect(airInjectionPressure({ depth: 1, depthUnit: 'm' }, 'sea').kPa).toBeCloseTo(fresh * 1.025, 9);
	});
});

describe('the pumping request', () => {
	it('answers both parts with their defaults applied', () => {
		const request = pumpingRequestSchema.parse({
			pump: { ...pump(), hazenWilliamsC: undefined },
			air: { depth: 1, depthUnit: 'm' }
		});
		const result = pumping(request);
		expect(request.pump?.hazenWilliamsC).toBe(150);
		expect(result.fluid).toBe('fresh');
		expect(result.pump?.inputWatts).toBeGreaterThan(0);
		expect(result.air?.kPa).toBeCloseTo(9.80665, 9);
	});

	it('refuses a request with neither a pump nor an air depth', () => {
		expect(pumpingRequestSchema.safeParse({}).success).toBe(false);
	});
});
