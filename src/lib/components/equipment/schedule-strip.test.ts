import { describe, expect, it } from 'vitest';
import { equipmentSchema } from '$lib/calc';
import { blankDevice } from './equipment-table';
import {
	type ScheduleInput,
	SCHEDULE_KINDS,
	cellFill,
	quarterHours,
	scheduleSummary,
	stripDay,
	stripLegend,
	stripSegments,
	switchSchedule
} from './schedule-strip';

// The strip follows the core's schedule rules (issue 3, src/lib/calc/schedule.ts) on an ordinary
// 24-hour day; the schedules are invented examples.

const lit = (cells: number[]) => cells.flatMap((fraction, i) => (fraction > 0 ? [i] : []));
const slot = (hhmm: string) => quarterHours().indexOf(hhmm);

describe('the strip of each kind of schedule', () => {
	it('lights all 96 quarter hours of an always-on device', () => {
		const day = stripDay({ type: 'always' });
		expect(day.cells).toHaveLength(96);
		expect(day.cells.every((fraction) => fraction === 1)).toBe(true);
		expect(day.spread).toBe(false);
	});

	it('spreads hours a day thinly over the whole day', () => {
		const day = stripDay({ type: 'hours', hoursPerDay: 6 });
		expect(new Set(day.cells)).toEqual(new Set([0.25]));
		expect(day.spread).toBe(true);
	});

	it('lights a window from its start to its end', () => {
		const day = stripDay({ type: 'windows', windows: [{ start: '06:00', end: '18:00' }] });
		expect(lit(day.cells)).toEqual(Array.from({ length: 48 }, (_, i) => slot('06:00') + i));
		expect(day.cells[slot('18:00')]).toBe(0);
	});

	it('lights both ends of the day for a window crossing midnight', () => {
		const day = stripDay({ type: 'windows', windows: [{ start: '22:00', end: '06:00' }] });
		expect(day.cells[slot('22:00')]).toBe(1);
		expect(day.cells[95]).toBe(1);
		expect(day.cells[0]).toBe(1);
		expect(day.cells[slot('05:45')]).toBe(1);
		expect(day.cells[slot('06:00')]).toBe(0);
		expect(day.cells[slot('21:45')]).toBe(0);
		expect(lit(day.cells)).toHaveLength(32);
	});

	it('shades a cycle by its on-fraction inside its windows', () => {
		const day = stripDay({
			type: 'cycle',
			onMinutes: 15,
			offMinutes: 45,
			windows: [{ start: '08:00', end: '10:00' }]
		});
		expect(day.cells[slot('08:00')]).toBe(0.25);
		expect(day.cells[slot('10:00')]).toBe(0);
		expect(lit(day.cells)).toHaveLength(8);
		expect(day.spread).toBe(true);
	});

	it('shades a cycle without windows over the whole day', () => {
		expect(new Set(stripDay({ type: 'cycle', onMinutes: 10, offMinutes: 30 }).cells)).toEqual(
			new Set([0.25])
		);
	});

	it('spreads runs over their windows', () => {
		const day = stripDay({
			type: 'runs',
			runsPerDay: 4,
			minutesPerRun: 15,
			windows: [{ start: '06:00', end: '08:00' }]
		});
		expect(day.cells[slot('06:00')]).toBe(0.5);
		expect(lit(day.cells)).toHaveLength(8);
	});

	it('caps runs that do not fit at the full window, as the schema refuses them anyway', () => {
		const day = stripDay({
			type: 'runs',
			runsPerDay: 10,
			minutesPerRun: 60,
			windows: [{ start: '06:00', end: '07:00' }]
		});
		expect(Math.max(...day.cells)).toBe(1);
	});

	it('draws a half-typed schedule as off, never NaN', () => {
		const broken = [
			{ type: 'hours', hoursPerDay: undefined },
			{ type: 'cycle', onMinutes: 0, offMinutes: 0 },
			{ type: 'runs', runsPerDay: Number.NaN, minutesPerRun: 5 },
			{ type: 'windows', windows: [] }
		] as unknown as ScheduleInput[];
		for (const schedule of broken) {
			expect(stripDay(schedule).cells.every((fraction) => fraction === 0)).toBe(true);
		}
		expect(stripDay(undefined).cells).toHaveLength(96);
	});
});

describe('drawing the strip', () => {
	it('draws an always-on day as one segment over all 96 quarter hours', () => {
		expect(stripSegments(stripDay({ type: 'always' }).cells)).toEqual([
			{ start: 0, length: 96, fraction: 1 }
		]);
	});

	it('draws a window crossing midnight as on, off, on', () => {
		const cells = stripDay({ type: 'windows', windows: [{ start: '22:00', end: '06:00' }] }).cells;
		expect(stripSegments(cells)).toEqual([
			{ start: 0, length: 24, fraction: 1 },
			{ start: 24, length: 64, fraction: 0 },
			{ start: 88, length: 8, fraction: 1 }
		]);
	});

	it('covers every cell exactly once', () => {
		const cells = stripDay({
			type: 'cycle',
			onMinutes: 5,
			offMinutes: 10,
			windows: [{ start: '01:15', end: '02:00' }]
		}).cells;
		const segments = stripSegments(cells);
		expect(segments.reduce((sum, segment) => sum + segment.length, 0)).toBe(96);
		segments.forEach((segment, i) =>
			expect(segment.start).toBe(i === 0 ? 0 : segments[i - 1]!.start + segments[i - 1]!.length)
		);
	});
});

describe('shading and words', () => {
	it('leaves off cells empty, fills whole-time cells and hatches part-time ones with a visible share', () => {
		expect(cellFill(0)).toEqual({ kind: 'off', heightPercent: 0 });
		expect(cellFill(1)).toEqual({ kind: 'on', heightPercent: 100 });
		expect(cellFill(0.5)).toEqual({ kind: 'part', heightPercent: 50 });
		expect(cellFill(1 / 24)).toEqual({ kind: 'part', heightPercent: 15 });
		expect(cellFill(Number.NaN).kind).toBe('off');
	});

	it('draws triggered runs as a running share, not as off, and says it in words', () => {
		// 4 runs of 15 min spread over 24 h: 60 of 1,440 min, 2.5 min of each hour.
		const schedule: ScheduleInput = { type: 'runs', runsPerDay: 4, minutesPerRun: 15, days: 'all' };
		const day = stripDay(schedule);
		expect(stripSegments(day.cells).map((segment) => cellFill(segment.fraction).kind)).toEqual(['part']);
		expect(stripLegend(schedule, day)).toBe('Runs when triggered, about 2.5 min an hour');
	});

	it('gives runs inside a window their minutes of the window’s hours', () => {
		// 4 runs of 15 min inside 06:00–08:00: 60 of 120 min, 30 min an hour.
		const schedule: ScheduleInput = {
			type: 'runs',
			runsPerDay: 4,
			minutesPerRun: 15,
			windows: [{ start: '06:00', end: '08:00' }],
			days: 'all'
		};
		expect(stripLegend(schedule, stripDay(schedule))).toBe('Runs when triggered, about 30 min an hour');
	});

	it('says the share of a cycle or of hours spread over the day', () => {
		const cycle: ScheduleInput = { type: 'cycle', onMinutes: 15, offMinutes: 45, days: 'all' };
		expect(stripLegend(cycle, stripDay(cycle))).toBe('Runs part of each hour, about 15 min an hour');
		const hours: ScheduleInput = { type: 'hours', hoursPerDay: 8, days: 'all' };
		expect(stripLegend(hours, stripDay(hours))).toBe('Runs part of each hour, about 20 min an hour');
	});

	it('scales the day by a duty cycle below 100 %: a heater always on at 35 % duty', () => {
		const day = stripDay({ type: 'always' }, 35);
		expect(new Set(day.cells)).toEqual(new Set([0.35]));
		expect(stripLegend({ type: 'always' }, day)).toBe('Runs part of each hour, about 21 min an hour');
		expect(stripDay({ type: 'always' }, 100).cells.every((fraction) => fraction === 1)).toBe(true);
		expect(stripDay({ type: 'always' }, undefined).cells.every((fraction) => fraction === 1)).toBe(true);
	});

	it('has no legend for a day drawn solid or empty', () => {
		expect(stripLegend({ type: 'always' }, stripDay({ type: 'always' }))).toBeNull();
		const windows: ScheduleInput = {
			type: 'windows',
			windows: [{ start: '06:00', end: '18:00' }],
			days: 'all'
		};
		expect(stripLegend(windows, stripDay(windows))).toBeNull();
	});

	it.each<[ScheduleInput, string]>([
		[{ type: 'always' }, 'Always on'],
		[{ type: 'hours', hoursPerDay: 8, days: 'weekdays' }, '8 h a day, spread over the day, weekdays'],
		[{ type: 'windows', windows: [{ start: '22:00', end: '06:00' }] }, '22:00–06:00'],
		[{ type: 'cycle', onMinutes: 15, offMinutes: 45 }, 'On 15 min, off 45 min, spread over the day'],
		[
			{
				type: 'runs',
				runsPerDay: 4,
				minutesPerRun: 30,
				windows: [{ start: '06:00', end: '10:00' }],
				days: 'weekends'
			},
			'4 runs of 30 min a day, spread over 06:00–10:00, weekends'
		]
	])('says %j as "%s"', (schedule, words) => {
		expect(scheduleSummary(schedule)).toBe(words);
	});
});

describe('switching the kind of schedule', () => {
	it('gives a valid schedule of every kind', () => {
		for (const { kind } of SCHEDULE_KINDS) {
			const schedule = switchSchedule({ type: 'always' }, kind);
			expect(schedule.type).toBe(kind);
			expect(equipmentSchema.safeParse({ ...blankDevice(), schedule }).success).toBe(true);
		}
	});

	it('keeps the days and windows of the schedule it replaces', () => {
		const windows = [{ start: '20:00', end: '23:00' }];
		expect(switchSchedule({ type: 'windows', windows, days: 'weekends' }, 'runs')).toEqual({
			type: 'runs',
			runsPerDay: 4,
			minutesPerRun: 15,
			windows,
			days: 'weekends'
		});
	});

	it('lists the quarter hours, with 24:00 only as an end', () => {
		expect(quarterHours()).toHaveLength(96);
		expect(quarterHours()[1]).toBe('00:15');
		expect(quarterHours(true).at(-1)).toBe('24:00');
	});
});
