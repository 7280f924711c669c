import { describe, expect, it } from 'vitest';
import { type ScheduleInput } from './schedule-strip';
import { kwhText, moneyFormat, monthsText, powerText, runningText } from './readout-text';

// Invented figures; three-phase watts by P = √3 × V × I × PF (the usual handbook formula).

describe('figures for the share of a device', () => {
	it('rounds kWh to one decimal below 100 and to whole numbers above', () => {
		expect(kwhText(12.345)).toBe('12.3');
		expect(kwhText(1234.5)).toBe('1,235');
	});

	it('formats money in the scenario currency', () => {
		expect(moneyFormat('USD')(29.376)).toBe('$29.38');
		expect(moneyFormat('EUR')(3)).toBe('€3.00');
	});

	it('falls back to plain figures for a code the browser does not know', () => {
		expect(moneyFormat('not a code')(2.5)).toBe('2.5 not a code');
	});
});

describe('a device as a viewer reads it', () => {
	it('gives the power as it was entered, with its watts', () => {
		expect(powerText({ watts: 100 })).toBe('100 W');
		expect(powerText({ amps: 10, volts: 230, powerFactor: 0.8, phases: 3 })).toBe(
			'10 A × 230 V, power factor 0.8, three phase (≈ 3,187 W)'
		);
		expect(powerText({ amps: 1, volts: 120, powerFactor: 1, phases: 1 })).toBe('1 A × 120 V (≈ 120 W)');
	});

	it('names the active months', () => {
		expect(monthsText(undefined)).toBe('All year');
		expect(monthsText([1, 2, 12])).toBe('December–February');
		expect(monthsText([5, 6, 7, 8, 9, 10, 11])).toBe('May–November');
		expect(monthsText([])).toBe('No months');
	});
});

describe('how a device runs, in the words of its row', () => {
	// Invented devices; the wording is the app's own. May–November is seven months.
	const MAY_TO_NOV = [5, 6, 7, 8, 9, 10, 11];
	const SCHEDULES: [string, ScheduleInput, string][] = [
		['always on', { type: 'always' }, 'Always on'],
		['hours a day', { type: 'hours', hoursPerDay: 8, days: 'all' }, '8 h a day, spread over the day'],
		[
			'time windows',
			{ type: 'windows', windows: [{ start: '06:00', end: '18:00' }], days: 'weekdays' },
			'06:00–18:00, weekdays'
		],
		[
			'an on/off cycle',
			{ type: 'cycle', onMinutes: 15, offMinutes: 45, days: 'all' },
			'On 15 min, off 45 min, spread over the day'
		],
		[
			'triggered runs',
			{ type: 'runs', runsPerDay: 4, minutesPerRun: 15, days: 'all' },
			'4 runs of 15 min a day, spread over the day'
		]
	];

	it('reads a heater at 35 % duty in seven months as the share of the time and the months, not "Always on"', () => {
		const heater = { schedule: { type: 'always' } as const, dutyPercent: 35, months: MAY_TO_NOV };
		expect(runningText(heater)).toBe('35 % of the time, May–November');
	});

	describe.each(SCHEDULES)('%s', (_kind, schedule, words) => {
		const always = schedule.type === 'always';
		it('all year at full duty: the schedule alone', () => {
			expect(runningText({ schedule })).toBe(words);
			expect(runningText({ schedule, dutyPercent: 100 })).toBe(words);
		});
		it('in some months: the months after the schedule', () => {
			expect(runningText({ schedule, months: MAY_TO_NOV })).toBe(`${words}, May–November`);
			expect(runningText({ schedule, months: [12, 1, 2] })).toBe(`${words}, December–February`);
		});
		it('at part duty: the duty said', () => {
			expect(runningText({ schedule, dutyPercent: 35 })).toBe(
				always ? '35 % of the time' : `${words}, at 35 % duty`
			);
		});
		it('at part duty in some months: both', () => {
			expect(runningText({ schedule, dutyPercent: 35, months: [7] })).toBe(
				always ? '35 % of the time, July' : `${words}, at 35 % duty, July`
			);
		});
	});

	it('counts a duty box being typed (empty, not a number) as full time, and says an empty month list', () => {
		const schedule = { type: 'always' } as const;
		expect(runningText({ schedule, dutyPercent: undefined })).toBe('Always on');
		expect(runningText({ schedule, dutyPercent: 'abc' as unknown as number })).toBe('Always on');
		expect(runningText({ schedule, months: [] })).toBe('Always on, no months');
		expect(runningText({ schedule, months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12] })).toBe('Always on');
	});
});
