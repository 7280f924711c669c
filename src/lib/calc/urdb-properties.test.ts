import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tariffFromUrdb } from './urdb-import';
import { urdbRateSchema } from './urdb.schema';
import { steady, total } from './urdb.fixture';

/** A 12 × 24 grid of period indexes below `periods`; months repeat a few rows, as real rates do. */
const gridArb = (periods: number) =>
	fc
		.array(fc.array(fc.integer({ min: 0, max: periods - 1 }), { minLength: 24, maxLength: 24 }), {
			minLength: 1,
			maxLength: 4
		})
		.chain((rows) => fc.array(fc.constantFrom(...rows), { minLength: 12, maxLength: 12 }));

/** Random schedules and prices (whole tenths of a cent per kWh) of one to four periods. */
const scheduleArb = fc.integer({ min: 1, max: 4 }).chain((periods) =>
	fc.record({
		prices: fc.array(
			fc.integer({ min: 0, max: 500 }).map((mills) => mills / 1000),
			{
				minLength: periods,
				maxLength: periods
			}
		),
		weekday: gridArb(periods),
		weekend: gridArb(periods)
	})
);

/** The year's cost of 1 kWh every hour, price looked up in the grids hour by hour (UTC, no holidays). */
function hourByHour(year: number, prices: number[], weekday: number[][], weekend: number[][]) {
	let sum = 0;
	for (let t = Date.UTC(year, 0, 1); t < Date.UTC(year + 1, 0, 1); t += 3_600_000) {
		const date = new Date(t);
		const grid = date.getUTCDay() === 0 || date.getUTCDay() === 6 ? weekend : weekday;
		sum += prices[grid[date.getUTCMonth()]![date.getUTCHours()]!]!;
	}
	return sum;
}

describe('a time-of-use rate from random 12 × 24 schedules', () => {
	it('prices a steady 1 kW over a year as summing the schedules’ price hour by hour', () => {
		fc.assert(
			fc.property(scheduleArb, ({ prices, weekday, weekend }) => {
				const { tariff, notes } = tariffFromUrdb(
					urdbRateSchema.parse({
						energyratestructure: prices.map((rate) => [{ rate }]),
						energyweekdayschedule: weekday,
						energyweekendschedule: weekend
					})
				);
				expect(notes).toEqual([]);
				const billed = total(steady(tariff, 1, '2017-01'), 'energy');
				// Twelve energy lines, each rounded to the cent: at most 6 cents apart.
				expect(Math.abs(billed - hourByHour(2017, prices, weekday, weekend))).toBeLessThanOrEqual(0.06);
			}),
			{ numRuns: 25 }
		);
	});
});
