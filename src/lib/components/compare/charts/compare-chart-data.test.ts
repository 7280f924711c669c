import { describe, expect, it } from 'vitest';
import { CHARGE_KINDS } from '$lib/components/charts/chart-style';
import {
	categoryOrder,
	categoryStacks,
	groupExtent,
	keysShown,
	kindStacks,
	monthGroups,
	stackAmounts,
	stackExtent,
	thinTicks
} from './compare-chart-data';
import { inventedReport, period } from './compare-chart.fixture';
import { SCENARIO_COLOURS, scenarioKeys } from './compare-chart-style';

// The report is invented (compare-chart.fixture.ts); the expected sums are worked by hand from it.

describe('monthly cost side by side', () => {
	const groups = monthGroups(inventedReport());

	it('puts every scenario’s bill for a month in one group, in the order compared', () => {
		expect(groups.map((group) => [group.label, group.costs])).toEqual([
			['2027-01', [40, 28, 42]],
			['2027-02', [36.75, 25, 40]]
		]);
	});

	it('names the months short on the axis and in full in the table', () => {
		expect(groups.map((group) => [group.tick, group.name])).toEqual([
			['Jan', 'January 2027'],
			['Feb', 'February 2027']
		]);
	});

	it('runs the money axis from zero to the dearest month', () => {
		expect(groupExtent(groups)).toEqual([0, 42]);
	});

	it('leaves a month out of a scenario that lacks it instead of showing it as free', () => {
		const report = inventedReport();
		const second = report.result.scenarios[1];
		if (second) second.periods = [period('2027-01', [])];
		expect(monthGroups(report)[1]?.costs).toEqual([36.75, null, 40]);
	});
});

describe('cost by kind of charge over the year', () => {
	const stacks = kindStacks(inventedReport());

	it('sums the charge lines of both months by kind and stacks them from zero', () => {
		// Baseline: fixed 10 + 10, energy 30 + 25, tax 1.75.
		expect(stacks[0]?.segments).toEqual([
			{ key: 'fixed', amount: 20, start: 0, end: 20 },
			{ key: 'energy', amount: 55, start: 20, end: 75 },
			{ key: 'tax', amount: 1.75, start: 75, end: 76.75 }
		]);
	});

	it('comes to the same total as the monthly bills', () => {
		// 40 + 36.75, 28 + 25, 42 + 40.
		expect(stacks.map((stack) => stack.total)).toEqual([76.75, 53, 82]);
	});

	it('draws a credit below zero, and the axis reaches down to it', () => {
		expect(stacks[1]?.segments.find((segment) => segment.key === 'rider')).toEqual({
			key: 'rider',
			amount: -2,
			start: 0,
			end: -2
		});
		expect(stackExtent(stacks)).toEqual([-2, 82]);
	});

	it('lists in the legend only the kinds some scenario has, in stacking order', () => {
		expect(keysShown(stacks, CHARGE_KINDS)).toEqual(['fixed', 'energy', 'rider', 'tax']);
	});
});

describe('annual kWh by kind of equipment', () => {
	const report = inventedReport();
	const stacks = categoryStacks(report);

	it('stacks the categories in the equipment list’s order, whatever order the data has', () => {
		expect(stacks[2]?.segments).toEqual([
			{ key: 'water-pump', amount: 450, start: 0, end: 450 },
			{ key: 'air-pump', amount: 300, start: 450, end: 750 },
			{ key: 'grow-tent', amount: 12, start: 750, end: 762 }
		]);
		expect(stacks.map((stack) => stack.total)).toEqual([800, 740, 762]);
	});

	it('keeps a category the app does not know, after the known ones', () => {
		expect(keysShown(stacks, categoryOrder(report))).toEqual(['water-pump', 'air-pump', 'uv', 'grow-tent']);
	});
});

describe('stacking', () => {
	it('leaves out an amount of zero and keeps stacking after it', () => {
		expect(
			stackAmounts([
				['a', 5],
				['b', 0],
				['c', -1],
				['d', 2]
			])
		).toEqual([
			{ key: 'a', amount: 5, start: 0, end: 5 },
			{ key: 'c', amount: -1, start: 0, end: -1 },
			{ key: 'd', amount: 2, start: 5, end: 7 }
		]);
	});
});

describe('naming fewer ticks than values', () => {
	const months = Array.from({ length: 12 }, (_, i) => i + 1);

	it('names every second month when only six fit', () => {
		expect(thinTicks(months, 6)).toEqual([1, 3, 5, 7, 9, 11]);
	});

	it('names every value when they all fit', () => {
		expect(thinTicks(months, 20)).toHaveLength(12);
	});

	it('names years 0, 3, 6 and 9 of a ten-year horizon when four fit', () => {
		expect(thinTicks([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 4)).toEqual([0, 3, 6, 9]);
	});
});

describe('scenario colours and names', () => {
	it('gives the baseline the dark ink and the others the next colours in order', () => {
		const report = { ...inventedReport(), baseline: 1 };
		expect(scenarioKeys(report).map((key) => [key.colour, key.baseline])).toEqual([
			[SCENARIO_COLOURS[1], false],
			['#3c4f57', true],
			[SCENARIO_COLOURS[2], false]
		]);
	});

	it('has six different colours, one for each scenario a comparison allows', () => {
		expect(new Set(SCENARIO_COLOURS).size).toBe(6);
	});

	it('adds the site to the name only when the scenarios come from more than one site', () => {
		const report = inventedReport();
		expect(scenarioKeys(report)[2]?.name).toBe('Timer on the pump');
		const other = report.scenarios[2];
		if (other) Object.assign(other, { siteId: 'site-2', siteName: 'Lakeside School Garden' });
		expect(scenarioKeys(report)[2]?.name).toBe('Timer on the pump (Lakeside School Garden)');
	});
});
