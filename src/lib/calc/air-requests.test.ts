import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { aeration } from './aeration';
import { type AerationRequestInput, aerationRequestSchema } from './aeration.schema';
import { aerationInputFrom, airliftInputFrom, flowToLpm, pressureToKPa } from './air-requests';
import { airlift } from './airlift';
import { type AirliftRequestInput, airliftRequestSchema } from './airlift.schema';
import { parseRequest } from './parse';

function numbersOf(value: unknown): number[] {
	if (typeof value === 'number') return [value];
	if (value && typeof value === 'object') return Object.values(value).flatMap(numbersOf);
	return [];
}

/** What the endpoint does with a body: 400 with issues, or the core's answer (`calculationEndpoint`). */
function answer(kind: 'airlift' | 'aeration', json: unknown) {
	if (kind === 'airlift') {
		const parsed = parseRequest(airliftRequestSchema, json);
		return parsed.success
			? { status: 200, body: airlift(airliftInputFrom(parsed.data)) }
			: { status: 400, body: parsed.error };
	}
	const parsed = parseRequest(aerationRequestSchema, json);
	return parsed.success
		? { status: 200, body: aeration(aerationInputFrom(parsed.data)) }
		: { status: 400, body: parsed.error };
}

function expectFinite(body: unknown) {
	const numbers = numbersOf(body);
	expect(numbers.filter((n) => !Number.isFinite(n))).toEqual([]);
}

/** A number anywhere in [min, max], its ends and values just inside them included. */
const within = (min: number, max: number) =>
	fc.oneof(
		{ weight: 4, arbitrary: fc.double({ min, max, noNaN: true }) },
		{ weight: 1, arbitrary: fc.constantFrom(min, max) }
	);
/** Strictly above zero up to max, tiny values included. */
const positive = (max: number) =>
	fc.oneof(
		{ weight: 4, arbitrary: fc.double({ min: Number.MIN_VALUE, max, noNaN: true }) },
		{ weight: 1, arbitrary: fc.constantFrom(Number.MIN_VALUE, 1e-9, max) }
	);
const METERS = { m: 1, ft: 0.3048, cm: 0.01, in: 0.0254, mm: 0.001 } as const;
/**
 * A length in one of `units`, from `minM` metres (the schema's floor, whatever the unit) to `max` in
 * that unit, the ends included.
 */
const lengthIn = <U extends keyof typeof METERS>(units: readonly U[], minM: number, max: number) =>
	fc.constantFrom(...units).chain((unit) => fc.tuple(fc.constant(unit), within(minM / METERS[unit], max)));
const DEPTH_UNITS = ['m', 'ft', 'cm', 'in'] as const;
const flowUnit = fc.constantFrom('gpm' as const, 'gph' as const, 'lpm' as const, 'm3h' as const);

const airliftArb: fc.Arbitrary<AirliftRequestInput> = fc
	.record({
		fluid: fc.constantFrom('fresh' as const, 'sea' as const),
		salinityGPerKg: fc.option(within(0, 45), { nil: undefined }),
		temperatureC: within(0, 40),
		altitudeM: within(-500, 6000),
		riser: lengthIn(['mm', 'in'], 0.003, 39.37),
		submergence: lengthIn(DEPTH_UNITS, 0.01, 100),
		lift: lengthIn(DEPTH_UNITS, 0, 100),
		flow: positive(1_000_000),
		flowUnit,
		givesWater: fc.boolean(),
		efficiencyPercent: within(10, 60)
	})
	.map(({ riser, submergence, lift, flow, flowUnit: unit, givesWater, ...rest }): AirliftRequestInput => ({
		...rest,
		riserInnerDiameter: riser[1],
		riserInnerDiameterUnit: riser[0],
		submergence: submergence[1],
		submergenceUnit: submergence[0],
		lift: lift[1],
		liftUnit: lift[0],
		...(givesWater ? { waterFlow: flow, waterFlowUnit: unit } : { airFlow: flow, airFlowUnit: unit })
	}))
	// A few bodies at the ends fall just outside after rounding (1,000 mm is the riser's most); this
	// property is about every body the schema accepts.
	.filter((body) => airliftRequestSchema.safeParse(body).success);

const demandArb: fc.Arbitrary<AerationRequestInput['demand']> = fc.oneof(
	fc.record(
		{
			feedKgPerDay: within(0, 1_000_000),
			proteinPercent: within(0, 100),
			kgO2PerKgFeed: within(0, 5)
		},
		{ requiredKeys: ['feedKgPerDay', 'proteinPercent'] }
	),
	fc.record({ oxygenGramsPerHour: within(0, 10_000_000) })
);

const aerationArb: fc.Arbitrary<AerationRequestInput> = fc
	.record({
		temperatureC: within(0, 40),
		salinityGPerKg: within(0, 45),
		altitudeM: within(-500, 6000),
		targetDoMgL: positive(20),
		depth: lengthIn(DEPTH_UNITS, 0.05, 100),
		diffuser: fc.constantFrom('fine' as const, 'coarse' as const),
		transferPercentPerM: fc.option(within(0.5, 20), { nil: undefined }),
		alpha: within(0.2, 1.5),
		beta: within(0.5, 1.2),
		fouling: within(0.5, 1),
		theta: within(1, 1.1),
		depthCorrection: within(0, 1),
		extraPressureKPa: within(0, 50),
		wireToAirPercent: within(1, 100),
		demand: demandArb
	})
	.map(({ depth, ...rest }) => ({ ...rest, diffuserDepth: depth[1], diffuserDepthUnit: depth[0] }))
	.filter((body) => aerationRequestSchema.safeParse(body).success);

/** Hostile JSON: anything at all, and objects of the requests' own keys holding wrong or boundary values. */
const hostileValue = fc.oneof(
	fc.constantFrom(0, -0, -1, 1e308, -1e308, Number.MIN_VALUE, 'NaN', 'Infinity', '', null, [], {}, true),
	fc.double(),
	fc.jsonValue({ maxDepth: 2 })
);
const keysOf = (arb: 'airlift' | 'aeration') =>
	arb === 'airlift'
		? [
				'fluid',
				'temperatureC',
				'riserInnerDiameter',
				'riserInnerDiameterUnit',
				'submergence',
				'submergenceUnit',
				'lift',
				'liftUnit',
				'waterFlow',
				'waterFlowUnit',
				'airFlow',
				'airFlowUnit',
				'efficiencyPercent',
				'salinityGPerKg',
				'altitudeM'
			]
		: [
				'temperatureC',
				'salinityGPerKg',
				'altitudeM',
				'targetDoMgL',
				'diffuserDepth',
				'diffuserDepthUnit',
				'diffuser',
				'transferPercentPerM',
				'alpha',
				'beta',
				'fouling',
				'theta',
				'depthCorrection',
				'extraPressureKPa',
				'wireToAirPercent',
				'demand'
			];
/** A valid body with one to three of its values swapped for hostile ones. */
const spoiled = <T extends object>(valid: fc.Arbitrary<T>, keys: string[]) =>
	fc
		.tuple(valid, fc.array(fc.tuple(fc.constantFrom(...keys), hostileValue), { minLength: 1, maxLength: 3 }))
		.map(([body, swaps]) => ({ ...body, ...Object.fromEntries(swaps) }));

const RUNS = { numRuns: 300 };

describe.each(['airlift', 'aeration'] as const)('POST /api/v1/%s', (kind) => {
	const valid: fc.Arbitrary<object> = kind === 'airlift' ? airliftArb : aerationArb;

	it('answers every body its schema accepts with finite numbers only', () => {
		fc.assert(
			fc.property(valid, (body) => {
				const result = answer(kind, body);
				expect(result.status).toBe(200);
				expectFinite(result.body);
			}),
			RUNS
		);
	});

	it('answers any JSON with 200 and finite numbers, or 400 with field paths and words', () => {
		const anyJson = fc.oneof(
			fc.jsonValue(),
			spoiled(valid, keysOf(kind)),
			fc.dictionary(fc.constantFrom(...keysOf(kind)), hostileValue)
		);
		fc.assert(
			fc.property(anyJson, (json) => {
				const result = answer(kind, json);
				if (result.status === 200) return expectFinite(result.body);
				const { issues } = result.body as { issues: { path: unknown; message: unknown }[] };
				expect(issues.length).toBeGreaterThan(0);
				for (const issue of issues) {
					expect(typeof issue.path).toBe('string');
					expect(issue.message).toMatch(/^[A-Z0-9]/);
					expect(issue.message).not.toMatch(/invalid input|expected/i);
				}
			}),
			RUNS
		);
	});
});

describe('the request in the core’s units', () => {
	it('converts lengths, flows and pressures by their exact definitions', () => {
		// NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 US gal = 3.785411784 L,
		// 1 psi = 6.894757 kPa; the conventional inch of water = 249.089 Pa (1000 kg/m³ × g × 25.4 mm).
		const input = airliftInputFrom(
			airliftRequestSchema.parse({
				fluid: 'sea',
				temperatureC: 25,
				riserInnerDiameter: 1,
				riserInnerDiameterUnit: 'in',
				submergence: 3,
				submergenceUnit: 'ft',
				lift: 6,
				liftUnit: 'in',
				waterFlow: 5,
				waterFlowUnit: 'gpm'
			})
		);
		expect(input).toEqual({
			riserInnerDiameterM: 0.0254,
			submergenceM: expect.closeTo(0.9144, 12),
			liftM: expect.closeTo(0.1524, 12),
			temperatureC: 25,
			salinityGPerKg: 35,
			altitudeM: 0,
			efficiencyPercent: 30,
			waterFlowLpm: expect.closeTo(18.92705892, 8)
		});
		expect(flowToLpm(1, 'm3h')).toBeCloseTo(16.6667, 4);
		expect(pressureToKPa(1, 'psi')).toBeCloseTo(6.894757, 6);
		expect(pressureToKPa(40, 'inH2O')).toBeCloseTo(9.96356, 5);
	});

	it('gives the worked air-lift example: 20 L/min up 0.3 m from 0.7 m deep needs about 29.5 L/min at 6.9 kPa', () => {
		// Derived from Nicklin's (1963) equation, fresh water at 20 °C, η 30 % (issue 18's worked example).
		const result = answer('airlift', {
			temperatureC: 20,
			riserInnerDiameter: 25,
			riserInnerDiameterUnit: 'mm',
			submergence: 70,
			submergenceUnit: 'cm',
			lift: 0.3,
			liftUnit: 'm',
			waterFlow: 20,
			waterFlowUnit: 'lpm'
		});
		expect(result.status).toBe(200);
		const body = result.body as { airFlowLpm: number; injectionPressureKPa: number };
		expect(body.airFlowLpm).toBeCloseTo(29.5, 1);
		expect(body.injectionPressureKPa).toBeCloseTo(6.9, 1);
	});

	it('gives the field-to-standard ratio 0.780 in clean water at 20 °C, sea level, target 2 mg/L', () => {
		// Metcalf & Eddy, Wastewater Engineering (5th ed.): (β·C_s − C_L) / C_s,20 = (9.092 − 2) / 9.092 (issue 18's check).
		const result = answer('aeration', {
			temperatureC: 20,
			targetDoMgL: 2,
			diffuserDepth: 1,
			diffuserDepthUnit: 'm',
			diffuser: 'coarse',
			alpha: 1,
			beta: 1,
			fouling: 1,
			depthCorrection: 0,
			demand: { feedKgPerDay: 1, proteinPercent: 35 }
		});
		expect(result.status).toBe(200);
		expect((result.body as { fieldToStandardRatio: number }).fieldToStandardRatio).toBeCloseTo(0.78, 3);
	});
});
