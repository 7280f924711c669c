/**
 * The days of a time zone: which are ordinary and which daylight-saving (or other offset) changes
 * lengthen or shorten, measured with Luxon's view of the IANA time-zone database.
 */
import { DateTime, IANAZone } from 'luxon';
import { INTERVAL_MINUTES, MINUTES_PER_DAY } from './clock';
import { DAY_MS, civilDate } from './dates';
import { type DayShape, STANDARD_DAY, shapeOf } from './day-shapes';

const INTERVAL_MS = INTERVAL_MINUTES * 60_000;

function localMinute(instantMs: number, offsetMinutes: number): number {
	const minute = Math.floor((instantMs + offsetMinutes * 60_000) / 60_000);
	return ((minute % MINUTES_PER_DAY) + MINUTES_PER_DAY) % MINUTES_PER_DAY;
}

/**
 * The instant a local day begins. When clocks fall back across midnight, 00:00 happens twice and the
 * day begins at the first; when they spring forward over it, the day begins where the gap ends (Luxon
 * shifts a time in a gap forward).
 */
function localMidnight(zone: IANAZone, day: number): number {
	const wall = day * DAY_MS;
	const offsets = new Set([zone.offset(wall - DAY_MS), zone.offset(wall), zone.offset(wall + DAY_MS)]);
	const starts = [...offsets]
		.map((offset) => wall - offset * 60_000)
		.filter((t) => zone.offset(t) * 60_000 === wall - t);
	return starts.length > 0 ? Math.min(...starts) : DateTime.fromObject(civilDate(day), { zone }).toMillis();
}

/** A day near an offset change, measured from its local midnight to the next. */
function measuredShape(zone: IANAZone, day: number): DayShape {
	const start = localMidnight(zone, day);
	const end = localMidnight(zone, day + 1);
	const count = Math.round((end - start) / INTERVAL_MS);
	const offsetAtStart = zone.offset(start);
	const offsetAtEnd = zone.offset(start + (count - 1) * INTERVAL_MS);
	// One offset change per day at most: find the first interval already on the new offset.
	let firstAfter = count;
	if (offsetAtStart !== offsetAtEnd) {
		let low = 0;
		let high = count - 1;
		while (low < high) {
			const middle = (low + high) >> 1;
			if (zone.offset(start + middle * INTERVAL_MS) === offsetAtStart) low = middle + 1;
			else high = middle;
		}
		firstAfter = low;
	}
	const minutes = new Int16Array(count).map((_, i) =>
		localMinute(start + i * INTERVAL_MS, i < firstAfter ? offsetAtStart : offsetAtEnd)
	);
	return shapeOf(minutes);
}

/** UTC offsets (minutes) at the UTC midnights of days first..last: sampled weekly, filled daily near changes. */
function offsetsAtMidnights(zone: IANAZone, first: number, last: number): Float64Array {
	const offsets = new Float64Array(last - first + 1);
	offsets[0] = zone.offset(first * DAY_MS);
	let previous = first;
	while (previous < last) {
		const next = Math.min(previous + 7, last);
		const offset = zone.offset(next * DAY_MS);
		offsets[next - first] = offset;
		const changed = offset !== offsets[previous - first];
		for (let day = previous + 1; day < next; day++) {
			offsets[day - first] = changed ? zone.offset(day * DAY_MS) : offset;
		}
		previous = next;
	}
	return offsets;
}

function measureRange(zone: IANAZone, first: number, last: number): DayShape[] {
	const offsets = offsetsAtMidnights(zone, first - 1, last + 2);
	const result: DayShape[] = [];
	for (let day = first; day <= last; day++) {
		const i = day - first;
		const steady =
			offsets[i] === offsets[i + 1] && offsets[i] === offsets[i + 2] && offsets[i] === offsets[i + 3];
		result.push(steady ? STANDARD_DAY : measuredShape(zone, day));
	}
	return result;
}

const YEARS_KEPT = 256;
const years = new Map<string, DayShape[]>();

/** The shapes of every day of a year in a zone: fixed facts of the time-zone database, so kept. */
function yearShapes(timezone: string, year: number): DayShape[] {
	const key = `${timezone}|${year}`;
	const known = years.get(key);
	if (known) return known;
	const first = Date.UTC(year, 0, 1) / DAY_MS;
	const shapesOfYear = measureRange(IANAZone.create(timezone), first, Date.UTC(year + 1, 0, 1) / DAY_MS - 1);
	if (years.size >= YEARS_KEPT) years.delete(years.keys().next().value ?? '');
	years.set(key, shapesOfYear);
	return shapesOfYear;
}

/**
 * Shapes of the local days first..last (day numbers) in an IANA time zone. A local day lies within the
 * UTC midnights of the day before and two days after (offsets are within ±24 h), so a day whose offset
 * is the same at all four of those instants is an ordinary day; the others are measured with Luxon.
 */
export function dayShapes(timezone: string, first: number, last: number): DayShape[] {
	const result: DayShape[] = [];
	for (let day = first; day <= last;) {
		const { year } = civilDate(day);
		const firstOfYear = Date.UTC(year, 0, 1) / DAY_MS;
		const shapesOfYear = yearShapes(timezone, year);
		const end = Math.min(last, firstOfYear + shapesOfYear.length - 1);
		for (; day <= end; day++) result.push(shapesOfYear[day - firstOfYear] ?? STANDARD_DAY);
	}
	return result;
}
