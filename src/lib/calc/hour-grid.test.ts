import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { gridSeasons, hourWindows, periodAt, type HourGrid } from './hour-grid';

/** A sample rate of the open rate database (a public record; see tests/fixtures/urdb/README.md). */
function sample(name: string) {
	const json = JSON.parse(
		readFileSync(new URL(`../../../tests/fixtures/urdb/${name}`, import.meta.url), 'utf8')
	);
	return (json.items?.[0] ?? json) as {
		energyweekdayschedule: number[][];
		energyweekendschedule: number[][];
	};
}

describe('hours as windows', () => {
	it('makes one window of a run of hours and joins runs across midnight', () => {
		expect(hourWindows([14, 15, 16, 17, 18])).toEqual([{ start: '14:00', end: '19:00' }]);
		expect(hourWindows([22, 23, 0, 1])).toEqual([{ start: '22:00', end: '02:00' }]);
		expect(hourWindows([7, 8, 17, 18, 19])).toEqual([
			{ start: '07:00', end: '09:00' },
			{ start: '17:00', end: '20:00' }
		]);
		expect(hourWindows([23])).toEqual([{ start: '23:00', end: '24:00' }]);
		expect(hourWindows(Array.from({ length: 24 }, (_, h) => h))).toEqual([{ start: '00:00', end: '24:00' }]);
	});
});

const grid = (rows: number[][]): HourGrid => rows;

describe('an hour-by-month schedule as seasons, periods and windows', () => {
	it("converts the sample time-of-use rate's summer and winter exactly", () => {
		const rate = sample('georgia-power-tou-reo-2013.json');
		const seasons = gridSeasons(rate.energyweekdayschedule, rate.energyweekendschedule);
		expect(seasons.flatMap((s) => s.months).sort((a, b) => a - b)).toEqual([
			1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12
		]);
		for (let month = 1; month <= 12; month++)
			for (let hour = 0; hour < 24; hour++) {
				expect(periodAt(seasons, month, false, hour)).toBe(rate.energyweekdayschedule[month - 1]![hour]);
				expect(periodAt(seasons, month, true, hour)).toBe(rate.energyweekendschedule[month - 1]![hour]);
			}
	});

	it('gives every hour of any grid the period the grid gives it (property)', () => {
		const row = fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 24, maxLength: 24 });
		const twelve = fc.array(row, { minLength: 12, maxLength: 12 });
		fc.assert(
			fc.property(twelve, twelve, (weekday, weekend) => {
				const seasons = gridSeasons(grid(weekday), grid(weekend));
				for (let month = 1; month <= 12; month++)
					for (let hour = 0; hour < 24; hour++) {
						expect(periodAt(seasons, month, false, hour)).toBe(weekday[month - 1]![hour]);
						expect(periodAt(seasons, month, true, hour)).toBe(weekend[month - 1]![hour]);
					}
			}),
			{ numRuns: 100 }
		);
	});

	it('makes one season of months with the same rows, and the most-used period its other rate', () => {
		const flat = Array.from({ length: 24 }, () => 0);
		const peak = flat.map((_, h) => (h >= 14 && h < 19 ? 1 : 0));
		const weekday = [...Array(5).fill(flat), ...Array(4).fill(peak), ...Array(3).fill(flat)];
		const seasons = gridSeasons(weekday, Array(12).fill(flat));
		expect(seasons.map((s) => s.months)).toEqual([
			[1, 2, 3, 4, 5, 10, 11, 12],
			[6, 7, 8, 9]
		]);
		expect(seasons[1]).toEqual({
			months: [6, 7, 8, 9],
			otherIndex: 0,
			periods: [{ index: 1, days: 'weekdays', windows: [{ start: '14:00', end: '19:00' }] }]
		});
	});
});
