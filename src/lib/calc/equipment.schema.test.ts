import { describe, expect, it } from 'vitest';
import { type Edit, issuesAfter, setDevice } from './requests.fixture';

const windows = (start: string, end: string) => ({ type: 'windows', windows: [{ start, end }] });
const runs = { type: 'runs', runsPerDay: 5, minutesPerRun: 30, windows: [{ start: '06:00', end: '08:00' }] };
const manyDevices: Edit = (input) => {
	input.equipment = Array.from({ length: 2001 }, () => input.equipment[0] ?? {});
};

describe('bad equipment', () => {
	it.each<[string, Edit, string, string]>([
		[
			'negative amps',
			setDevice({ power: { amps: -1, volts: 120 } }),
			'power.amps',
			'Amps must be zero or more'
		],
		['NaN watts', setDevice({ power: { watts: NaN } }), 'power.watts', 'Watts must be a number'],
		[
			'infinite volts',
			setDevice({ power: { amps: 1, volts: Infinity } }),
			'power.volts',
			'Volts must be a number'
		],
		[
			'too many watts',
			setDevice({ power: { watts: 2e7 } }),
			'power.watts',
			'Watts must be at most 10,000,000'
		],
		['zero volts', setDevice({ power: { amps: 1, volts: 0 } }), 'power.volts', 'Volts must be at least 1'],
		[
			'a zero power factor',
			setDevice({ power: { amps: 1, volts: 120, powerFactor: 0 } }),
			'power.powerFactor',
			'Power factor must be more than 0'
		],
		[
			'two phases',
			setDevice({ power: { amps: 1, volts: 120, phases: 2 } }),
			'power.phases',
			'Phases must be 1 or 3'
		],
		['a fractional quantity', setDevice({ quantity: 1.5 }), 'quantity', 'Quantity must be a whole number'],
		['too many units', setDevice({ quantity: 10_001 }), 'quantity', 'Quantity must be at most 10,000'],
		['duty over 100', setDevice({ dutyPercent: 120 }), 'dutyPercent', 'Duty percent must be at most 100'],
		[
			'negative standby',
			setDevice({ standbyWatts: -1 }),
			'standbyWatts',
			'Standby watts must be zero or more'
		],
		[
			'an unknown category',
			setDevice({ category: 'pond' }),
			'category',
			'Category must be one of: water-pump, air-pump, aerator, lighting, heater, chiller, uv, fan, controls, other'
		],
		['month 13', setDevice({ months: [12, 13] }), 'months.1', 'Months must be from 1 to 12'],
		['a month twice', setDevice({ months: [3, 3] }), 'months.1', 'Month 3 is listed twice'],
		['a life of 0 years', setDevice({ lifeYears: 0 }), 'lifeYears', 'Life in years must be at least 1']
	])('reports %s at its path', (_case, edit, path, message) => {
		expect(issuesAfter(edit)).toContainEqual({ path: `equipment.0.${path}`, message });
	});

	it('refuses more than 2000 devices', () => {
		expect(issuesAfter(manyDevices)).toEqual([
			{ path: 'equipment', message: 'Equipment can have at most 2,000 entries' }
		]);
	});
});

describe('bad schedules', () => {
	it.each<[string, unknown, string, string]>([
		['a missing schedule', undefined, '', 'Schedule is required'],
		[
			'an unknown type',
			{ type: 'sometimes' },
			'.type',
			'Schedule type must be one of: always, hours, windows, cycle, runs'
		],
		[
			'25 hours a day',
			{ type: 'hours', hoursPerDay: 25 },
			'.hoursPerDay',
			'Hours per day must be at most 24'
		],
		[
			'a time off the grid',
			windows('06:10', '18:00'),
			'.windows.0.start',
			'Start must be on a quarter hour (:00, :15, :30 or :45)'
		],
		[
			'a start at 24:00',
			windows('24:00', '06:00'),
			'.windows.0.start',
			'Start must be a time like 06:00 (HH:MM, 24-hour clock)'
		],
		[
			'an empty window',
			windows('06:00', '06:00'),
			'.windows.0.end',
			'A window must end at a different time than it starts'
		],
		['no windows', { type: 'windows', windows: [] }, '.windows', 'Windows must not be empty'],
		[
			'runs longer than their windows',
			runs,
			'',
			'5 runs of 30 minutes (150 minutes) do not fit in the 120 minutes of the windows'
		],
		[
			'a cycle of nothing',
			{ type: 'cycle', onMinutes: 0, offMinutes: 0 },
			'.offMinutes',
			'On and off minutes cannot both be zero'
		]
	])('reports %s at the schedule', (_case, schedule, path, message) => {
		expect(issuesAfter(setDevice({ schedule }))).toContainEqual({
			path: `equipment.0.schedule${path}`,
			message
		});
	});

	it('accepts 24:00 as the end of a window', () => {
		expect(issuesAfter(setDevice({ schedule: windows('18:00', '24:00') }))).toEqual([]);
	});
});
