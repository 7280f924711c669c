import { describe, expect, it } from 'vitest';
import type { Schedule } from '$lib/calc';
import { holidaysText, scheduleText } from './device-words';

describe('schedules in words', () => {
	it.each<[Schedule, string]>([
		[{ type: 'always' }, 'Always on'],
		[{ type: 'hours', hoursPerDay: 8.5, days: 'weekdays' }, '8.5 hours a day, on weekdays'],
		[
			{ type: 'windows', windows: [{ start: '22:00', end: '06:00' }], days: 'all' },
			'On 22:00–06:00, every day'
		],
		[{ type: 'cycle', onMinutes: 15, offMinutes: 45, days: 'all' }, '15 min on / 45 min off, every day'],
		[
			{
				type: 'runs',
				runsPerDay: 4,
				minutesPerRun: 30,
				windows: [{ start: '08:00', end: '16:00' }],
				days: 'weekends'
			},
			'4 runs of 30 min a day within 08:00–16:00, on weekends'
		]
	])('%j reads "%s"', (schedule, words) => {
		expect(scheduleText(schedule)).toBe(words);
	});
});

describe('holiday calendars in words', () => {
	it('name the country and region', () => {
		expect(holidaysText({ country: 'US', region: 'TX' })).toBe(
			'Public holidays of US-TX, as the date-holidays package lists them'
		);
	});
	it('list explicit dates', () => {
		expect(holidaysText({ dates: ['2027-07-05'] })).toBe('Holidays listed: 2027-07-05');
	});
	it('say when there are none', () => {
		expect(holidaysText(null)).toBe('No public holidays');
	});
});
