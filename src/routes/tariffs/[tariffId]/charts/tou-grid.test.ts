import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { OTHER_TIMES, priceRuns, rateRange, seasonGrid, seasonPrices, touGrids } from './tou-grid';

// Invented tariffs for these tests only; no real utility or rate. Slot n is the quarter hour that
// starts n × 15 minutes after midnight (the core's 15-minute grid, issue 3).

type Season = Parameters<typeof seasonGrid>[0];

const summer: Season = {
	months: [6, 7, 8, 9],
	periods: [
		{ label: 'On-peak', perKwh: 0.32, days: 'weekdays', windows: [{ start: '16:00', end: '21:00' }] },
		{ label: 'Night', perKwh: 0.06, windows: [{ start: '22:00', end: '06:00' }] }
	],
	otherPerKwh: 0.12
};
const winter: Season = { months: [10, 11, 12, 1, 2, 3, 4, 5], periods: [], otherPerKwh: 0.1 };

const tariff: TariffInput = {
	currency: 'USD',
	energyCharges: [
		{ label: 'Delivery', type: 'flat', perKwh: 0.04 },
		{ label: 'Supply', type: 'tou', seasons: [summer, winter] }
	]
};

const slotOf = (hhmm: string) => (Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3))) / 15;

describe('a season with a weekday peak and a night window across midnight', () => {
	const [weekday, weekend] = seasonGrid(summer).rows;

	it('has 96 quarter hours for each kind of day', () => {
		expect(weekday?.slots).toHaveLength(96);
		expect(weekend?.slots).toHaveLength(96);
	});

	it.each([
		{ time: '00:00', label: 'Night', perKwh: 0.06 },
		{ time: '05:45', label: 'Night', perKwh: 0.06 },
		{ time: '06:00', label: OTHER_TIMES, perKwh: 0.12 },
		{ time: '15:45', label: OTHER_TIMES, perKwh: 0.12 },
		{ time: '16:00', label: 'On-peak', perKwh: 0.32 },
		{ time: '20:45', label: 'On-peak', perKwh: 0.32 },
		{ time: '21:00', label: OTHER_TIMES, perKwh: 0.12 },
		{ time: '22:00', label: 'Night', perKwh: 0.06 },
		{ time: '23:45', label: 'Night', perKwh: 0.06 }
	])('prices a weekday at $time as $label', ({ time, label, perKwh }) => {
		expect(weekday?.slots[slotOf(time)]).toMatchObject({ label, perKwh });
	});

	it('leaves the weekday peak out of weekends', () => {
		expect(weekend?.slots[slotOf('17:00')]).toEqual({ label: OTHER_TIMES, perKwh: 0.12, period: null });
	});

	it('merges quarter hours into runs, the night window at both ends of the day', () => {
		const runs = priceRuns(weekday ?? { dayType: 'weekday', slots: [] });
		expect(runs.map((run) => [run.startHour, run.endHour, run.label])).toEqual([
			[0, 6, 'Night'],
			[6, 16, OTHER_TIMES],
			[16, 21, 'On-peak'],
			[21, 22, OTHER_TIMES],
			[22, 24, 'Night']
		]);
	});

	it('lists the prices it shows, dearest first', () => {
		expect(seasonPrices(seasonGrid(summer)).map((price) => price.label)).toEqual([
			'On-peak',
			OTHER_TIMES,
			'Night'
		]);
	});
});

describe('periods that overlap', () => {
	it('gives the quarter hour to the first matching period, as the calculation does', () => {
		const season: Season = {
			months: [1],
			periods: [
				{ label: 'First', perKwh: 0.2, windows: [{ start: '08:00', end: '12:00' }] },
				{ label: 'Second', perKwh: 0.3, windows: [{ start: '10:00', end: '14:00' }] }
			],
			otherPerKwh: 0.1
		};
		const [weekday] = seasonGrid(season).rows;
		expect(weekday?.slots[slotOf('11:00')]?.label).toBe('First');
		expect(weekday?.slots[slotOf('13:00')]?.label).toBe('Second');
	});
});

describe('a season without periods', () => {
	it('is one run at the other rate on both kinds of day', () => {
		const rows = seasonGrid(winter).rows.map(priceRuns);
		expect(rows).toEqual([
			[{ label: OTHER_TIMES, perKwh: 0.1, period: null, dayType: 'weekday', startHour: 0, endHour: 24 }],
			[{ label: OTHER_TIMES, perKwh: 0.1, period: null, dayType: 'weekend', startHour: 0, endHour: 24 }]
		]);
	});
});

describe('touGrids over a tariff', () => {
	it('keeps only the time-of-use charges, with their seasons in order', () => {
		const grids = touGrids(tariff);
		expect(grids.map((grid) => grid.label)).toEqual(['Supply']);
		expect(grids[0]?.seasons.map((season) => season.months)).toEqual([summer.months, winter.months]);
	});

	it('finds nothing in a tariff without time-of-use charges', () => {
		expect(
			touGrids({ currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.2 }] })
		).toEqual([]);
	});

	it('spans the cheapest and dearest rate shown', () => {
		expect(rateRange(touGrids(tariff))).toEqual([0.06, 0.32]);
		expect(rateRange([])).toEqual([0, 0]);
	});
});
