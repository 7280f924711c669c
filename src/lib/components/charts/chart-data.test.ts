import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { CalculateResponse, ChargeLine, PeriodResult } from '$lib/calc';
import {
	deviceBars,
	deviceCosts,
	kindsShown,
	monthStacks,
	periodNames,
	sharedCost,
	stackExtent
} from './chart-data';

// An invented response for these tests only: no real utility, site or rate. Figures are chosen so the
// sums are easy to check by hand.

function period(
	label: string,
	from: string,
	to: string,
	charges: ChargeLine[],
	equipment: PeriodResult['equipment']
): PeriodResult {
	const total = charges.reduce((sum, charge) => sum + charge.amount, 0);
	const shared = charges
		.filter((charge) => charge.kind === 'fixed' || charge.kind === 'minimum')
		.reduce((sum, charge) => sum + charge.amount, 0);
	return {
		label,
		from,
		to,
		days: 31,
		hours: 744,
		kwh: 0,
		peakKw: 0,
		charges,
		total,
		sharedCost: shared,
		equipment
	};
}

const january = period(
	'2027-01',
	'2027-01-01',
	'2027-01-31',
	[
		{ kind: 'fixed', label: 'Customer charge', amount: 12.5 },
		{ kind: 'energy', label: 'Supply', amount: 30 },
		{ kind: 'energy', label: 'Delivery', amount: 10 },
		{ kind: 'rider', label: 'Fuel credit', amount: -2 },
		{ kind: 'tax', label: 'Sales tax', amount: 2.02 }
	],
	[
		{ name: 'Raceway pump', kwh: 80, cost: 20 },
		{ name: 'Air pump', kwh: 20, cost: 5 },
		{ name: 'Air pump', kwh: 40, cost: 10 }
	]
);
const february = period(
	'2027-02',
	'2027-02-01',
	'2027-02-28',
	[
		{ kind: 'fixed', label: 'Customer charge', amount: 12.5 },
		{ kind: 'energy', label: 'Supply', amount: 20 },
		{ kind: 'demand', label: 'Demand', amount: 0 }
	],
	[
		{ name: 'Raceway pump', kwh: 60, cost: 15 },
		{ name: 'Air pump', kwh: 20, cost: 5 },
		{ name: 'Air pump', kwh: 10, cost: 1 }
	]
);
const result: CalculateResponse = {
	currency: 'USD',
	periods: [january, february],
	totals: { kwh: 230, cost: 97.52, peakKw: 0.2 }
};

describe('cost by device over two months', () => {
	const costs = deviceCosts(result);

	it('sums each device over the periods, dearest first', () => {
		expect(costs.map((cost) => [cost.name, cost.cost, cost.kwh])).toEqual([
			['Raceway pump', 35, 140],
			['Air pump', 11, 50],
			['Air pump', 10, 40]
		]);
	});

	it('keeps two devices with the same name apart, by their place in the list', () => {
		expect(costs.map((cost) => cost.index)).toEqual([0, 2, 1]);
	});

	it('adds up the fixed charges that belong to no device', () => {
		expect(sharedCost(result)).toBe(25);
	});
});

describe('a long device list', () => {
	const costs = Array.from({ length: 14 }, (_, index) => ({
		index,
		name: `Device ${index + 1}`,
		kwh: 1,
		cost: 14 - index
	}));

	it('draws the first bars and gathers the rest into one', () => {
		const bars = deviceBars(costs, 10);
		expect(bars).toHaveLength(10);
		expect(bars[8]?.name).toBe('Device 9');
		// Devices 10–14 cost 5 + 4 + 3 + 2 + 1.
		expect(bars[9]).toEqual({ key: 'rest', name: '5 other devices', cost: 15 });
	});

	it('draws every device when they fit', () => {
		expect(deviceBars(costs.slice(0, 3), 10).map((bar) => bar.key)).toEqual(['0', '1', '2']);
	});
});

describe('cost by month', () => {
	const [first, second] = monthStacks(result);

	it('sums charges of one kind and stacks kinds in order from zero', () => {
		expect(first?.segments.filter((segment) => segment.amount > 0)).toEqual([
			{ kind: 'fixed', amount: 12.5, y0: 0, y1: 12.5 },
			{ kind: 'energy', amount: 40, y0: 12.5, y1: 52.5 },
			{ kind: 'tax', amount: 2.02, y0: 52.5, y1: 54.52 }
		]);
	});

	it('stacks a credit below zero instead of over the charges', () => {
		expect(first?.segments.find((segment) => segment.kind === 'rider')).toEqual({
			kind: 'rider',
			amount: -2,
			y0: 0,
			y1: -2
		});
		expect(stackExtent(monthStacks(result))).toEqual([-2, 54.52]);
	});

	it('leaves out a kind that comes to nothing', () => {
		expect(second?.segments.map((segment) => segment.kind)).toEqual(['fixed', 'energy']);
		expect(kindsShown(monthStacks(result))).toEqual(['fixed', 'energy', 'rider', 'tax']);
	});

	it('names calendar months short on the axis and in full in the table', () => {
		expect([first?.tick, first?.name]).toEqual(['Jan', 'January 2027']);
	});
});

describe('period names', () => {
	it('adds the year to the ticks when the periods span more than one year', () => {
		expect(periodNames(january, true).tick).toBe('Jan 27');
	});

	it('names a billing period by its dates', () => {
		const billing = period('2027-01-12/2027-02-10', '2027-01-12', '2027-02-10', [], []);
		expect(periodNames(billing, false)).toEqual({
			tick: 'Jan 12',
			name: 'Jan 12, 2027 – Feb 10, 2027'
		});
	});
});

describe('stacking any charges', () => {
	const kinds = ['fixed', 'energy', 'demand', 'rider', 'minimum', 'tax'] as const;
	const charge = fc.record({
		kind: fc.constantFrom(...kinds),
		label: fc.constant('Invented'),
		amount: fc.integer({ min: -5000, max: 50000 }).map((cents) => cents / 100)
	});

	it('ends the stack above zero at the kinds that charge, and below zero at the kinds that credit', () => {
		fc.assert(
			fc.property(fc.array(charge, { maxLength: 12 }), (charges) => {
				const response = { ...result, periods: [period('2027-03', '2027-03-01', '2027-03-31', charges, [])] };
				const [extentLow, extentHigh] = stackExtent(monthStacks(response));
				const nets = kinds.map((kind) =>
					charges.filter((c) => c.kind === kind).reduce((sum, c) => sum + c.amount, 0)
				);
				const up = nets.filter((net) => net > 0).reduce((sum, net) => sum + net, 0);
				const down = nets.filter((net) => net < 0).reduce((sum, net) => sum + net, 0);
				expect(Number.isNaN(extentLow) || Number.isNaN(extentHigh)).toBe(false);
				expect(extentHigh).toBeCloseTo(up, 6);
				expect(extentLow).toBeCloseTo(down, 6);
			})
		);
	});
});
