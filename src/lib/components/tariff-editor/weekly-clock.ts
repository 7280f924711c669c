import { type DaySelector, daysMatch, slotMask, SLOTS_PER_DAY } from '$lib/calc';

interface PeriodShape {
	days?: DaySelector;
	windows: ReadonlyArray<{ start: string; end: string }>;
}

export interface ClockRows {
	/** For each quarter hour of a weekday (0 = 00:00–00:15), the index of the period priced then, or -1. */
	weekday: number[];
	weekend: number[];
}

/**
 * Which period prices each quarter hour of a weekday and of a weekend day: the first period that
 * matches, as the calculation reads them; -1 where the season's other rate applies. Windows that are
 * not valid times yet are skipped (the editor shows their message).
 */
export function clockRows(periods: readonly PeriodShape[]): ClockRows {
	const masks = periods.map((period) =>
		period.windows.length === 0 ? new Uint8Array(SLOTS_PER_DAY) : slotMask(period.windows)
	);
	const row = (weekend: boolean) =>
		Array.from({ length: SLOTS_PER_DAY }, (_, slot) =>
			periods.findIndex((period, p) => daysMatch(period.days ?? 'all', weekend) && masks[p]?.[slot] === 1)
		);
	return { weekday: row(false), weekend: row(true) };
}
