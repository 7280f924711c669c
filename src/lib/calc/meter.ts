import type { Calendar, SpanDays } from './calendar';
import { INTERVAL_MINUTES } from './clock';
import { dayNumber, isoDate } from './dates';
import type { PeakPoint } from './demand';
import type { RateBook } from './rates';
import { dayShapes } from './zone-days';

/** A meter's measured use: kWh per real interval from `start`, a local time in the request's zone. */
export interface MeterInput {
	start: string;
	intervalMinutes: 15 | 30 | 60;
	kwh: readonly number[];
}

const SLOTS_PER_HOUR = 60 / INTERVAL_MINUTES;

/** The local day and minute of a meter's start ("2027-01-01T00:00"). */
function startOf(meter: MeterInput): { day: number; minute: number } {
	const day = dayNumber(meter.start.slice(0, 10));
	const minute = Number(meter.start.slice(11, 13)) * 60 + Number(meter.start.slice(14, 16));
	return { day, minute };
}

/**
 * Where each local day begins in the meter's 15-minute series, from the day the meter starts to
 * `lastDay`: the index of its first interval (negative for the start day when the meter starts after
 * midnight). A spring-forward day has 92 intervals and a fall-back day 100, as everywhere in the core,
 * so the series counts real intervals. Null when the start's wall-clock time does not exist that day.
 */
export function meterDayStarts(
	meter: MeterInput,
	timezone: string,
	lastDay: number
): Map<number, number> | null {
	const { day: first, minute } = startOf(meter);
	const shapes = dayShapes(timezone, first, Math.max(first, lastDay));
	const at = shapes[0]?.minutes.indexOf(minute) ?? -1;
	if (at < 0) return null;
	const starts = new Map<number, number>();
	let index = -at;
	shapes.forEach((shape, i) => {
		starts.set(first + i, index);
		index += shape.minutes.length;
	});
	return starts;
}

/** What a meter series lacks to cover billing periods, in words; empty when it covers them. */
export function meterCoverageIssues(
	meter: MeterInput,
	timezone: string,
	spans: ReadonlyArray<{ from: string; to: string }>
): string[] {
	const first = spans[0];
	const last = spans[spans.length - 1];
	if (!first || !last) return [];
	const { minute } = startOf(meter);
	if (minute % meter.intervalMinutes !== 0) {
		return [`The meter's start must fall on a ${meter.intervalMinutes}-minute boundary`];
	}
	const lastDay = dayNumber(last.to);
	if (dayNumber(first.from) < startOf(meter).day) {
		return [`The meter data starts after the first billing period begins (${first.from})`];
	}
	const starts = meterDayStarts(meter, timezone, lastDay + 1);
	if (!starts)
		return [`The meter's start time does not exist on that day in ${timezone} (the clocks skip it)`];
	const needed = starts.get(dayNumber(first.from)) ?? 0;
	if (needed < 0) return [`The meter data starts after the first billing period begins (${first.from})`];
	const end = starts.get(lastDay + 1) ?? 0;
	const have = meter.kwh.length * (meter.intervalMinutes / INTERVAL_MINUTES);
	if (have < end) {
		const missing = Math.ceil((end - have) / (meter.intervalMinutes / INTERVAL_MINUTES));
		const values = missing === 1 ? 'value is' : 'values are';
		return [
			`The meter data ends before the last billing period does (${isoDate(lastDay)}): ${missing.toLocaleString('en-US')} more ${meter.intervalMinutes}-minute ${values} needed`
		];
	}
	return [];
}

/**
 * A meter's measured load over the calculation's days, as kWh per 15-minute interval (a 30- or
 * 60-minute value spread evenly over its quarter hours, so 60-minute data gives hourly means as its
 * 15-minute demand). Sums its energy on the tariff's columns and finds demand peaks, alone or on top
 * of the equipment's worst-case kW.
 */
export class MeterLoad {
	private readonly slots: Float64Array;
	private readonly starts: Map<number, number>;

	constructor(
		meter: MeterInput,
		timezone: string,
		private readonly calendar: Calendar
	) {
		const split = meter.intervalMinutes / INTERVAL_MINUTES;
		this.slots = new Float64Array(meter.kwh.length * split);
		meter.kwh.forEach((kwh, i) => this.slots.fill(kwh / split, i * split, (i + 1) * split));
		const lastDay = Math.max(...calendar.classOfDay.keys());
		this.starts = meterDayStarts(meter, timezone, lastDay) ?? new Map();
	}

	/** Each day of a span with its class and its first interval in the series. */
	private *days(span: SpanDays): Generator<{ classIndex: number; offset: number; length: number }> {
		for (let day = dayNumber(span.from); day <= dayNumber(span.to); day++) {
			const classIndex = this.calendar.classOfDay.get(day) ?? 0;
			const length = this.calendar.classes[classIndex]?.shape.minutes.length ?? 0;
			yield { classIndex, offset: this.starts.get(day) ?? 0, length };
		}
	}

	/** The span's metered kWh. */
	kwh(span: SpanDays): number {
		let total = 0;
		for (const { offset, length } of this.days(span)) {
			for (let i = offset; i < offset + length; i++) total += this.slots[i] ?? 0;
		}
		return total;
	}

	/** Per energy column: Σ kWh × weight over the span (money, or kWh for columns counting kWh). */
	columnSums(span: SpanDays, rates: RateBook): Float64Array {
		const sums = new Float64Array(rates.columns.length);
		for (const { classIndex, offset, length } of this.days(span)) {
			let dayKwh = -1;
			for (let c = 0; c < sums.length; c++) {
				const weights = rates.energyWeights(c, classIndex);
				if (typeof weights === 'number') {
					if (weights === 0) continue;
					if (dayKwh < 0) {
						dayKwh = 0;
						for (let i = 0; i < length; i++) dayKwh += this.slots[offset + i] ?? 0;
					}
					sums[c] = (sums[c] ?? 0) + weights * dayKwh;
				} else {
					let sum = 0;
					for (let i = 0; i < length; i++) sum += (weights[i] ?? 0) * (this.slots[offset + i] ?? 0);
					sums[c] = (sums[c] ?? 0) + sum;
				}
			}
		}
		return sums;
	}

	/**
	 * The peak kW over the intervals `measured` selects — the meter's kW plus, when given, the
	 * equipment's worst-case kW of the day's class — in 15-minute values or clock-hour means, with the
	 * meter's own mean kW at that peak (its share). Ties keep the earliest interval.
	 */
	peak(
		span: SpanDays,
		measured: (classIndex: number) => Uint8Array | null,
		intervalMinutes: 15 | 60,
		equipmentKw: ((classIndex: number) => Float64Array) | null
	): { peak: PeakPoint; meterKw: number } | null {
		let best: { peak: PeakPoint; meterKw: number } | null = null;
		for (const { classIndex, offset, length } of this.days(span)) {
			const mask = measured(classIndex);
			const shape = this.calendar.classes[classIndex]?.shape;
			if (!mask || !shape) continue;
			const equipment = equipmentKw?.(classIndex) ?? null;
			const starts = intervalMinutes === 15 ? null : shape.hourStarts;
			const runs = starts ? starts.length : length;
			for (let r = 0; r < runs; r++) {
				const start = starts ? (starts[r] ?? 0) : r;
				const count = starts ? (starts[r + 1] ?? length) - start : 1;
				if (mask[start] !== 1) continue;
				let meterKw = 0;
				let kw = 0;
				for (let i = start; i < start + count; i++) {
					const own = (this.slots[offset + i] ?? 0) * SLOTS_PER_HOUR;
					meterKw += own;
					kw += own + (equipment?.[i] ?? 0);
				}
				kw /= count;
				if (!best || kw > best.peak.kw) {
					best = { peak: { kw, classIndex, start, count }, meterKw: meterKw / count };
				}
			}
		}
		return best;
	}
}
