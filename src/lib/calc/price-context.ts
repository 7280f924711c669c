// What pricing a billing period reads: the request, its loads, the rates and meters over its calendar.
import type { SpanDays } from './calendar';
import type { DemandMeter, PeakPoint } from './demand';
import type { UsageMeter } from './energy';
import type { groupLoads } from './loads';
import type { MeterLoad } from './meter';
import type { RateBook } from './rates';
import type { CalculateRequest } from './request.schema';

/** Every interval of a day: a mask for the period's peak over all its intervals. */
export const WHOLE_DAY = new Uint8Array(256).fill(1);

/** What pricing one tariff over a calculation's calendar needs. */
export interface PriceContext {
	request: CalculateRequest;
	loads: ReturnType<typeof groupLoads>;
	rates: RateBook;
	usage: UsageMeter;
	demand: DemandMeter;
	/** The measured load given beside (or in place of) the equipment. */
	meter: MeterLoad | null;
}

/** A peak over the intervals `measured` selects: of the equipment, or of the meter plus the equipment. */
export function peakOf(
	context: PriceContext,
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
export function daysInMonths(context: PriceContext, days: SpanDays) {
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
