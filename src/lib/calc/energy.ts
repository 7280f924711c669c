import type { Calendar, SpanDays } from './calendar';
import { INTERVAL_HOURS } from './clock';
import type { Loads, ProfileBook } from './loads';
import type { RateBook } from './rates';
import type { DayProfile } from './schedule';

/**
 * The load groups' energy over a billing period, as sums from which every device's figures follow
 * linearly: a device of group g with running kW R and standby kW S uses S·hours[g] + (R − S)·onHours[g]
 * kWh, and energy column e (see `EnergyColumn`) costs it S·weighted[i] + (R − S)·onWeighted[i] with
 * i = g·charges + e (for a column counting kWh those sums are its kWh, not money).
 */
export interface SpanUsage {
	/** The number of energy columns. */
	charges: number;
	hours: Float64Array;
	onHours: Float64Array;
	weighted: Float64Array;
	onWeighted: Float64Array;
}

function dot(a: Float64Array, b: Float64Array): number {
	let sum = 0;
	for (let i = 0; i < a.length; i++) sum += (a[i] ?? 0) * (b[i] ?? 0);
	return sum;
}

/** Sums each day class once per load group and charge, then counts each class's days in a period. */
export class UsageMeter {
	private readonly dots = new Map<DayProfile, Map<Float64Array, number>>();
	private readonly charges: number;

	constructor(
		private readonly calendar: Calendar,
		private readonly loads: Loads,
		private readonly profiles: ProfileBook,
		private readonly rates: RateBook
	) {
		this.charges = rates.columns.length;
	}

	/** Σ on-fraction × price × hours over a day: the price the running part of a profile meets. */
	private onWeight(profile: DayProfile, weights: Float64Array): number {
		let row = this.dots.get(profile);
		if (!row) this.dots.set(profile, (row = new Map()));
		let value = row.get(weights);
		if (value === undefined) row.set(weights, (value = dot(profile.onFraction, weights) * INTERVAL_HOURS));
		return value;
	}

	/** Every group's sums over a billing period: each day class's sums times its number of days. */
	spanUsage(span: SpanDays): SpanUsage {
		const groups = this.loads.groups.length;
		const { charges } = this;
		const usage: SpanUsage = {
			charges,
			hours: new Float64Array(groups),
			onHours: new Float64Array(groups),
			weighted: new Float64Array(groups * charges),
			onWeighted: new Float64Array(groups * charges)
		};
		const weights: Array<number | Float64Array> = new Array(charges);
		const weightedHours = new Float64Array(charges);
		for (const [classIndex, days] of span.classCounts) {
			const day = this.calendar.classes[classIndex];
			if (!day) continue;
			for (let e = 0; e < charges; e++) {
				weights[e] = this.rates.energyWeights(e, classIndex);
				weightedHours[e] = this.rates.weightedHours(e, classIndex);
			}
			for (let g = 0; g < groups; g++) {
				const profile = this.profiles.profile(g, day);
				if (!profile) continue;
				usage.hours[g] = (usage.hours[g] ?? 0) + days * day.shape.hours;
				usage.onHours[g] = (usage.onHours[g] ?? 0) + days * profile.onHours;
				for (let e = 0; e < charges; e++) {
					const weight = weights[e] ?? 0;
					const i = g * charges + e;
					const on = typeof weight === 'number' ? weight * profile.onHours : this.onWeight(profile, weight);
					usage.weighted[i] = (usage.weighted[i] ?? 0) + days * (weightedHours[e] ?? 0);
					usage.onWeighted[i] = (usage.onWeighted[i] ?? 0) + days * on;
				}
			}
		}
		return usage;
	}
}
