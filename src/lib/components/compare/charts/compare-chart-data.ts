import { type ChargeKind, EQUIPMENT_CATEGORIES } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import { scenarioName, type ScenarioKey } from './compare-chart-style';
import { periodNames } from '$lib/components/charts/chart-data';
import { CHARGE_KINDS } from '$lib/components/charts/chart-style';

/**
 * A comparison shaped for the compare page's bar charts: the months side by side, and each
 * scenario's year split by kind of charge and by kind of equipment. The cumulative cost and its
 * payback crossing are in `cumulative-cost.ts`.
 */

/** One month of the grouped bars: each scenario's bill, in the order compared. */
export interface MonthGroup {
	label: string;
	tick: string;
	name: string;
	/** A scenario's total for the month; null if it has no such month (compare() gives all the same). */
	costs: (number | null)[];
}

/** The months of the first scenario, with every scenario's total for each, matched by label. */
export function monthGroups(report: ComparisonReport): MonthGroup[] {
	const months = report.result.scenarios[0]?.periods ?? [];
	const years = new Set(months.map((period) => period.from.slice(0, 4)));
	return months.map((month) => ({
		label: month.label,
		...periodNames(month, years.size > 1),
		costs: report.result.scenarios.map(
			(scenario) => scenario.periods.find((period) => period.label === month.label)?.total ?? null
		)
	}));
}

/** The money axis of the grouped bars: from the lowest month (or zero) to the highest (or zero). */
export function groupExtent(groups: readonly MonthGroup[]): [number, number] {
	const costs = groups.flatMap((group) => group.costs.filter((cost) => cost !== null));
	return [Math.min(0, ...costs), Math.max(0, ...costs)];
}

/** One part of a scenario's bar, from `start` to `end` along the value axis. */
export interface StackSegment<K extends string> {
	key: K;
	amount: number;
	start: number;
	end: number;
}

/** One scenario's bar; `index` is its place in the comparison. */
export interface ScenarioStack<K extends string> {
	index: number;
	total: number;
	segments: StackSegment<K>[];
}

/**
 * Amounts stacked in the order given: positive ones up from zero, negative ones (a credit) down from
 * zero, so no segment hides another. Zero amounts are left out.
 */
export function stackAmounts<K extends string>(
	amounts: ReadonlyArray<readonly [K, number]>
): StackSegment<K>[] {
	let up = 0;
	let down = 0;
	return amounts.flatMap(([key, amount]): StackSegment<K>[] => {
		if (amount === 0) return [];
		const start = amount > 0 ? up : down;
		const end = start + amount;
		if (amount > 0) up = end;
		else down = end;
		return [{ key, amount, start, end }];
	});
}

const sum = (amounts: readonly number[]) => amounts.reduce((total, amount) => total + amount, 0);

/** Each scenario's charge lines over the year, summed by kind and stacked in `CHARGE_KINDS` order. */
export function kindStacks(report: ComparisonReport): ScenarioStack<ChargeKind>[] {
	return report.result.scenarios.map((scenario, index) => {
		const charges = scenario.periods.flatMap((period) => period.charges);
		const amounts = CHARGE_KINDS.map(
			(kind) => [kind, sum(charges.filter((c) => c.kind === kind).map((c) => c.amount))] as const
		);
		return { index, total: sum(amounts.map(([, amount]) => amount)), segments: stackAmounts(amounts) };
	});
}

/**
 * The device categories of the comparison in the equipment list's order; a category the app does
 * not know (newer data) follows, alphabetically, rather than being dropped.
 */
export function categoryOrder(report: ComparisonReport): string[] {
	const known: readonly string[] = EQUIPMENT_CATEGORIES;
	const present = report.scenarios.flatMap((scenario) => Object.keys(scenario.kwhByCategory));
	const unknown = [...new Set(present.filter((key) => !known.includes(key)))].sort();
	return [...known, ...unknown];
}

/** Each scenario's annual kWh by device category, stacked in `categoryOrder`. */
export function categoryStacks(report: ComparisonReport): ScenarioStack<string>[] {
	const order = categoryOrder(report);
	return report.scenarios.map((scenario, index) => {
		const amounts = order.map((key) => [key, scenario.kwhByCategory[key] ?? 0] as const);
		return { index, total: sum(amounts.map(([, kwh]) => kwh)), segments: stackAmounts(amounts) };
	});
}

/** The keys of `order` that appear in any bar, for the legend and the table's columns. */
export function keysShown<K extends string>(
	stacks: ReadonlyArray<ScenarioStack<K>>,
	order: readonly K[]
): K[] {
	const present = new Set(stacks.flatMap((stack) => stack.segments.map((segment) => segment.key)));
	return order.filter((key) => present.has(key));
}

/** The value axis of the stacked bars: from the deepest credit (or zero) to the longest bar. */
export function stackExtent(stacks: ReadonlyArray<ScenarioStack<string>>): [number, number] {
	const ends = stacks.flatMap((stack) => stack.segments.flatMap((segment) => [segment.start, segment.end]));
	return [Math.min(0, ...ends), Math.max(0, ...ends)];
}

/**
 * The table under a chart of stacked bars: a row a scenario (named as the legend names it), a
 * column a key shown, then the bar's total, each figure in `format`.
 */
export function stackTableRows<K extends string>(
	keys: readonly ScenarioKey[],
	stacks: ReadonlyArray<ScenarioStack<K>>,
	shown: readonly K[],
	format: (amount: number) => string
): { key: number; cells: string[] }[] {
	const amountOf = (index: number, key: K) =>
		stacks[index]?.segments.find((segment) => segment.key === key)?.amount ?? 0;
	return keys.map((scenario) => ({
		key: scenario.index,
		cells: [
			scenarioName(scenario),
			...shown.map((key) => format(amountOf(scenario.index, key))),
			format(stacks[scenario.index]?.total ?? 0)
		]
	}));
}

export { thinTicks } from '$lib/components/charts/chart-ticks';
