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
});
