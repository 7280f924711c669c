// One billing period priced on one tariff: measured once, billed (again with a yearly minimum's top-up).
import { type DemandShare, allocate, loadKwh, loadWeighted } from './allocation';
import { billLines } from './bill';
import type { SpanDays } from './calendar';
import { type MeasuredPeak, demandAmount, ratchetFloorKw } from './demand-charges';
import { priceEnergy } from './energy-charges';
import type { DeviceLoad } from './loads';
import type { BillingSpan } from './periods';
import { type PriceContext, WHOLE_DAY, daysInMonths, peakOf } from './price-context';
import { roundMoney } from './rounding';
import type { PeriodResult } from './types';

/** A billing period priced before any yearly minimum, and how to bill it again with one. */
export interface Priced {
	result: PeriodResult;
	/** The period's peak kW over all its intervals, for later periods' ratchets. */
	peak: MeasuredPeak;
	/** The bill before taxes, for a yearly minimum. */
	subtotal: number;
	/**
	 * The period's result with a yearly minimum's top-up: its bill lines and shares again on the usage
	 * and peaks already measured (the lines, the taxes on the new subtotal, the rounding of the shares
	 * to the new total are `billLines`' and `allocate`'s rules, so they are applied, not patched).
	 */
	withYearlyMinimum(topUp: number): PeriodResult;
}

/**
 * Prices one billing period: measures its kWh, energy sums and demand peaks (the costly part, done
 * once), then bills them. `earlier` are the peaks of the calculation's periods before this one.
 */
export function pricePeriod(
	context: PriceContext,
	span: BillingSpan,
	days: SpanDays,
	earlier: readonly MeasuredPeak[]
): Priced {
	const { request, loads, rates, usage, demand, meter } = context;
	const { tariff } = request;
	const spanUsage = usage.spanUsage(days);
	// A group's sums behave as one device drawing all its members' kW.
	const groups: DeviceLoad[] = loads.groups.map((group, g) => ({ ...group, group: g }));
	const sum = (of: (group: DeviceLoad) => number) => groups.reduce((total, group) => total + of(group), 0);
	const meterKwh = meter ? meter.kwh(days) : 0;
	const kwh = sum((group) => loadKwh(group, spanUsage)) + meterKwh;
	const meterSums = meter?.columnSums(days, rates) ?? null;
	const sums = rates.columns.map(
		(_, c) => sum((group) => loadWeighted(group, spanUsage, c)) + (meterSums?.[c] ?? 0)
	);
	const energy = priceEnergy(tariff, rates.columns, sums, daysInMonths(context, days), days.days);
	const month = Number(span.from.slice(5, 7));
	const peakKw = peakOf(context, days, () => WHOLE_DAY, 15)?.peak.kw ?? 0;
	const billed: number[] = [];
	let unallocated = 0;
	let meterDemand = 0;
	const demandShares: DemandShare[] = tariff.demandCharges.map((charge, k) => {
		const found = peakOf(context, days, (c) => rates.demandMask(k, c), charge.intervalMinutes);
		const peak = found?.peak ?? null;
		// A charge limited to some months bills nothing outside them, ratchet included.
		const applies = !charge.months || charge.months.includes(month);
		const floorKw = applies ? ratchetFloorKw(charge, earlier) : 0;
		const amount = demandAmount(charge, Math.max(peak?.kw ?? 0, floorKw));
		billed.push(amount);
		if (peak && peak.kw > 0) {
			meterDemand += (amount * (found?.meterKw ?? 0)) / peak.kw;
			return { amount, peak, mayRun: loads.groups.map((_, g) => demand.mayRunAt(g, peak)) };
		}
		// A ratchet can bill demand in a period that measured none: no device caused it, all share it.
		unallocated += amount;
		return { amount: 0, peak: null, mayRun: [] };
	});
	const ridersPerKwh = tariff.riders.reduce((total, rider) => total + rider.perKwh, 0);
	// The meter's share before taxes: its kWh at the rates its intervals met, riders, its kW at each peak.
	let meterEnergy = 0;
	meterSums?.forEach((value, c) => (meterEnergy += value * (energy.columnRates[c] ?? 1)));
	const meterBeforeTax = meterEnergy + meterKwh * ridersPerKwh + meterDemand;

	const bill = (yearlyMinimum: number): PeriodResult => {
		const lines = billLines(tariff, {
			days: days.days,
			kwh,
			energy: energy.amounts,
			demand: billed,
			yearlyMinimum
		});
		const shared = lines.shared + unallocated;
		const { devices: shares, others } = allocate(loads.devices, spanUsage, {
			tierRates: energy.columnRates,
			ridersPerKwh,
			demand: demandShares,
			taxRate: lines.taxRate,
			devicesTotal: lines.total - roundMoney(shared * (1 + lines.taxRate)),
			otherExact: meter ? [meterBeforeTax * (1 + lines.taxRate)] : []
		});
		// What the loads' shares leave of the total; it differs from the rounded shared cost only when no
		// load used anything, and then the shared cost takes the whole bill.
		let deviceCents = 0;
		for (const share of shares) deviceCents += Math.round(share.cost * 100);
		for (const cost of others) deviceCents += Math.round(cost * 100);
		return {
			label: span.label,
			from: span.from,
			to: span.to,
			days: days.days,
			hours: days.hours,
			kwh,
			peakKw,
			charges: lines.charges,
			total: lines.total,
			sharedCost: roundMoney(lines.total - deviceCents / 100),
			equipment: request.equipment.map((device, i) => ({
				name: device.name,
				kwh: shares[i]?.kwh ?? 0,
				cost: shares[i]?.cost ?? 0
			})),
			...(meter ? { meter: { kwh: meterKwh, cost: others[0] ?? 0 } } : {})
		};
	};
	const result = bill(0);
	const taxes = result.charges.reduce((total, line) => total + (line.kind === 'tax' ? line.amount : 0), 0);
	return {
		result,
		peak: { month, kw: peakKw },
		subtotal: roundMoney(result.total - taxes),
		withYearlyMinimum: bill
	};
}
