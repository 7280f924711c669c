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
