import { NPV } from '@formulajs/formulajs';
import { describe, expect, it } from 'vitest';
import { compare } from './compare';
import { device, flatTariff } from './requests.fixture';
import { parseRequest } from './parse';
import { type CompareRequestInput, compareRequestSchema } from './request.schema';

const finance = { horizonYears: 10, discountPercent: 5, escalationPercent: 3 };

const input: CompareRequestInput = {
	period: { start: '2027-01', months: 12 },
	timezone: 'UTC',
	holidays: null,
	tariff: flatTariff(0.1),
	scenarios: [
		{
			name: 'One large demo pump',
			equipment: [
				device({
					power: { watts: 1000 },
					purchaseCost: 100,
					installCost: 50,
					lifeYears: 4,
					maintenancePerYear: 10
				})
			]
		},
		{
			name: 'Smaller pump and air-lift',
			equipment: [
				device({ power: { watts: 400 }, purchaseCost: 400, installCost: 100, maintenancePerYear: 5 }),
				device({ name: 'Demo air pump', quantity: 2, power: { watts: 50 }, purchaseCost: 60, lifeYears: 3 })
			],
			oneOffCosts: [{ label: 'Outdoor circuit with ground-fault protection', amount: 200 }]
		}
	],
	baseline: 0,
	finance,
	emissionFactorKgPerKwh: 0.4
};

const result = compare(compareRequestSchema.parse(input));
const [baseline, alternative] = result.scenarios;

describe('annual figures', () => {
	it('sums the twelve months', () => {
		expect(baseline?.annualKwh).toBeCloseTo(8760, 9);
		expect(baseline?.annualCost).toBe(876);
		expect(alternative?.annualKwh).toBeCloseTo(8760 * 0.5, 9);
		expect(alternative?.co2KgPerYear).toBeCloseTo(4380 * 0.4, 9);
	});

	it('adds purchase, install and one-off costs into the capital cost', () => {
		expect(baseline?.capitalCost).toBe(150);
		expect(alternative?.capitalCost).toBe(500 + 2 * 60 + 200);
		expect(alternative?.maintenancePerYear).toBe(5);
	});
});

describe('cash flows', () => {
	it('escalates the energy cost, adds maintenance and replaces a device when its life ends', () => {
		const flows = baseline?.cashFlows ?? [];
		expect(flows).toHaveLength(11);
		expect(flows[0]).toBe(150);
		expect(flows[1]).toBeCloseTo(876 + 10, 9);
		expect(flows[2]).toBeCloseTo(876 * 1.03 + 10, 9);
		expect(flows[4]).toBeCloseTo(876 * 1.03 ** 3 + 10 + 100, 9);
		expect(flows[8]).toBeCloseTo(876 * 1.03 ** 7 + 10 + 100, 9);
	});

	it('does not replace a device in the horizon year itself', () => {
		const flows = alternative?.cashFlows ?? [];
		const energy = (year: number) => 438 * 1.03 ** (year - 1) + 5;
		expect(flows[9]).toBeCloseTo(energy(9) + 120, 9); // air pumps, life 3: years 3, 6, 9
		expect(flows[10]).toBeCloseTo(energy(10), 9);
	});
});

describe('lifecycle cost against a spreadsheet NPV (@formulajs/formulajs)', () => {
	// A spreadsheet's NPV discounts its first value by one period, so year 0 is added outside it.
	it.each([0, 1])('matches year 0 + NPV(rate, years 1…n) for scenario %d', (index) => {
		const scenario = result.scenarios[index];
		const [capital = 0, ...later] = scenario?.cashFlows ?? [];
		const reference = capital + Number(NPV(finance.discountPercent / 100, ...later));
		expect(scenario?.lifecycleCost).toBeCloseTo(reference, 6);
	});
});

describe('savings and payback', () => {
	it('saves the baseline’s annual cost minus the scenario’s', () => {
		expect(alternative?.savingsPerYear).toBe(438);
		expect(baseline?.savingsPerYear).toBe(0);
	});

	it('pays back the extra capital over the savings', () => {
		expect(alternative?.simplePaybackYears).toBeCloseTo((820 - 150) / 438, 12);
	});

	it('never pays back without savings', () => {
		expect(baseline?.simplePaybackYears).toBeNull();
	});
});

describe('validation of a comparison', () => {
	it('requires twelve calendar months and a baseline among the scenarios', () => {
		const parsed = parseRequest(compareRequestSchema, {
			...input,
			period: { start: '2027-01', months: 6 },
			baseline: 5
		});
		expect(parsed.success).toBe(false);
		if (!parsed.success) {
			expect(parsed.error.issues).toEqual([
				{ path: 'period', message: 'A comparison covers 12 calendar months' },
				{ path: 'baseline', message: 'Baseline must be the index of one of the scenarios' }
			]);
		}
	});

	it('uses a scenario’s own tariff when it has one', () => {
		const own = compare(
			compareRequestSchema.parse({
				...input,
				scenarios: [{ name: 'On another demo tariff', equipment: [device()], tariff: flatTariff(0.2) }]
			})
		);
		expect(own.scenarios[0]?.annualCost).toBe(1752);
	});
});

describe('installed against proposed (issue 17)', () => {
	// The retrofit of the issue: a 1.5 kW pump always on, already installed, against a proposal of a
	// 90 W pump and two 60 W air pumps bought for $800 in all, saving $1,083.32 a year. The flat rate is
	// derived so that the savings are exactly that: 1083.32 ÷ ((1500 − 210) W × 8.76 kWh per W-year).
	// Simple payback by its definition (extra capital ÷ yearly savings; any engineering-economics
	// text): 800 ÷ 1083.32 ≈ 0.74 years.
	const rate = 1083.32 / ((1500 - 210) * 8.76);
	const retrofit = (baselineStatus: 'installed' | 'proposed') =>
		compare(
			compareRequestSchema.parse({
				...input,
				tariff: flatTariff(rate),
				scenarios: [
					{
						name: 'Pump installed now',
						status: baselineStatus,
						equipment: [device({ power: { watts: 1500 }, purchaseCost: 650, installCost: 150, lifeYears: 8 })]
					},
					{
						name: 'Small pump and air pumps',
						status: 'proposed',
						equipment: [
							device({ power: { watts: 90 }, purchaseCost: 500, installCost: 60 }),
							device({ name: 'Air pump', quantity: 2, power: { watts: 60 }, purchaseCost: 120 })
						]
					}
				]
			})
		);

	it('counts nothing in year 0 for what is installed, so the retrofit pays back in about 0.74 years', () => {
		const [installed, proposal] = retrofit('installed').scenarios;
		expect(installed?.status).toBe('installed');
		expect(installed?.capitalCost).toBe(0);
		expect(installed?.cashFlows[0]).toBe(0);
		expect(proposal?.capitalCost).toBe(800);
		expect(proposal?.savingsPerYear).toBeCloseTo(1083.32, 1);
		expect(proposal?.simplePaybackYears).toBeCloseTo(800 / 1083.32, 2);
		expect(proposal?.simplePaybackYears).toBeCloseTo(0.74, 2);
	});

	it('still buys an installed device again when its life ends within the horizon', () => {
		const [installed] = retrofit('installed').scenarios;
		const energy = installed?.annualCost ?? 0;
		expect(installed?.cashFlows[8]).toBeCloseTo(energy * 1.03 ** 7 + 650, 6);
	});

	it('priced as a new purchase, the same pump would make the retrofit pay back at once', () => {
		const [, proposal] = retrofit('proposed').scenarios;
		expect(proposal?.simplePaybackYears).toBe(0);
	});

	it('adds an installed scenario’s one-off costs to its year 0', () => {
		const parsed = compareRequestSchema.parse({
			...input,
			scenarios: [
				{
					...input.scenarios[0],
					status: 'installed',
					oneOffCosts: [{ label: 'Electrician’s visit', amount: 120, note: 'Check the circuit' }]
				}
			]
		});
		expect(compare(parsed).scenarios[0]?.capitalCost).toBe(120);
	});
});
