/**
 * An hour-by-month schedule, the shape the open rate database (URDB) uses: twelve rows (January first)
 * of twenty-four period indexes (hour 0 = 00:00–01:00), one grid for weekdays and one for weekends.
 * `gridSeasons` turns it into Runrate's shape exactly: months with the same two rows form a season;
 * within a season each period's hours become windows on the days they apply to, and the period with
 * the most hours a week becomes the season's "other" rate, so it needs no windows.
 */

export type HourGrid = readonly (readonly number[])[];

export type GridDays = 'all' | 'weekdays' | 'weekends';

export interface GridPeriod {
	/** The period's index in the grid (and in the rate structure it points into). */
	index: number;
	days: GridDays;
	windows: { start: string; end: string }[];
}

export interface GridSeason {
	/** Months 1–12. */
	months: number[];
	periods: GridPeriod[];
	/** The period that covers every hour no window names. */
	otherIndex: number;
}

const clock = (hour: number) => `${String(hour).padStart(2, '0')}:00`;

/**
 * The hours (0–23) as windows: each run of consecutive hours one window; a run that ends at midnight
 * and one that starts at midnight join into one window across midnight (22:00–02:00).
 */
export function hourWindows(hours: readonly number[]): { start: string; end: string }[] {
	const set = new Set(hours);
	if (set.size === 24) return [{ start: '00:00', end: '24:00' }];
	const runs: [number, number][] = [];
	for (let hour = 0; hour < 24; hour++) {
		if (!set.has(hour)) continue;
		const last = runs.at(-1);
		if (last && last[1] === hour) last[1] = hour + 1;
		else runs.push([hour, hour + 1]);
	}
	const first = runs[0];
	const final = runs.at(-1);
	if (runs.length > 1 && first && final && first[0] === 0 && final[1] === 24) {
		runs.pop();
		runs[0] = [final[0], first[1]];
	}
	return runs.map(([start, end]) => ({ start: clock(start), end: end === 24 ? '24:00' : clock(end) }));
}

/** The hours of a row that hold `index`. */
const hoursOf = (row: readonly number[], index: number) =>
	row.flatMap((value, hour) => (value === index ? [hour] : []));

/** One season's periods from its weekday and weekend rows. */
function seasonPeriods(weekday: readonly number[], weekend: readonly number[]): Omit<GridSeason, 'months'> {
	const indexes = [...new Set([...weekday, ...weekend])].sort((a, b) => a - b);
	// Hours a week: five weekdays and two weekend days.
	const weekly = (index: number) => 5 * hoursOf(weekday, index).length + 2 * hoursOf(weekend, index).length;
	const otherIndex = indexes.reduce((a, b) => (weekly(b) > weekly(a) ? b : a));
	const periods: GridPeriod[] = [];
	for (const index of indexes) {
		if (index === otherIndex) continue;
		const onWeekdays = hoursOf(weekday, index);
		const onWeekends = new Set(hoursOf(weekend, index));
		const both = onWeekdays.filter((hour) => onWeekends.has(hour));
		const weekdaysOnly = onWeekdays.filter((hour) => !onWeekends.has(hour));
		const weekendsOnly = [...onWeekends].filter((hour) => !onWeekdays.includes(hour));
		for (const [days, hours] of [
			['all', both],
			['weekdays', weekdaysOnly],
			['weekends', weekendsOnly]
		] as const)
			if (hours.length > 0) periods.push({ index, days, windows: hourWindows(hours) });
	}
	return { periods, otherIndex };
}

/** The seasons of a weekday and a weekend grid (both 12 × 24; checked by the caller's schema). */
export function gridSeasons(weekday: HourGrid, weekend: HourGrid): GridSeason[] {
	const seasons = new Map<string, GridSeason>();
	for (let month = 0; month < 12; month++) {
		const days = weekday[month] ?? [];
		const ends = weekend[month] ?? [];
		const key = `${days.join(',')}|${ends.join(',')}`;
		const found = seasons.get(key);
		if (found) found.months.push(month + 1);
		else seasons.set(key, { months: [month + 1], ...seasonPeriods(days, ends) });
	}
	return [...seasons.values()];
}

/**
 * The period a converted schedule gives an hour: the first window that holds it on that kind of day,
 * else the season's other period. The inverse of `gridSeasons`, for checking it.
 */
export function periodAt(
	seasons: readonly GridSeason[],
	month: number,
	weekendDay: boolean,
	hour: number
): number {
	const season = seasons.find((s) => s.months.includes(month));
	if (!season) throw new Error(`No season holds month ${month}`);
	for (const period of season.periods) {
		if (period.days === (weekendDay ? 'weekdays' : 'weekends')) continue;
		for (const { start, end } of period.windows) {
			const from = Number(start.slice(0, 2));
			const to = Number(end.slice(0, 2));
			const inside = from < to ? hour >= from && hour < to : hour >= from || hour < to;
			if (inside) return period.index;
		}
	}
	return season.otherIndex;
}
