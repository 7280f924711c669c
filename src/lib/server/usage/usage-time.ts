import { DateTime } from 'luxon';

/**
 * The timestamps a usage sheet may hold: an ISO 8601 time with its offset ("2026-03-08T01:00-06:00",
 * "…Z"), or a local clock time ("2026-03-08 01:00") read in the site's time zone.
 */

const WITH_OFFSET = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}(:?\d{2})?)$/i;
const LOCAL = /^(\d{4})-(\d{2})-(\d{2})[ T](\d{2}):(\d{2})(?::(\d{2}))?$/;

export const TIMESTAMP_HINT =
	'must be a time like 2026-03-08 01:00 (local) or 2026-03-08T01:00-06:00 (with its offset)';

/**
 * Offsets (minutes) at the start and end of each local day, so the many readings of a day without a
 * clock change skip luxon's slower full conversion; a day whose offsets differ is converted reading
 * by reading.
 */
export type DayOffsets = Map<string, number | null>;

function steadyOffset(date: string, zone: string, days: DayOffsets): number | null {
	let offset = days.get(date);
	if (offset === undefined) {
		const start = DateTime.fromISO(date, { zone }).startOf('day');
		const end = start.endOf('day');
		offset = start.isValid && start.offset === end.offset ? start.offset : null;
		days.set(date, offset);
	}
	return offset;
}

type Fields = { year: number; month: number; day: number; hour: number; minute: number; second: number };

function exactLocal(
	fields: Fields,
	zone: string,
	afterMs: number | null
): { ms: number } | { message: string } {
	const time = DateTime.fromObject(fields, { zone });
	// luxon moves a clock time that the spring change skips to the hour after; such a reading cannot exist.
	if (time.hour !== fields.hour || time.minute !== fields.minute || time.day !== fields.day)
		return { message: `does not exist in ${zone}: the clocks jump forward at that hour` };
	// The hour repeated when clocks go back: the second time round comes after the reading before it.
	const candidates = time
		.getPossibleOffsets()
		.map((t) => t.toMillis())
		.sort((a, b) => a - b);
	return { ms: candidates.find((ms) => afterMs === null || ms > afterMs) ?? time.toMillis() };
}

/**
 * A sheet timestamp as Unix milliseconds. `afterMs` is the reading before it in the file: on the
 * night clocks go back, a repeated local time such as 01:30 is read as its second occurrence when the
 * first one is already taken.
 */
export function readTimestamp(
	raw: string,
	zone: string,
	afterMs: number | null,
	days: DayOffsets
): { ms: number } | { message: string } {
	if (WITH_OFFSET.test(raw)) {
		const time = DateTime.fromISO(raw, { setZone: true });
		return time.isValid ? { ms: time.toMillis() } : { message: 'is not a real date and time' };
	}
	const local = LOCAL.exec(raw);
	if (!local) return { message: TIMESTAMP_HINT };
	const [year, month, day, hour, minute, second] = local.slice(1).map((part) => Number(part ?? 0));
	const fields = { year: year!, month: month!, day: day!, hour: hour!, minute: minute!, second: second! };
	const naive = Date.UTC(
		fields.year,
		fields.month - 1,
		fields.day,
		fields.hour,
		fields.minute,
		fields.second
	);
	if (new Date(naive).toISOString().slice(0, 19) !== `${raw.slice(0, 10)}T${clock(fields)}`)
		return { message: 'is not a real date and time' };
	const offset = steadyOffset(raw.slice(0, 10), zone, days);
	return offset === null ? exactLocal(fields, zone, afterMs) : { ms: naive - offset * 60_000 };
}

const two = (n: number) => String(n).padStart(2, '0');
const clock = (f: Fields) => `${two(f.hour)}:${two(f.minute)}:${two(f.second)}`;
