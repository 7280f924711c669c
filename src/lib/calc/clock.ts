/**
 * Wall-clock windows ("06:00"–"18:00") and day selectors, shared by schedules and tariffs. Time runs on
 * a 15-minute grid; an interval belongs to a window when its wall-clock start lies inside it.
 */

export const INTERVAL_MINUTES = 15;
export const INTERVAL_HOURS = INTERVAL_MINUTES / 60;
export const MINUTES_PER_DAY = 1440;
export const SLOTS_PER_DAY = MINUTES_PER_DAY / INTERVAL_MINUTES;

export interface ClockWindow {
	start: string;
	end: string;
}

export type DaySelector = 'all' | 'weekdays' | 'weekends';

/** "HH:MM" as minutes after midnight; "24:00" is 1440 (allowed only as a window's end). */
export function clockMinutes(hhmm: string): number {
	return Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));
}

/**
 * Whether each 15-minute slot of the wall clock (0 = 00:00–00:15 … 95) lies in one of the windows. A
 * window whose end is before its start (22:00–06:00) covers both ends of the same day: from its start
 * to midnight and from midnight to its end. No windows (undefined or empty) means the whole day.
 */
export function slotMask(windows: readonly ClockWindow[] | undefined): Uint8Array {
	const mask = new Uint8Array(SLOTS_PER_DAY);
	if (!windows || windows.length === 0) return mask.fill(1);
	for (const window of windows) {
		const start = clockMinutes(window.start) / INTERVAL_MINUTES;
		const end = clockMinutes(window.end) / INTERVAL_MINUTES;
		if (Number.isNaN(start) || Number.isNaN(end)) continue;
		if (start < end) mask.fill(1, start, end);
		else {
			mask.fill(1, start);
			mask.fill(1, 0, end);
		}
	}
	return mask;
}

/** The wall-clock start minute of each interval of a day; `standard` when it is 00:00, 00:15, … 23:45. */
export interface WallClockDay {
	minutes: Int16Array;
	standard: boolean;
}

/**
 * 1 for each interval of a day inside any of the windows, else 0. Windows lie on the 15-minute grid,
 * so an interval is in a window exactly when its wall-clock slot is.
 */
export function windowMask(windows: readonly ClockWindow[] | undefined, day: WallClockDay): Uint8Array {
	const slots = slotMask(windows);
	if (day.standard) return slots;
	const { minutes } = day;
	const mask = new Uint8Array(minutes.length);
	for (let i = 0; i < minutes.length; i++)
		mask[i] = slots[Math.floor((minutes[i] ?? 0) / INTERVAL_MINUTES)] ?? 0;
	return mask;
}

/** Wall-clock minutes the windows cover on an ordinary 24-hour day (overlaps counted once). */
export function nominalWindowMinutes(windows: readonly ClockWindow[] | undefined): number {
	return slotMask(windows).reduce((sum, flag) => sum + flag, 0) * INTERVAL_MINUTES;
}

/** Whether a day selector picks a day that is (or prices as) a weekend or not. */
export function daysMatch(days: DaySelector, weekend: boolean): boolean {
	return days === 'all' || (days === 'weekends') === weekend;
}

/** "HH:MM" for a minute of the day, for messages. */
export function clockText(minute: number): string {
	return `${String(Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`;
}
