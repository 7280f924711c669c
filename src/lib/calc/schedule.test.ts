import { describe, expect, it } from 'vitest';
import { INTERVAL_HOURS } from './clock';
import { STANDARD_DAY } from './day-shapes';
import { dayShapes } from './zone-days';
import { dayNumber } from './dates';
import { scheduleSchema } from './equipment.schema';
import { dayProfile } from './schedule';

const chicagoDay = (date: string) => {
	const [shape] = dayShapes('America/Chicago', dayNumber(date), dayNumber(date));
	if (!shape) throw new Error('no shape');
	return shape;
};
const SPRING = chicagoDay('2027-03-14');
const FALL = chicagoDay('2027-11-07');

function profile(schedule: unknown, weekend = false, shape = STANDARD_DAY) {
	return dayProfile(scheduleSchema.parse(schedule), weekend, shape);
}

const mayRunHours = (result: ReturnType<typeof profile>) =>
	result.mayRun.reduce((sum, flag) => sum + flag, 0) * INTERVAL_HOURS;

describe('an always-on device', () => {
	it.each([
		['an ordinary day', STANDARD_DAY, 24],
		['the spring-forward day', SPRING, 23],
		['the fall-back day', FALL, 25]
	])('runs every hour of %s', (_day, shape, hours) => {
		expect(profile({ type: 'always' }, false, shape).onHours).toBe(hours);
	});
});

describe('a device run some hours a day', () => {
	it('spreads its hours evenly, so a 25-hour day still gives 8 hours', () => {
		const result = profile({ type: 'hours', hoursPerDay: 8 }, false, FALL);
		expect(result.onHours).toBeCloseTo(8, 12);
		expect(result.onFraction[0]).toBeCloseTo(8 / 25, 12);
	});

	it('runs only on its selected days', () => {
		expect(profile({ type: 'hours', hoursPerDay: 8, days: 'weekdays' }, true).onHours).toBe(0);
		expect(profile({ type: 'hours', hoursPerDay: 8, days: 'weekends' }, true).onHours).toBeCloseTo(8, 12);
	});

	it('may run in every interval of its days (the worst case for demand)', () => {
		expect(mayRunHours(profile({ type: 'hours', hoursPerDay: 2 }))).toBe(24);
	});
});

describe('a device on time windows', () => {
	it('runs inside a window that crosses midnight, at both ends of the day', () => {
		const result = profile({ type: 'windows', windows: [{ start: '22:00', end: '06:00' }] });
		expect(result.onHours).toBe(8);
		expect(result.onFraction[0]).toBe(1);
		expect(result.onFraction[24]).toBe(0);
		expect(result.onFraction[95]).toBe(1);
	});

	it('counts real instants: 7 hours on the spring-forward night, 9 on the fall-back night', () => {
		const night = { type: 'windows', windows: [{ start: '22:00', end: '06:00' }] };
		expect(profile(night, true, SPRING).onHours).toBe(7);
		expect(profile(night, true, FALL).onHours).toBe(9);
	});

	it('joins overlapping windows instead of counting them twice', () => {
		const windows = [
			{ start: '06:00', end: '12:00' },
			{ start: '10:00', end: '14:00' }
		];
		expect(profile({ type: 'windows', windows }).onHours).toBe(8);
	});

	it('runs to the end of the day with an end of 24:00', () => {
		expect(profile({ type: 'windows', windows: [{ start: '18:00', end: '24:00' }] }).onHours).toBe(6);
	});
});

describe('a cycling device', () => {
	it('runs on/(on+off) of each interval inside its windows', () => {
		const result = profile({
			type: 'cycle',
			onMinutes: 15,
			offMinutes: 45,
			windows: [{ start: '06:00', end: '18:00' }]
		});
		expect(result.onHours).toBe(3);
		expect(mayRunHours(result)).toBe(12);
	});

	it('cycles all day without windows', () => {
		expect(profile({ type: 'cycle', onMinutes: 10, offMinutes: 20 }).onHours).toBeCloseTo(8, 12);
	});
});

describe('a device with triggered runs', () => {
	it('spreads runs × minutes evenly over its windows', () => {
		const result = profile({
			type: 'runs',
			runsPerDay: 4,
			minutesPerRun: 30,
			windows: [{ start: '08:00', end: '18:00' }]
		});
		expect(result.onHours).toBeCloseTo(2, 12);
		expect(result.onFraction[40]).toBeCloseTo(0.2, 12);
		expect(mayRunHours(result)).toBe(10);
	});

	it('runs the whole window when a spring-forward day shortens it', () => {
		const runs = {
			type: 'runs',
			runsPerDay: 3,
			minutesPerRun: 30,
			windows: [{ start: '01:00', end: '03:00' }]
		};
		expect(profile(runs, true, SPRING).onHours).toBe(1);
	});
});
