import { describe, expect, it } from 'vitest';
import { calculate } from './calculate';
import { parseRequest } from './parse';
import { calculateRequestSchema } from './request.schema';
import { tariffSchema } from './tariff.schema';
import { total } from './urdb.fixture';

/** An invented off-peak demand charge: weekday nights (20:00–15:00) and whole weekend days, 10 $/kW. */
const offPeak = {
	label: 'Off-peak demand',
	perKw: 10,
	intervalMinutes: 60,
	windows: [{ start: '20:00', end: '15:00' }],
	weekendWindows: [{ start: '00:00', end: '24:00' }]
};

/**
 * June 2027 (the 1st a Tuesday) in UTC: 1 kW every hour, 50 kW on Tuesday the 1st at 17:00 (weekday
 * afternoon, outside the charge) and 8 kW at 17:00 on `day` (the 5th is a Saturday, the 9th a Wednesday).
 */
function demandCost(charge: object, day: number, holidays: unknown = null, holidaysAsWeekends = true) {
	const kwh = Array.from({ length: 30 * 24 }, () => 1);
	kwh[17] = 50;
	kwh[(day - 1) * 24 + 17] = 8;
	const request = calculateRequestSchema.parse({
		period: { start: '2027-06', months: 1 },
		timezone: 'UTC',
		holidays,
		tariff: { currency: 'USD', holidaysAsWeekends, demandCharges: [charge] },
		meter: { start: '2027-06-01T00:00', intervalMinutes: 60, kwh }
	});
	return total(calculate(request).periods, 'demand');
}

describe('a demand charge with other hours at weekends', () => {
	it('measures weekday nights and the whole Saturday: the Saturday 17:00 peak is billed', () => {
		// Derived: one peak over both, 8 kW × 10 $/kW = 80.00; the Tuesday 17:00 50 kW is outside the hours.
		expect(demandCost(offPeak, 5)).toBeCloseTo(80, 9);
		// Without weekend windows, Saturday is measured in the weekday windows: 17:00 is outside, 1 kW.
		expect(demandCost({ ...offPeak, weekendWindows: undefined }, 5)).toBeCloseTo(10, 9);
	});

	it('measures a holiday the tariff prices as a weekend in the weekend windows', () => {
		const holidays = { dates: ['2027-06-09'] };
		// Derived: Wednesday the 9th is a holiday priced as a weekend, so its 17:00 8 kW counts: 80.00.
		expect(demandCost(offPeak, 9, holidays)).toBeCloseTo(80, 9);
		// A tariff that prices holidays as ordinary days measures it in the weekday windows: 1 kW, 10.00.
		expect(demandCost(offPeak, 9, holidays, false)).toBeCloseTo(10, 9);
	});
});

describe('validation of weekend windows', () => {
	const issuesOf = (charge: object) => {
		const result = parseRequest(tariffSchema, { currency: 'USD', demandCharges: [charge] });
		return result.success ? [] : result.error.issues;
	};

	it('accepts a whole weekend day as 00:00–24:00', () => {
		expect(issuesOf(offPeak)).toEqual([]);
	});

	it('needs a charge measured every day', () => {
		expect(issuesOf({ ...offPeak, days: 'weekdays' })).toEqual([
			{
				path: 'demandCharges.0.weekendWindows',
				message: 'Other hours at weekends need a charge measured every day'
			}
		]);
	});

	it('needs the weekday hours too', () => {
		expect(issuesOf({ ...offPeak, windows: undefined })).toEqual([
			{
				path: 'demandCharges.0.weekendWindows',
				message: 'Other hours at weekends need the hours measured on weekdays too'
			}
		]);
	});

	it('keeps 60-minute demand on the hour at weekends too', () => {
		expect(issuesOf({ ...offPeak, weekendWindows: [{ start: '08:30', end: '24:00' }] })).toEqual([
			{
				path: 'demandCharges.0.weekendWindows.0.start',
				message: 'Windows of 60-minute demand must start and end on the hour'
			}
		]);
	});
});
