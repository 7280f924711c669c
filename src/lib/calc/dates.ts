/**
 * Civil dates as day numbers (days since 1970-01-01), so the core can walk a billing period and judge
 * weekdays with integer arithmetic; only instants in a time zone need Luxon (see day-shapes.ts).
 */

export const DAY_MS = 86_400_000;

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const ISO_MONTH = /^(\d{4})-(\d{2})$/;

export interface CivilDate {
	year: number;
	month: number;
	day: number;
}

/** Parses "YYYY-MM-DD" into a real calendar date, or null ("2027-02-30" is null). */
export function parseIsoDate(text: string): CivilDate | null {
	const match = ISO_DATE.exec(text);
	if (!match) return null;
	const date = { year: Number(match[1]), month: Number(match[2]), day: Number(match[3]) };
	const back = civilDate(Date.UTC(date.year, date.month - 1, date.day) / DAY_MS);
	return back.year === date.year && back.month === date.month && back.day === date.day ? date : null;
}

/** Parses "YYYY-MM" into a year and month, or null. */
export function parseIsoMonth(text: string): { year: number; month: number } | null {
	const match = ISO_MONTH.exec(text);
	if (!match) return null;
	const month = Number(match[2]);
	return month >= 1 && month <= 12 ? { year: Number(match[1]), month } : null;
}

/** Day number of a "YYYY-MM-DD" that has already been validated. */
export function dayNumber(isoDate: string): number {
	const date = parseIsoDate(isoDate);
	if (!date) throw new Error(`Not a calendar date: ${isoDate}`);
	return Date.UTC(date.year, date.month - 1, date.day) / DAY_MS;
}

/** The calendar date of a day number. */
export function civilDate(day: number): CivilDate {
	const date = new Date(day * DAY_MS);
	return { year: date.getUTCFullYear(), month: date.getUTCMonth() + 1, day: date.getUTCDate() };
}

/** "YYYY-MM-DD" of a day number. */
export function isoDate(day: number): string {
	return new Date(day * DAY_MS).toISOString().slice(0, 10);
}

/** Saturday and Sunday: 1970-01-01 (day 0) was a Thursday. */
export function isWeekend(day: number): boolean {
	const weekday = (((day + 4) % 7) + 7) % 7;
	return weekday === 0 || weekday === 6;
}

/** Number of days in a month of a year. */
export function daysInMonth(year: number, month: number): number {
	return new Date(Date.UTC(year, month, 0)).getUTCDate();
}
