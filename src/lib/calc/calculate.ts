import { type DemandShare, allocate, loadKwh, loadWeighted } from './allocation';
import { billLines, yearlyMinimumTopUps } from './bill';
import { type MeasuredPeak, demandAmount, ratchetFloorKw } from './demand-charges';
import { priceEnergy } from './energy-charges';
import { type SpanDays, buildCalendar } from './calendar';
import { DemandMeter, type PeakPoint } from './demand';
import { MeterLoad } from './meter';
import { UsageMeter } from './energy';
import { type DeviceLoad, ProfileBook, groupLoads } from './loads';
import { type BillingSpan, billingSpans } from './periods';
import { RateBook } from './rates';
import type { CalculateRequest } from './request.schema';
import { roundMoney } from './rounding';
import type { CalculateResponse, PeriodResult } from './types';

const WHOLE_DAY = new Uint8Array(256).fill(1);

interface Context {
	request: CalculateRequest;
	loads: ReturnType<typeof groupLoads>;
	rates: RateBook;
	usage: UsageMeter;
	demand: DemandMeter;
	/** The measured load given beside (or in place of) the equipment. */
	meter: MeterLoad | null;
}

/** A peak over the intervals `measured` selects: of the equipment, or of the meter plus the equipment. */
function peakOf(
	context: Context,
	days: SpanDays,
	measured: (classIndex: number) => Uint8Array | null,
	intervalMinutes: 15 | 60
): { peak: PeakPoint; meterKw: number } | null {
	const { meter, demand, loads } = context;
	if (meter) {
		const equipment = loads.groups.length > 0 ? (c: number) => demand.dayDemand(c) : null;
		return meter.peak(days, measured, intervalMinutes, equipment);
	}
	const peak = demand.spanPeak(days, measured, intervalMinutes);
	return peak ? { peak, meterKw: 0 } : null;
}

/** Days of a billing period in some months (all its days when `months` is absent). */
function daysInMonths(context: Context, days: SpanDays) {
	return (months: readonly number[] | undefined) => {
		if (!months) return days.days;
		let count = 0;
		for (const [classIndex, n] of days.classCounts) {
			const month = context.rates.calendar.classes[classIndex]?.month ?? 0;
			if (months.includes(month)) count += n;
		}
		return count;
	};
}

interface Priced {
	result: PeriodResult;
	/** The period's peak kW over all its intervals, for later periods' ratchets. */
	peak: MeasuredPeak;
	/** The bill before taxes, for a yearly minimum. */
	subtotal: number;
}

function periodResult(
	context: Context,
	span: BillingSpan,
	days: SpanDays,
	earlier: readonly MeasuredPeak[],
	yearlyMinimum = 0
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
	const bill = billLines(tariff, {
		days: days.days,
		kwh,
		energy: energy.amounts,
		demand: billed,
		yearlyMinimum
	});
	const shared = bill.shared + unallocated;
	const ridersPerKwh = tariff.riders.reduce((sum, rider) => sum + rider.perKwh, 0);
	// The meter's share: its kWh at the rates its intervals met, riders, its kW at each peak, taxes.
	let meterEnergy = 0;
	meterSums?.forEach((value, c) => (meterEnergy += value * (energy.columnRates[c] ?? 1)));
	const meterExact = (meterEnergy + meterKwh * ridersPerKwh + meterDemand) * (1 + bill.taxRate);
	const { devices: shares, others } = allocate(loads.devices, spanUsage, {
		tierRates: energy.columnRates,
		ridersPerKwh,
		demand: demandShares,
		taxRate: bill.taxRate,
		devicesTotal: bill.total - roundMoney(shared * (1 + bill.taxRate)),
		otherExact: meter ? [meterExact] : []
	});
	// What the loads' shares leave of the total; it differs from the rounded shared cost only when no
	// load used anything, and then the shared cost takes the whole bill.
	const deviceCents = [...shares.map((share) => share.cost), ...others].reduce(
		(sum, cost) => sum + Math.round(cost * 100),
		0
	);
	const result: PeriodResult = {
		label: span.label,
		from: span.from,
		to: span.to,
		days: days.days,
		hours: days.hours,
		kwh,
		peakKw,
		charges: bill.charges,
		total: bill.total,
		sharedCost: roundMoney(bill.total - deviceCents / 100),
		equipment: request.equipment.map((device, i) => ({
			name: device.name,
			...(shares[i] ?? { kwh: 0, cost: 0 })
		})),
		...(meter ? { meter: { kwh: meterKwh, cost: others[0] ?? 0 } } : {})
	};
	const taxes = bill.charges.reduce((sum, line) => sum + (line.kind === 'tax' ? line.amount : 0), 0);
	return { result, peak: { month, kw: peakKw }, subtotal: roundMoney(bill.total - taxes) };
}

/**
 * kWh, peak kW, every charge line and each device's share, per billing period, for a request that has
 * passed `calculateRequestSchema`. Time runs on a 15-minute grid of real instants in the request's time
 * zone; the rules of each step are documented in the module that applies it (schedule, rates, demand,
 * bill, allocation).
 */
export function calculate(request: CalculateRequest): CalculateResponse {
	const spans = billingSpans(request.period);
	const calendar = buildCalendar(request.timezone, request.holidays, spans);
	const loads = groupLoads(request.equipment);
	const profiles = new ProfileBook(loads, calendar);
	const rates = new RateBook(request.tariff, calendar);
	const context: Context = {
		request,
		loads,
		rates,
		usage: new UsageMeter(calendar, loads, profiles, rates),
		demand: new DemandMeter(calendar, profiles, loads.groups),
		meter: request.meter ? new MeterLoad(request.meter, request.timezone, calendar) : null
	};
	const price = (i: number, earlier: MeasuredPeak[], yearlyMinimum = 0) => {
		const span = spans[i];
		const days = calendar.spans[i];
		if (!span || !days) throw new Error('Calendar is missing a billing period');
		return periodResult(context, span, days, earlier, yearlyMinimum);
	};
	// In order: a ratchet looks back at the peaks of the periods before.
	const history: MeasuredPeak[] = [];
	const priced = spans.map((_, i) => {
		const period = price(i, history);
		history.push(period.peak);
		return period;
	});
	const topUps = yearlyMinimumTopUps(
		request.tariff.minimumPerYear,
		priced.map((period) => period.subtotal)
	);
	const periods = priced.map((period, i) =>
		topUps[i] ? price(i, history.slice(0, i), topUps[i]).result : period.result
	);
	return {
		currency: request.tariff.currency,
		periods,
		totals: {
			kwh: periods.reduce((sum, period) => sum + period.kwh, 0),
			cost: roundMoney(periods.reduce((sum, period) => sum + period.total, 0)),
			peakKw: periods.reduce((peak, period) => Math.max(peak, period.peakKw), 0)
		}
	};
}
