import { expect, test } from '@playwright/test';

const body = {
	period: { start: '2027-06', months: 1 },
	timezone: 'UTC',
	holidays: null,
	tariff: { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.34 }] },
	equipment: [
		{
			name: 'Pump',
			category: 'water-pump',
			quantity: 1,
			power: { amps: 1, volts: 120 },
			schedule: { type: 'always' }
		}
	]
};

test.describe('the public calculation API', () => {
	test('answers an anonymous calculate request with every charge line', async ({ request }) => {
		const res = await request.post('/api/v1/calculate', { data: body });
		expect(res.status()).toBe(200);
		const result = await res.json();
		// 0.12 kW × 720 h × 0.34 = 29.376 → 29.38 (common practice, no source).
		expect(result.periods[0].charges).toEqual([{ kind: 'energy', label: 'Energy', amount: 29.38 }]);
		expect(result.totals.kwh).toBeCloseTo(86.4, 9);
	});

	test('refuses bad input with 400 and the field path', async ({ request }) => {
		const bad = structuredClone(body) as { equipment: { power: unknown }[] };
		bad.equipment[0]!.power = { amps: -2, volts: 120 };
		const res = await request.post('/api/v1/calculate', { data: bad });
		expect(res.status()).toBe(400);
		const answer = await res.json();
		expect(answer.error).toBe('invalid_request');
		expect(answer.issues.map((i: { path: string }) => i.path)).toContain('equipment.0.power.amps');
	});

	test('refuses malformed JSON with 400 and a body over 1 MB with 413', async ({ request }) => {
		const broken = await request.post('/api/v1/calculate', {
			data: '{"period":',
			headers: { 'content-type': 'application/json' }
		});
		expect(broken.status()).toBe(400);
		const huge = await request.post('/api/v1/calculate', {
			data: JSON.stringify({ ...body, padding: 'x'.repeat(1_100_000) }),
			headers: { 'content-type': 'application/json' }
		});
		expect(huge.status()).toBe(413);
	});

	test('prices a meter series in place of equipment, and names a gap in words', async ({ request }) => {
		// June 2027, hourly: 1.5 kWh every hour = 1,080 kWh; 1.5 kW of demand (derived from the rules).
		const meter = {
			start: '2027-06-01T00:00',
			intervalMinutes: 60,
			kwh: Array.from({ length: 720 }, () => 1.5)
		};
		const tariff = {
			currency: 'USD',
			energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.2 }],
			demandCharges: [{ label: 'Demand', perKw: 10 }]
		};
		const res = await request.post('/api/v1/calculate', { data: { ...body, tariff, equipment: [], meter } });
		expect(res.status()).toBe(200);
		const [june] = (await res.json()).periods;
		expect(june.charges).toEqual([
			{ kind: 'energy', label: 'Energy', amount: 216 },
			{ kind: 'demand', label: 'Demand', amount: 15 }
		]);
		expect(june.meter).toEqual({ kwh: 1080, cost: 231 });

		const gap: unknown[] = [...meter.kwh];
		gap[30] = null;
		const refused = await request.post('/api/v1/calculate', {
			data: { ...body, tariff, equipment: [], meter: { ...meter, kwh: gap } }
		});
		expect(refused.status()).toBe(400);
		expect((await refused.json()).issues).toEqual([
			{
				path: 'meter.kwh.30',
				message: 'Meter value number 31 is missing or not a number (a gap in the series)'
			}
		]);
	});

	test('answers the pumping helper and compare endpoints', async ({ request }) => {
		const pumping = await request.post('/api/v1/pumping', {
			data: { fluid: 'fresh', air: { depth: 4.6, depthUnit: 'ft' } }
		});
		expect(pumping.status()).toBe(200);
		// About 2 psi to inject air 4.6 ft deep in fresh water (common practice, no source).
		expect((await pumping.json()).air.psi).toBeCloseTo(2, 1);
		// A pump body from before the friction choice: Hazen–Williams, no fittings, about 64 W for 10 gpm
		// up 5 ft through 50 ft of 1-inch pipe at 25 % (derived from the equations).
		const pipe = {
			flow: 10,
			flowUnit: 'gpm',
			staticLift: 5,
			staticLiftUnit: 'ft',
			pipeLength: 50,
			pipeLengthUnit: 'ft',
			innerDiameter: 1,
			innerDiameterUnit: 'in',
			efficiencyPercent: 25
		};
		const old = await (await request.post('/api/v1/pumping', { data: { pump: pipe } })).json();
		expect(old.pump).toMatchObject({
			frictionMethod: 'hazen-williams',
			fittingsHeadM: 0,
			frictionFactor: null
		});
		expect(old.pump.inputWatts).toBeCloseTo(64, 0);
		expect(old.pump.totalHeadM).toBeCloseTo(old.pump.staticHeadM + old.pump.frictionHeadM, 12);
		// Darcy–Weisbach with two standard elbows (EPANET K 0.9 each): f ≈ 0.0234 at Re ≈ 31,500,
		// elbows 1.8 × (1.245 m/s)² ÷ 2g ≈ 0.142 m (derived from the equations).
		const darcy = await request.post('/api/v1/pumping', {
			data: {
				pump: { ...pipe, frictionMethod: 'darcy-weisbach', fittings: [{ kind: 'elbow-90-short', count: 2 }] }
			}
		});
		expect(darcy.status()).toBe(200);
		const { pump } = await darcy.json();
		expect(pump.frictionFactor).toBeCloseTo(0.0234, 3);
		expect(pump.fittingsHeadM).toBeCloseTo(0.142, 3);
		expect(pump.totalHeadM).toBeCloseTo(pump.staticHeadM + pump.frictionHeadM + pump.fittingsHeadM, 12);
		const refused = await request.post('/api/v1/pumping', {
			data: { pump: { ...pipe, fittings: [{ kind: 'elbow-90-short', count: 1.5 }] } }
		});
		expect(refused.status()).toBe(400);
		expect((await refused.json()).issues).toEqual([
			{ path: 'pump.fittings.0.count', message: 'Number of fittings must be a whole number' }
		]);
		const compare = await request.post('/api/v1/compare', {
			data: {
				...body,
				period: { start: '2027-01', months: 12 },
				scenarios: [
					{ name: 'One pump', equipment: body.equipment, oneOffCosts: [] },
					{ name: 'Nothing', equipment: [], oneOffCosts: [] }
				],
				baseline: 0,
				finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 3 },
				emissionFactorKgPerKwh: 0.4
			}
		});
		expect(compare.status()).toBe(200);
		const result = await compare.json();
		expect(result.scenarios[1].savingsPerYear).toBeGreaterThan(0);
	});
	test('answers the air-lift and aeration endpoints with the worked examples', async ({ request }) => {
		const airlift = await request.post('/api/v1/airlift', {
			data: {
				fluid: 'fresh',
				temperatureC: 20,
				riserInnerDiameter: 25,
				riserInnerDiameterUnit: 'mm',
				submergence: 0.7,
				submergenceUnit: 'm',
				lift: 30,
				liftUnit: 'cm',
				waterFlow: 20,
				waterFlowUnit: 'lpm'
			}
		});
		expect(airlift.status()).toBe(200);
		const lifted = await airlift.json();
		// Derived from Nicklin's (1963) equation: Q_a = ρ·g·Q_w·h / (η·p_a·ln(p_in/p_a)), η 30 % by default.
		expect(lifted.airFlowLpm).toBeCloseTo(29.5, 1);
		expect(lifted.injectionPressureKPa).toBeCloseTo(6.9, 1);
		expect(lifted.waterFlowLpm).toBeCloseTo(20, 9);
		expect(lifted.submergenceRatio).toBeCloseTo(0.7, 9);
		expect(lifted.curve.length).toBeGreaterThan(2);
		for (const key of ['airToWaterRatio', 'hydraulicWatts', 'isothermalAirWatts', 'maxWaterFlowLpm'])
			expect(Number.isFinite(lifted[key]), key).toBe(true);
		expect(Array.isArray(lifted.warnings)).toBe(true);

		const aeration = await request.post('/api/v1/aeration', {
			data: {
				temperatureC: 20,
				targetDoMgL: 2,
				diffuserDepth: 1,
				diffuserDepthUnit: 'm',
				diffuser: 'fine',
				alpha: 1,
				beta: 1,
				fouling: 1,
				depthCorrection: 0,
				demand: { oxygenGramsPerHour: 10 }
			}
		});
		expect(aeration.status()).toBe(200);
		const aerated = await aeration.json();
		// Metcalf & Eddy's correction in clean water at 20 °C and sea level: (9.092 − 2) / 9.092 = 0.780
		// (issue 18's check; 9.092 mg/L by Benson & Krause 1984 via Standard Methods 4500-O).
		expect(aerated.fieldToStandardRatio).toBeCloseTo(0.78, 3);
		expect(aerated.doSaturationMgL).toBeCloseTo(9.092, 3);
		expect(aerated.oxygenDemandGramsPerHour).toBe(10);
		expect(aerated.standardTransferGramsPerHour).toBeCloseTo(10 / 0.78, 1);
	});

	test('refuses an air-lift with both flows or neither in one worded message', async ({ request }) => {
		const riser = {
			temperatureC: 20,
			riserInnerDiameter: 1,
			riserInnerDiameterUnit: 'in',
			submergence: 2,
			submergenceUnit: 'ft',
			lift: 6,
			liftUnit: 'in'
		};
		const both = { ...riser, waterFlow: 5, waterFlowUnit: 'gpm', airFlow: 1, airFlowUnit: 'm3h' };
		for (const [data, message] of [
			[both, 'Give either the water flow or the air flow, not both'],
			[riser, 'Give the water flow you want lifted or the air flow you have']
		] as const) {
			const res = await request.post('/api/v1/airlift', { data });
			expect(res.status()).toBe(400);
			expect((await res.json()).issues).toEqual([{ path: 'waterFlow', message }]);
		}
		const bad = await request.post('/api/v1/aeration', {
			data: { temperatureC: 50, targetDoMgL: 5, diffuserDepth: 1, diffuserDepthUnit: 'yd', demand: {} }
		});
		expect(bad.status()).toBe(400);
		const paths = (await bad.json()).issues.map((i: { path: string }) => i.path);
		expect(paths).toEqual(expect.arrayContaining(['temperatureC', 'diffuserDepthUnit', 'demand']));
	});
});
