import type { CalculateResponse, ChargeKind, PeriodResult } from '$lib/calc';
import { CHARGE_KINDS } from './chart-style';

/**
 * The calculation response shaped for the scenario's cost charts: each device's cost over the whole
 * period, and each billing period's charges stacked by kind.
 */

/** One device's kWh and cost summed over the periods; `index` is its place in the request. */
export interface DeviceCost {
	index: number;
	name: string;
	kwh: number;
	cost: number;
}

/** One bar of the device chart: a device, or the devices past the limit taken together. */
export interface DeviceBar {
	key: string;
	name: string;
	cost: number;
}

/**
 * Each device's kWh and cost over all periods, dearest first (ties keep the request's order). Devices
 * are matched by position, not name, since two rows may share a name.
 */
export function deviceCosts(result: CalculateResponse): DeviceCost[] {
	const costs: DeviceCost[] = [];
	for (const period of result.periods) {
		period.equipment.forEach((share, index) => {
			const entry = (costs[index] ??= { index, name: share.name, kwh: 0, cost: 0 });
			entry.kwh += share.kwh;
			entry.cost += share.cost;
		});
	}
	return costs.filter(Boolean).sort((a, b) => b.cost - a.cost || a.index - b.index);
}

/** The bars to draw: at most `limit`, the last one gathering the rest ("12 other devices"). */
export function deviceBars(costs: readonly DeviceCost[], limit = 10): DeviceBar[] {
	const bar = (cost: DeviceCost): DeviceBar => ({
		key: String(cost.index),
		name: cost.name,
		cost: cost.cost
	});
	if (costs.length <= limit) return costs.map(bar);
	const shown = costs.slice(0, limit - 1).map(bar);
	const rest = costs.slice(limit - 1);
	const cost = rest.reduce((sum, device) => sum + device.cost, 0);
	return [...shown, { key: 'rest', name: `${rest.length} other devices`, cost }];
}

/** Fixed and minimum charges over all periods, which belong to no device. */
export function sharedCost(result: CalculateResponse): number {
	return result.periods.reduce((sum, period) => sum + period.sharedCost, 0);
}

/** One kind's part of a period's bar, from `y0` to `y1` in money (credits stack below zero). */
export interface KindSegment {
	kind: ChargeKind;
	amount: number;
	y0: number;
	y1: number;
}

export interface MonthStack {
	label: string;
	tick: string;
	name: string;
	total: number;
	segments: KindSegment[];
}

const MONTH = /^(\d{4})-(\d{2})$/;
const shortDate = (iso: string, options: Intl.DateTimeFormatOptions) =>
	new Date(`${iso}T12:00:00Z`).toLocaleDateString('en-US', { timeZone: 'UTC', ...options });

/**
 * A period's axis tick and full name: a calendar month "2027-01" is "Jan" (with the year, "Jan 27",
 * when the periods span more than one year) and "January 2027"; a billing period "Jan 12" and
 * "Jan 12, 2027 – Feb 10, 2027".
 */
export function periodNames(period: PeriodResult, severalYears: boolean): { tick: string; name: string } {
	if (MONTH.test(period.label)) {
		const tick = shortDate(
			period.from,
			severalYears ? { month: 'short', year: '2-digit' } : { month: 'short' }
		);
		return { tick, name: shortDate(period.from, { month: 'long', year: 'numeric' }) };
	}
	const full = { month: 'short', day: 'numeric', year: 'numeric' } as const;
	return {
		tick: shortDate(period.from, { month: 'short', day: 'numeric' }),
		name: `${shortDate(period.from, full)} – ${shortDate(period.to, full)}`
	};
}

/**
 * Each period's charges summed by kind and stacked in the order of `CHARGE_KINDS`: charges stack up
 * from zero, credits (a negative rider) down from zero, so no segment hides another. Kinds with
 * nothing in a period are left out of it.
 */
export function monthStacks(result: CalculateResponse): MonthStack[] {
	const years = new Set(result.periods.map((period) => period.from.slice(0, 4)));
	return result.periods.map((period) => {
		let up = 0;
		let down = 0;
		const segments = CHARGE_KINDS.flatMap((kind): KindSegment[] => {
			const amount = period.charges
				.filter((charge) => charge.kind === kind)
				.reduce((sum, charge) => sum + charge.amount, 0);
			if (amount === 0) return [];
			const y0 = amount > 0 ? up : down;
			const y1 = y0 + amount;
			if (amount > 0) up = y1;
			else down = y1;
			return [{ kind, amount, y0, y1 }];
		});
		return { label: period.label, ...periodNames(period, years.size > 1), total: period.total, segments };
	});
}

/** The money axis: from the deepest credit (or zero) to the tallest bar (or zero). */
export function stackExtent(stacks: readonly MonthStack[]): [number, number] {
	const ends = stacks.flatMap((stack) => stack.segments.flatMap((segment) => [segment.y0, segment.y1]));
	return [Math.min(0, ...ends), Math.max(0, ...ends)];
}

/** The kinds that appear in any period, in stacking order, for the legend. */
export function kindsShown(stacks: readonly MonthStack[]): ChargeKind[] {
	const present = new Set(stacks.flatMap((stack) => stack.segments.map((segment) => segment.kind)));
	return CHARGE_KINDS.filter((kind) => present.has(kind));
}
