import { type EquipmentInput, nominalWindowMinutes, slotMask, SLOTS_PER_DAY } from '$lib/calc';

export type ScheduleInput = EquipmentInput['schedule'];
export type ScheduleKind = ScheduleInput['type'];
export type DaysInput = 'all' | 'weekdays' | 'weekends';
export interface WindowInput {
	start: string;
	end: string;
}

export const SCHEDULE_KINDS: readonly { kind: ScheduleKind; label: string }[] = [
	{ kind: 'always', label: 'Always on' },
	{ kind: 'hours', label: 'Hours a day' },
	{ kind: 'windows', label: 'Time windows' },
	{ kind: 'cycle', label: 'On/off cycle' },
	{ kind: 'runs', label: 'Triggered runs' }
];

/** One day of a schedule as the strip draws it: 96 quarter hours, each the fraction of it running. */
export interface StripDay {
	cells: number[];
	/** Hours, cycles and runs have no fixed clock times: their running time is shaded thin over the day. */
	spread: boolean;
}

// Half-typed schedules still draw: a missing or broken figure counts as zero.
const figure = (value: unknown): number =>
	typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : 0;

const windowsOf = (schedule: object): WindowInput[] | undefined =>
	'windows' in schedule && Array.isArray(schedule.windows) ? (schedule.windows as WindowInput[]) : undefined;

/**
 * The strip for a schedule, by the core's rules on an ordinary 24-hour day: always on; hours a day
 * spread evenly over the whole day; windows on inside them (22:00–06:00 lights both ends); a cycle on
 * for on/(on+off) of each quarter hour inside its windows; runs spread evenly over their windows.
 * A duty cycle below 100 % scales every quarter hour: a heater always on at 35 % duty draws power
 * 35 % of each quarter hour.
 */
export function stripDay(schedule: ScheduleInput | undefined, dutyPercent?: unknown): StripDay {
	const day = scheduleDay(schedule);
	const duty =
		typeof dutyPercent === 'number' && Number.isFinite(dutyPercent) && dutyPercent >= 0 && dutyPercent < 100
			? dutyPercent / 100
			: 1;
	if (duty === 1) return day;
	return { cells: day.cells.map((fraction) => fraction * duty), spread: true };
}

function scheduleDay(schedule: ScheduleInput | undefined): StripDay {
	const blank = (fraction: number, mask?: Uint8Array): number[] =>
		Array.from({ length: SLOTS_PER_DAY }, (_, i) => (mask ? (mask[i] ?? 0) : 1) * fraction);
	if (!schedule || typeof schedule !== 'object') return { cells: blank(0), spread: false };
	const windows = windowsOf(schedule);
	switch (schedule.type) {
		case 'always':
			return { cells: blank(1), spread: false };
		case 'hours':
			return { cells: blank(Math.min(1, figure(schedule.hoursPerDay) / 24)), spread: true };
		case 'windows':
			// The core's "no windows" means all day for cycles and runs; a windows schedule needs one.
			return { cells: windows?.length ? blank(1, slotMask(windows)) : blank(0), spread: false };
		case 'cycle': {
			const on = figure(schedule.onMinutes);
			const total = on + figure(schedule.offMinutes);
			return { cells: blank(total > 0 ? on / total : 0, slotMask(windows)), spread: true };
		}
		case 'runs': {
			const windowMinutes = nominalWindowMinutes(windows);
			const runMinutes = figure(schedule.runsPerDay) * figure(schedule.minutesPerRun);
			const fraction = windowMinutes > 0 ? Math.min(1, runMinutes / windowMinutes) : 0;
			return { cells: blank(fraction, slotMask(windows)), spread: true };
		}
		default:
			return { cells: blank(0), spread: false };
	}
}

/**
 * How a run of quarter hours is drawn: nothing when off, solid when on the whole time, and when on part
 * of the time (a triggered run, a cycle, hours spread over the day, a duty cycle) hatched across the
 * span with a solid fill rising to the share of the time it runs, never thinner than a visible sliver.
 */
export function cellFill(fraction: number): { kind: 'off' | 'on' | 'part'; heightPercent: number } {
	if (!(fraction > 0)) return { kind: 'off', heightPercent: 0 };
	if (fraction >= 1) return { kind: 'on', heightPercent: 100 };
	return { kind: 'part', heightPercent: Math.max(15, Math.round(fraction * 100)) };
}

/**
 * The words for a hatched strip, a text equivalent of its share: "runs when triggered, about 2.5 min an
 * hour" (4 runs of 15 min spread over the day), "runs part of each hour, about 15 min an hour". The
 * minutes are those of the hours it may run (its windows); null when nothing is drawn hatched.
 */
export function stripLegend(schedule: ScheduleInput | undefined, day: StripDay): string | null {
	const part = day.cells.filter((fraction) => fraction > 0 && fraction < 1);
	if (!part.length) return null;
	const minutes = Math.max(...part) * 60;
	const about = `about ${minutes < 10 ? Math.round(minutes * 10) / 10 : Math.round(minutes)} min an hour`;
	const triggered = schedule?.type === 'runs';
	return `${triggered ? 'Runs when triggered' : 'Runs part of each hour'}, ${about}`;
}

const DAY_WORDS: Record<DaysInput, string> = { all: '', weekdays: ', weekdays', weekends: ', weekends' };

const windowText = (windows: WindowInput[] | undefined) =>
	windows?.length ? windows.map((w) => `${w.start}–${w.end}`).join(', ') : '';

/** A schedule in a few words: "8 h a day, spread over the day, weekdays". */
export function scheduleSummary(schedule: ScheduleInput | undefined): string {
	if (!schedule || typeof schedule !== 'object') return 'No schedule';
	const days = 'days' in schedule && schedule.days ? DAY_WORDS[schedule.days] : '';
	const windows = windowsOf(schedule);
	const over = windows?.length ? `spread over ${windowText(windows)}` : 'spread over the day';
	switch (schedule.type) {
		case 'always':
			return 'Always on';
		case 'hours':
			return `${figure(schedule.hoursPerDay)} h a day, spread over the day${days}`;
		case 'windows':
			return `${windowText(windows) || 'No windows'}${days}`;
		case 'cycle':
			return `On ${figure(schedule.onMinutes)} min, off ${figure(schedule.offMinutes)} min, ${over}${days}`;
		case 'runs':
			return `${figure(schedule.runsPerDay)} runs of ${figure(schedule.minutesPerRun)} min a day, ${over}${days}`;
		default:
			return 'Unknown schedule';
	}
}

/**
 * A schedule of another kind, keeping the days and windows of the one it replaces, with round-number
 * figures that are valid as they stand.
 */
export function switchSchedule(schedule: ScheduleInput | undefined, kind: ScheduleKind): ScheduleInput {
	const old = (schedule ?? {}) as Partial<Record<'days' | 'windows', unknown>>;
	const days: DaysInput =
		old.days === 'weekdays' || old.days === 'weekends' || old.days === 'all' ? old.days : 'all';
	const windows = Array.isArray(old.windows)
		? (old.windows as WindowInput[]).map((w) => ({ ...w }))
		: undefined;
	switch (kind) {
		case 'always':
			return { type: 'always' };
		case 'hours':
			return { type: 'hours', hoursPerDay: 8, days };
		case 'windows':
			return {
				type: 'windows',
				windows: windows?.length ? windows : [{ start: '06:00', end: '18:00' }],
				days
			};
		case 'cycle':
			return { type: 'cycle', onMinutes: 15, offMinutes: 45, ...(windows ? { windows } : {}), days };
		case 'runs':
			return { type: 'runs', runsPerDay: 4, minutesPerRun: 15, ...(windows ? { windows } : {}), days };
	}
}

/** Quarter-hour times "00:00" … "23:45"; with `endOfDay`, also "24:00". */
export function quarterHours(endOfDay = false): string[] {
	const times = Array.from({ length: SLOTS_PER_DAY }, (_, i) => {
		const minutes = i * 15;
		return `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
	});
	return endOfDay ? [...times, '24:00'] : times;
}

/** A run of equal quarter hours: `start` cell, `length` cells, the fraction running in each. */
export interface StripSegment {
	start: number;
	length: number;
	fraction: number;
}

/**
 * The cells as runs of equal values, so the strip draws a few divs spanning its 96-column grid rather
 * than 96 per row (48,000 elements in a 500-device list). An always-on day is one segment.
 */
export function stripSegments(cells: readonly number[]): StripSegment[] {
	const segments: StripSegment[] = [];
	cells.forEach((fraction, i) => {
		const last = segments.at(-1);
		if (last && last.fraction === fraction) last.length += 1;
		else segments.push({ start: i, length: 1, fraction });
	});
	return segments;
}
