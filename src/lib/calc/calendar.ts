import type { DayShape } from './day-shapes';
import { dayShapes } from './zone-days';
import { civilDate, dayNumber, isWeekend } from './dates';
import { type HolidaySpec, holidayDates } from './holidays';

/**
 * The days of the billing periods, collapsed into day classes: days with the same month, weekday or
 * weekend, holiday or not, and shape (ordinary, spring-forward, fall-back) have identical equipment
 * and tariff profiles, so each class is computed once and counted as many times as it occurs.
 */
export interface DayClass {
	month: number;
	weekend: boolean;
	holiday: boolean;
	shape: DayShape;
	/** Index of the (weekend, shape) pair: what an equipment schedule depends on. */
	variant: number;
}

export interface DateSpan {
	from: string;
	to: string;
}

export interface SpanDays extends DateSpan {
	days: number;
	hours: number;
	/** Class index → number of days, in order of first appearance (chronological). */
	classCounts: ReadonlyMap<number, number>;
}

export interface Calendar {
	classes: readonly DayClass[];
	variants: ReadonlyArray<{ weekend: boolean; shape: DayShape }>;
	spans: readonly SpanDays[];
	/** Day number → its class index, for every day of the spans (a meter walks the days in order). */
	classOfDay: ReadonlyMap<number, number>;
}

const CACHE_SIZE = 64;
const cache = new Map<string, Calendar>();

/** Merged day ranges covering the spans, so overlapping or adjacent spans sample offsets once. */
function coveringRanges(spans: readonly DateSpan[]): Array<[number, number]> {
	const sorted = spans.map((span) => [dayNumber(span.from), dayNumber(span.to)] as [number, number]);
	sorted.sort((a, b) => a[0] - b[0]);
	const ranges: Array<[number, number]> = [];
	for (const [from, to] of sorted) {
		const last = ranges[ranges.length - 1];
		if (last && from <= last[1] + 1) last[1] = Math.max(last[1], to);
		else ranges.push([from, to]);
	}
	return ranges;
}

function build(timezone: string, holidays: HolidaySpec | undefined, spans: readonly DateSpan[]): Calendar {
	const ranges = coveringRanges(spans);
	const years = new Set<number>();
	for (const [from, to] of ranges) {
		for (let year = civilDate(from).year; year <= civilDate(to).year; year++) years.add(year);
	}
	const holidayDays = new Set([...holidayDates(holidays, [...years])].map(dayNumber));
	const classes: DayClass[] = [];
	const classIndex = new Map<string, number>();
	const variants: Calendar['variants'][number][] = [];
	const variantIndex = new Map<string, number>();
	const dayClass = new Map<number, number>();
	for (const [from, to] of ranges) {
		const shapes = dayShapes(timezone, from, to);
		for (let day = from; day <= to; day++) {
			const shape = shapes[day - from];
			if (!shape) continue;
			const weekend = isWeekend(day);
			const month = civilDate(day).month;
			const holiday = holidayDays.has(day);
			const key = `${month}|${weekend}|${holiday}|${shape.key}`;
			let index = classIndex.get(key);
			if (index === undefined) {
				const variantKey = `${weekend}|${shape.key}`;
				let variant = variantIndex.get(variantKey);
				if (variant === undefined) {
					variant = variants.push({ weekend, shape }) - 1;
					variantIndex.set(variantKey, variant);
				}
				index = classes.push({ month, weekend, holiday, shape, variant }) - 1;
				classIndex.set(key, index);
			}
			dayClass.set(day, index);
		}
	}
	const spanDays = spans.map((span) => {
		const classCounts = new Map<number, number>();
		let hours = 0;
		const from = dayNumber(span.from);
		const to = dayNumber(span.to);
		for (let day = from; day <= to; day++) {
			const index = dayClass.get(day) ?? 0;
			classCounts.set(index, (classCounts.get(index) ?? 0) + 1);
			hours += classes[index]?.shape.hours ?? 0;
		}
		return { from: span.from, to: span.to, days: to - from + 1, hours, classCounts };
	});
	return { classes, variants, spans: spanDays, classOfDay: dayClass };
}

/**
 * The calendar of the spans (inclusive local dates) in a time zone with its holidays. Calendars are
 * pure functions of their inputs, so recent ones are kept (a site recalculated, scenarios compared).
 */
export function buildCalendar(
	timezone: string,
	holidays: HolidaySpec | undefined,
	spans: readonly DateSpan[]
): Calendar {
	const key = JSON.stringify([timezone, holidays ?? null, spans.map((span) => [span.from, span.to])]);
	const known = cache.get(key);
	if (known) return known;
	const calendar = build(timezone, holidays, spans);
	if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value ?? '');
	cache.set(key, calendar);
	return calendar;
}
