import type { Calendar, DayClass, SpanDays } from './calendar';
import type { LoadGroup, ProfileBook } from './loads';

/**
 * Demand: the kW that could be drawn at once. A device counts at its full running power in every
 * interval where its schedule may run it (for hours, cycle and runs schedules that is every interval of
 * their selected days and windows — a deliberate worst case) and at standby otherwise.
 */
export interface PeakPoint {
	kw: number;
	classIndex: number;
	/** First 15-minute interval of the peak and how many intervals it averages (1, or up to 4). */
	start: number;
	count: number;
}

function mean(values: Float64Array, start: number, count: number): number {
	let sum = 0;
	for (let i = start; i < start + count; i++) sum += values[i] ?? 0;
	return sum / count;
}

export class DemandMeter {
	private readonly byMonth = new Map<string, Float64Array>();
	private readonly byVariant = new Map<number, Float64Array>();
	private readonly yearRound: boolean[];

	constructor(
		private readonly calendar: Calendar,
		private readonly book: ProfileBook,
		private readonly groups: readonly LoadGroup[]
	) {
		this.yearRound = groups.map((group) => group.months.reduce((sum, flag) => sum + flag, 0) === 12);
	}

	private addGroups(kw: Float64Array, day: DayClass, yearRound: boolean): void {
		this.groups.forEach((group, g) => {
			if (this.yearRound[g] !== yearRound) return;
			const profile = this.book.profile(g, day);
			if (!profile) return;
			const extra = group.runKw - group.standbyKw;
			for (let i = 0; i < kw.length; i++)
				kw[i] = (kw[i] ?? 0) + group.standbyKw + (profile.mayRun[i] ?? 0) * extra;
		});
	}

	/**
	 * Worst-case kW of all equipment in each interval of a day of the class. Holidays do not change what
	 * equipment draws, and year-round devices draw alike in every month, so those sums are shared.
	 */
	dayDemand(classIndex: number): Float64Array {
		const day = this.calendar.classes[classIndex];
		if (!day) return new Float64Array(0);
		const key = `${day.month}|${day.variant}`;
		const known = this.byMonth.get(key);
		if (known) return known;
		let base = this.byVariant.get(day.variant);
		if (!base) {
			base = new Float64Array(day.shape.minutes.length);
			this.addGroups(base, day, true);
			this.byVariant.set(day.variant, base);
		}
		const seasonal = this.groups.some((group, g) => !this.yearRound[g] && group.months[day.month] === 1);
		const kw = seasonal ? Float64Array.from(base) : base;
		if (seasonal) this.addGroups(kw, day, false);
		this.byMonth.set(key, kw);
		return kw;
	}

	/**
	 * The peak over a billing period's intervals that `measured` selects (null: none that day), in
	 * 15-minute values or, for 60-minute demand, the mean of each clock hour's four 15-minute values.
	 * Ties keep the earliest day class.
	 */
	spanPeak(
		span: SpanDays,
		measured: (classIndex: number) => Uint8Array | null,
		intervalMinutes: 15 | 60
	): PeakPoint | null {
		let best: PeakPoint | null = null;
		for (const classIndex of span.classCounts.keys()) {
			const mask = measured(classIndex);
			const shape = this.calendar.classes[classIndex]?.shape;
			if (!mask || !shape) continue;
			const kw = this.dayDemand(classIndex);
			let peak = -Infinity;
			let peakStart = -1;
			let peakCount = 1;
			if (intervalMinutes === 15) {
				for (let i = 0; i < kw.length; i++) {
					const value = kw[i] ?? 0;
					if (mask[i] !== 1 || value <= peak) continue;
					peak = value;
					peakStart = i;
				}
			} else {
				const starts = shape.hourStarts;
				for (let h = 0; h < starts.length; h++) {
					const start = starts[h] ?? 0;
					const count = (starts[h + 1] ?? kw.length) - start;
					const value = mask[start] === 1 ? mean(kw, start, count) : -Infinity;
					if (value <= peak) continue;
					peak = value;
					peakStart = start;
					peakCount = count;
				}
			}
			if (peakStart >= 0 && (!best || peak > best.kw)) {
				best = { kw: peak, classIndex, start: peakStart, count: peakCount };
			}
		}
		return best;
	}

	/** A group's share of the peak: its worst-case kW at the peak's intervals, per kW of running power. */
	mayRunAt(group: number, peak: PeakPoint): number | null {
		const day = this.calendar.classes[peak.classIndex];
		const profile = day ? this.book.profile(group, day) : null;
		return profile ? mean(profile.mayRun, peak.start, peak.count) : null;
	}
}
