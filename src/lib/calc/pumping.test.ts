import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { darcyWeisbach } from './pipe-friction';
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
		frictionMethod: 'hazen-williams',
		roughnessMm: 0.0015,
		waterTemperatureC: 20,
		fittings: [],
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

describe('friction by Darcy–Weisbach and the fittings', () => {
	// 10 US gpm up 5 ft through 50 ft of 1-inch pipe, the helper's own example (invented duty point).
	const duty = { flow: 10, staticLift: 5, pipeLength: 50, innerDiameter: 1, efficiencyPercent: 25 };
	const oldBody = {
		fluid: 'fresh',
		pump: { ...duty, flowUnit: 'gpm', staticLiftUnit: 'ft', pipeLengthUnit: 'ft', innerDiameterUnit: 'in' }
	};

	it('answers a body of before this change exactly as before: Hazen–Williams, no fittings', () => {
		const request = pumpingRequestSchema.parse(oldBody);
		const result = pumping(request).pump!;
		expect(request.pump).toMatchObject({
			frictionMethod: 'hazen-williams',
			fittings: [],
			waterTemperatureC: 20
		});
		expect(result.frictionHeadM).toBe(
			hazenWilliamsHeadLossM(50 * METERS_PER_FOOT, result.flowM3PerS, METERS_PER_INCH, 150)
		);
		expect(result).toMatchObject({
			frictionMethod: 'hazen-williams',
			fittingsHeadM: 0,
			frictionFactor: null
		});
		expect(result.totalHeadM).toBe(result.staticHeadM + result.frictionHeadM);
		// About 64 W, the doc comment's example (derived from the equation).
		expect(result.inputWatts).toBeCloseTo(64, 0);
	});

	it('works the pipe out by Darcy–Weisbach when asked, at the water temperature given', () => {
		const request = pumpingRequestSchema.parse({
			...oldBody,
			pump: { ...oldBody.pump, frictionMethod: 'darcy-weisbach', waterTemperatureC: 10 }
		});
		const result = pumping(request).pump!;
		const expected = darcyWeisbach(50 * METERS_PER_FOOT, result.flowM3PerS, METERS_PER_INCH, 0.0015, 10);
		expect(result.frictionHeadM).toBe(expected.headLossM);
		expect(result.frictionFactor).toBe(expected.frictionFactor);
		expect(result.reynoldsNumber).toBe(expected.reynoldsNumber);
	});

	it('shows two standard elbows apart from the pipe and adds them to the total (EPANET K 0.9 each)', () => {
		const result = pumpInputPower(pump({ fittings: [{ kind: 'elbow-90-short', count: 2 }] }), 'fresh');
		expect(result.fittingsHeadM).toBeCloseTo((1.8 * result.velocityMPerS ** 2) / (2 * 9.80665), 12);
		expect(result.totalHeadM).toBeCloseTo(
			result.staticHeadM + result.frictionHeadM + result.fittingsHeadM,
			12
		);
	});

	it('uses the viscosity of sea water (35 g/kg) for the Reynolds number of sea water', () => {
		const fresh = pumpInputPower(pump({ frictionMethod: 'darcy-weisbach' }), 'fresh').reynoldsNumber;
		expect(pumpInputPower(pump({ frictionMethod: 'darcy-weisbach' }), 'sea').reynoldsNumber).toBeLessThan(
			fresh
		);
	});
});

describe('the new fields, refused in words', () => {
	const base = {
		flow: 1,
		flowUnit: 'gpm',
		staticLift: 1,
		staticLiftUnit: 'ft',
		pipeLength: 1,
		pipeLengthUnit: 'ft',
		innerDiameter: 1,
		innerDiameterUnit: 'in',
		efficiencyPercent: 30
	};
	const messages = (pumpMore: Record<string, unknown>) => {
		const parsed = pumpingRequestSchema.safeParse({ pump: { ...base, ...pumpMore } });
		return parsed.success ? [] : parsed.error.issues.map((issue) => [issue.path.join('.'), issue.message]);
	};

	it.each([
		[
			{ frictionMethod: 'manning' },
			'pump.frictionMethod',
			'Friction method must be one of: hazen-williams, darcy-weisbach'
		],
		[{ roughnessMm: -1 }, 'pump.roughnessMm', 'Pipe roughness must be zero or more'],
		[{ waterTemperatureC: 60 }, 'pump.waterTemperatureC', 'Water temperature must be at most 40'],
		[
			{ fittings: [{ kind: 'elbow-90-short', count: 1.5 }] },
			'pump.fittings.0.count',
			'Number of fittings must be a whole number'
		],
		[
			{ fittings: [{ kind: 'bend', count: 1 }] },
			'pump.fittings.0.kind',
			expect.stringMatching(/^Fitting kind must be one of: elbow-90-short/)
		],
		[
			{ fittings: [{ kind: 'exit', count: 0 }] },
			'pump.fittings.0.count',
			'Number of fittings must be at least 1'
		],
		[
			{ fittings: Array.from({ length: 51 }, () => ({ kind: 'exit', count: 1 })) },
			'pump.fittings',
			'Fittings can have at most 50 entries'
		]
	])('refuses %j at its field', (more, path, message) => {
		expect(messages(more)).toEqual([[path, message]]);
	});
});

describe('any pump the schema accepts', () => {
	const numbers = (value: unknown): number[] =>
		typeof value === 'number'
			? [value]
			: value && typeof value === 'object'
				? Object.values(value).flatMap(numbers)
				: [];
	// Ordinary figures most of the time, the schema's extremes now and then.
	const figure = (min: number, max: number, ...edges: number[]) =>
		fc.oneof(
			{ weight: 4, arbitrary: fc.double({ min, max, noNaN: true }) },
			{ weight: 1, arbitrary: fc.constantFrom(...edges) }
		);

	it('answers in finite numbers only: no NaN, no Infinity (property)', () => {
		let answered = 0;
		fc.assert(
			fc.property(
				fc.record({
					flow: figure(0, 1000, 0, 5e-324, 1e-9, 10_000_000),
					flowUnit: fc.constantFrom('gpm', 'gph', 'lpm', 'm3h'),
					staticLift: figure(0, 100, 0, 10_000),
					staticLiftUnit: fc.constantFrom('ft', 'm'),
					pipeLength: figure(0, 1000, 0, 1_000_000),
					pipeLengthUnit: fc.constantFrom('ft', 'm'),
					innerDiameter: figure(0.5, 500, 1e-300, 5e-324, 10_000),
					innerDiameterUnit: fc.constantFrom('in', 'mm'),
					efficiencyPercent: figure(0.01, 100, 0.01, 100),
					frictionMethod: fc.constantFrom('hazen-williams', 'darcy-weisbach'),
					roughnessMm: figure(0, 10, 0, 10),
					waterTemperatureC: figure(0, 40, 0, 40),
					fittings: fc.array(
						fc.record({
							kind: fc.constantFrom('elbow-90-short', 'globe-valve'),
							count: fc.integer({ min: 1, max: 1000 })
						}),
						{ maxLength: 3 }
					)
				}),
				fc.constantFrom('fresh', 'sea'),
				(pump, fluid) => {
					const parsed = pumpingRequestSchema.safeParse({ fluid, pump });
					if (!parsed.success) return;
					answered++;
					expect(numbers(pumping(parsed.data)).every(Number.isFinite)).toBe(true);
				}
			),
			{ numRuns: 500 }
		);
		expect(answered).toBeGreaterThan(100);
	});

	it('refuses water faster than 100 m/s at the inner diameter, in words', () => {
		const parsed = pumpingRequestSchema.safeParse({
			pump: { ...pump(), flow: 1000, innerDiameter: 1e-300 }
		});
		expect(parsed.success ? [] : parsed.error.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
			[
				'pump.innerDiameter',
				'At this flow the water would run through this pipe faster than 100 m/s; check the flow, the inner diameter and their units'
			]
		]);
	});

	it('refuses, for Darcy–Weisbach, a roughness past the Moody diagram (ε/D 0.05)', () => {
		const parsed = pumpingRequestSchema.safeParse({
			pump: {
				...pump(),
				innerDiameter: 10,
				innerDiameterUnit: 'mm',
				roughnessMm: 0.6,
				frictionMethod: 'darcy-weisbach'
			}
		});
		expect(parsed.success ? [] : parsed.error.issues.map((i) => i.path.join('.'))).toEqual([
			'pump.roughnessMm'
		]);
	});

	it('says only what is wrong with a box that is not a number, not the speed as well', () => {
		const parsed = pumpingRequestSchema.safeParse({ pump: { ...pump(), flow: 'ten' } });
		expect(parsed.success ? [] : parsed.error.issues.map((i) => i.path.join('.'))).toEqual(['pump.flow']);
	});
});
