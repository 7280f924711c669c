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
