import { describe, expect, it } from 'vitest';
import { billLines, tieredAmount } from './bill';
import { type TariffInput, tariffSchema } from './tariff.schema';

const tiers = [
	{ uptoKwh: 500, perKwh: 0.05 },
	{ uptoKwh: null, perKwh: 0.08 }
];

function bill(tariff: Partial<TariffInput>, input: { days?: number; kwh?: number; energy?: number[] } = {}) {
	const parsed = tariffSchema.parse({ currency: 'USD', ...tariff });
	return billLines(parsed, {
		days: input.days ?? 30,
		kwh: input.kwh ?? 0,
		energy: input.energy ?? [],
		demand: []
	});
}

describe('a tiered charge', () => {
	it('charges the first tier only while it is not full', () => {
		expect(tieredAmount(tiers, 400)).toBeCloseTo(20, 12);
	});

	it('charges the second tier once the first is full', () => {
		expect(tieredAmount(tiers, 700)).toBeCloseTo(500 * 0.05 + 200 * 0.08, 12);
	});

	it('walks any number of tiers', () => {
		const three = [
			{ uptoKwh: 100, perKwh: 0.1 },
			{ uptoKwh: 300, perKwh: 0.2 },
			{ uptoKwh: null, perKwh: 0.3 }
		];
		expect(tieredAmount(three, 350)).toBeCloseTo(10 + 40 + 15, 12);
		expect(tieredAmount(three, 0)).toBe(0);
	});
});

describe('fixed charges', () => {
	it('charges perMonth once per billing period and perDay for each of its days', () => {
		const result = bill(
			{
				fixedCharges: [
					{ label: 'Customer charge', perMonth: 12.5 },
					{ label: 'Basic', perDay: 0.45 }
				]
			},
			{ days: 31 }
		);
		expect(result.charges.map((line) => line.amount)).toEqual([12.5, 13.95]);
		expect(result.total).toBe(26.45);
	});
});

describe('riders, taxes and the minimum bill', () => {
	it('charges riders per kWh on all kWh', () => {
		const result = bill({ riders: [{ label: 'Fuel adjustment', perKwh: 0.031 }] }, { kwh: 1000 });
		expect(result.charges).toEqual([{ kind: 'rider', label: 'Fuel adjustment', amount: 31 }]);
	});

	it('taxes the subtotal with each tax on its own, without compounding', () => {
		const result = bill(
			{
				fixedCharges: [{ label: 'Customer charge', perMonth: 100 }],
				taxes: [
					{ label: 'State tax', percent: 4 },
					{ label: 'City tax', percent: 1.5 }
				]
			},
			{}
		);
		expect(result.charges.filter((line) => line.kind === 'tax').map((line) => line.amount)).toEqual([4, 1.5]);
		expect(result.total).toBe(105.5);
	});

	it('adds a minimum line up to the minimum, and taxes it', () => {
		const result = bill(
			{
				energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1 }],
				taxes: [{ label: 'Tax', percent: 10 }],
				minimumMonthly: 15
			},
			{ energy: [10] }
		);
		expect(result.charges.map((line) => [line.kind, line.amount])).toEqual([
			['energy', 10],
			['minimum', 5],
			['tax', 1.5]
		]);
		expect(result.total).toBe(16.5);
	});

	it('adds no minimum line once the subtotal reaches the minimum', () => {
		const result = bill(
			{ energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1 }], minimumMonthly: 15 },
			{ energy: [15] }
		);
		expect(result.charges.some((line) => line.kind === 'minimum')).toBe(false);
	});
});

describe('rounding', () => {
	it('rounds each line half away from zero and totals the rounded lines', () => {
		const result = bill(
			{
				energyCharges: [
					{ label: 'Supply', type: 'flat', perKwh: 0.1 },
					{ label: 'Delivery', type: 'flat', perKwh: 0.1 }
				]
			},
			{ energy: [0.125, 0.125] }
		);
		expect(result.charges.map((line) => line.amount)).toEqual([0.13, 0.13]);
		expect(result.total).toBe(0.26);
	});
});
