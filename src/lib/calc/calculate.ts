import { type DemandShare, allocate, loadKwh, loadWeighted } from './allocation';
import { billLines, tieredAmount } from './bill';
import { type SpanDays, buildCalendar } from './calendar';
import { DemandMeter } from './demand';
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
}

function periodResult(context: Context, span: BillingSpan, days: SpanDays): PeriodResult {
	const { request, loads, rates, usage, demand } = context;
	const { tariff } = request;
	const spanUsage = usage.spanUsage(days);
	// A group's sums behave as one device drawing all its members' kW.
	const groups: DeviceLoad[] = loads.groups.map((group, g) => ({ ...group, group: g }));
	const sum = (of: (group: DeviceLoad) => number) => groups.reduce((total, group) => total + of(group), 0);
	const kwh = sum((group) => loadKwh(group, spanUsage));
	const tierRates: Array<number | null> = [];
	const energy = tariff.energyCharges.map((charge, e) => {
		const weighted = sum((group) => loadWeighted(group, spanUsage, e));
		if (charge.type !== 'tiered') {
			tierRates.push(null);
			return weighted;
		}
		const amount = tieredAmount(charge.tiers, weighted);
		tierRates.push(weighted > 0 ? amount / weighted : 0);
		return amount;
	});
	const demandShares: DemandShare[] = tariff.demandCharges.map((charge, k) => {
		const peak = demand.spanPeak(days, (c) => rates.demandMask(k, c), charge.intervalMinutes);
		const mayRun = peak ? loads.groups.map((_, g) => demand.mayRunAt(g, peak)) : [];
		return { amount: peak ? charge.perKw * peak.kw : 0, peak, mayRun };
	});
	const bill = billLines(tariff, {
		days: days.days,
		kwh,
		energy,
		demand: demandShares.map((share) => share.amount)
	});
	const shares = allocate(loads.devices, spanUsage, {
		tierRates,
		ridersPerKwh: tariff.riders.reduce((sum, rider) => sum + rider.perKwh, 0),
		demand: demandShares,
		taxRate: bill.taxRate,
		devicesTotal: bill.total - roundMoney(bill.shared * (1 + bill.taxRate))
	});
	// What the devices' shares leave of the total; it differs from the rounded shared cost only when no
	// device used anything, and then the shared cost takes the whole bill.
	const deviceCents = shares.reduce((sum, share) => sum + Math.round(share.cost * 100), 0);
	return {
		label: span.label,
		from: span.from,
		to: span.to,
		days: days.days,
		hours: days.hours,
		kwh,
		peakKw: demand.spanPeak(days, () => WHOLE_DAY, 15)?.kw ?? 0,
		charges: bill.charges,
		total: bill.total,
		sharedCost: roundMoney(bill.total - deviceCents / 100),
		equipment: request.equipment.map((device, i) => ({
			name: device.name,
			...(shares[i] ?? { kwh: 0, cost: 0 })
		}))
	};
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
		demand: new DemandMeter(calendar, profiles, loads.groups)
	};
	const periods = spans.map((span, i) => {
		const days = calendar.spans[i];
		if (!days) throw new Error('Calendar is missing a billing period');
		return periodResult(context, span, days);
	});
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
