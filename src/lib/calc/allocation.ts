import type { PeakPoint } from './demand';
import type { SpanUsage } from './energy';
import type { DeviceLoad } from './loads';
import { apportionMoney } from './rounding';

export interface DemandShare {
	amount: number;
	peak: PeakPoint | null;
	/** Per load group: mean "may run" over the peak's intervals, or null when it draws nothing then. */
	mayRun: ReadonlyArray<number | null>;
}

export interface AllocationInput {
	/** Per energy charge: the tiered charge's average rate per kWh, or null for a charge priced per interval. */
	tierRates: ReadonlyArray<number | null>;
	ridersPerKwh: number;
	demand: readonly DemandShare[];
	taxRate: number;
	/** What the rounded shares must add up to: the bill's total less its rounded shared cost. */
	devicesTotal: number;
	/** Exact costs (taxes included) of loads that are not devices — a meter's measured load — rounded with them. */
	otherExact?: readonly number[];
}

/** kWh over the period of a device (or a group's sums): standby all its hours, plus running's extra. */
export function loadKwh(load: DeviceLoad, usage: SpanUsage): number {
	const hours = usage.hours[load.group] ?? 0;
	return load.standbyKw * hours + (load.runKw - load.standbyKw) * (usage.onHours[load.group] ?? 0);
}

/** A device's (or group's) weighted sum for energy charge e: money, or kWh in a tiered charge. */
export function loadWeighted(load: DeviceLoad, usage: SpanUsage, e: number): number {
	const i = load.group * usage.charges + e;
	return (
		load.standbyKw * (usage.weighted[i] ?? 0) + (load.runKw - load.standbyKw) * (usage.onWeighted[i] ?? 0)
	);
}

/**
 * Each device's share of a period's bill: its energy charges at the rates its own intervals met (a
 * tiered charge at the period's average tier rate), riders on its kWh, its share of each demand charge
 * (its kW at the peak interval over the peak kW), and the taxes on those. Fixed charges and the minimum
 * line are shared cost. The exact shares add up to the exact bill; the bill rounds each line, so the
 * shares are rounded together (`apportionMoney`) to add up, with the shared cost, to its total exactly.
 */
export function allocate(
	devices: readonly DeviceLoad[],
	usage: SpanUsage,
	input: AllocationInput
): { devices: Array<{ kwh: number; cost: number }>; others: number[] } {
	// Loops rather than map/forEach/spread: once per billing period over every device (see apportionMoney).
	const { tierRates, demand, ridersPerKwh, taxRate } = input;
	const others = input.otherExact ?? [];
	const kwhs = new Float64Array(devices.length);
	const costs = new Float64Array(devices.length + others.length);
	for (let d = 0; d < devices.length; d++) {
		const device = devices[d]!;
		const extraKw = device.runKw - device.standbyKw;
		const kwh = loadKwh(device, usage);
		let cost = kwh * ridersPerKwh;
		for (let e = 0; e < tierRates.length; e++) {
			const tierRate = tierRates[e]!;
			const share = loadWeighted(device, usage, e);
			cost += tierRate === null ? share : share * tierRate;
		}
		for (const charge of demand) {
			const mayRun = charge.mayRun[device.group];
			if (!charge.peak || charge.peak.kw <= 0 || mayRun == null) continue;
			cost += (charge.amount * (device.standbyKw + mayRun * extraKw)) / charge.peak.kw;
		}
		kwhs[d] = kwh;
		costs[d] = cost * (1 + taxRate);
	}
	costs.set(others, devices.length);
	const cents = apportionMoney(costs, input.devicesTotal);
	const shares: Array<{ kwh: number; cost: number }> = [];
	for (let i = 0; i < kwhs.length; i++) shares.push({ kwh: kwhs[i]!, cost: cents[i] ?? 0 });
	return { devices: shares, others: others.map((_, i) => cents[kwhs.length + i] ?? 0) };
}
