import { INTERVAL_HOURS, INTERVAL_MINUTES, daysMatch, windowMask } from './clock';
import type { DayShape } from './day-shapes';
import type { Schedule } from './equipment.schema';

/**
 * One day of a schedule: for each 15-minute interval, the fraction of it the device runs, and whether
 * it may run at all (1/0) — the worst case that demand charges assume. Read-only: the two arrays may
 * be one and the same.
 */
export interface DayProfile {
	onFraction: Float64Array;
	mayRun: Float64Array;
	onHours: number;
}

/** A key equal for schedules that behave the same, so devices sharing one share their profiles. */
export function scheduleKey(schedule: Schedule): string {
	return JSON.stringify(schedule);
}

/** A profile running `fraction` of each interval the mask selects (every interval without a mask). */
function running(count: number, mask: Uint8Array | null, fraction: number): DayProfile {
	const mayRun = mask ? Float64Array.from(mask) : new Float64Array(count).fill(1);
	const intervals = mask ? mask.reduce((sum, flag) => sum + flag, 0) : count;
	// Profiles are read-only, so a full-time profile shares one array for both.
	const onFraction = fraction === 1 ? mayRun : mayRun.map((flag) => flag * fraction);
	return { onFraction, mayRun, onHours: intervals * fraction * INTERVAL_HOURS };
}

function idle(count: number): DayProfile {
	const none = new Float64Array(count);
	return { onFraction: none, mayRun: none, onHours: 0 };
}

/**
 * The schedule on one day, given whether the day is a Saturday or Sunday (holidays are ordinary days
 * for equipment) and its shape (23, 24 or 25 hours of wall-clock minutes).
 * - always: every interval.
 * - hours: hoursPerDay spread evenly over all the day's intervals (so a 25-hour day still gives
 *   hoursPerDay; a 23-hour day holds at most 23).
 * - windows: on inside them. cycle: on for on/(on+off) of every interval inside its windows.
 * - runs: runsPerDay × minutesPerRun spread evenly over the window time the day really has (at most
 *   all of it, when a spring-forward day shortens the windows).
 */
export function dayProfile(schedule: Schedule, weekend: boolean, shape: DayShape): DayProfile {
	const count = shape.minutes.length;
	if (schedule.type === 'always') return running(count, null, 1);
	if (!daysMatch(schedule.days, weekend)) return idle(count);
	switch (schedule.type) {
		case 'hours':
			if (schedule.hoursPerDay === 0) return idle(count);
			return running(count, null, Math.min(1, schedule.hoursPerDay / shape.hours));
		case 'windows':
			return running(count, windowMask(schedule.windows, shape), 1);
		case 'cycle': {
			if (schedule.onMinutes === 0) return idle(count);
			const fraction = schedule.onMinutes / (schedule.onMinutes + schedule.offMinutes);
			return running(count, windowMask(schedule.windows, shape), fraction);
		}
		case 'runs': {
			const mask = windowMask(schedule.windows, shape);
			const windowMinutes = mask.reduce((sum, flag) => sum + flag, 0) * INTERVAL_MINUTES;
			const runMinutes = schedule.runsPerDay * schedule.minutesPerRun;
			if (runMinutes === 0 || windowMinutes === 0) return idle(count);
			return running(count, mask, Math.min(1, runMinutes / windowMinutes));
		}
	}
}
