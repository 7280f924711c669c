import Holidays from 'date-holidays';
import { DateTime, Interval } from 'luxon';
import { describe, expect, it } from 'vitest';
import { buildCalendar } from './calendar';
import { dayShapes } from './zone-days';
import { dayNumber } from './dates';
import { billingSpans } from './periods';

/** Reference: Luxon's own Interval length from local midnight on the 1st to the next month's 1st. */
function luxonHours(timezone: string, year: number, month: number): number {
	const start = DateTime.fromObject({ year, month, day: 1 }, { zone: timezone });
	return Interval.fromDateTimes(start, start.plus({ months: 1 })).length('hours');
}

function monthHours(timezone: string, start: string): number {
	const [span] = buildCalendar(timezone, null, billingSpans({ start, months: 1 })).spans;
	return span?.hours ?? NaN;
}

describe('hours per local month across daylight-saving changes', () => {
	it.each([
		['America/Chicago', 2027, 3],
		['America/Chicago', 2027, 11],
		['America/Chicago', 2027, 6],
		['Europe/Berlin', 2027, 3],
		['Europe/Berlin', 2027, 10],
		['Australia/Sydney', 2027, 4],
		['Australia/Sydney', 2027, 10],
		['Australia/Lord_Howe', 2027, 4],
		['Asia/Kolkata', 2027, 3],
		['UTC', 2028, 2]
	])('gives %s %d-%d the hours Luxon measures', (timezone, year, month) => {
		const start = `${year}-${String(month).padStart(2, '0')}`;
		expect(monthHours(timezone, start)).toBe(luxonHours(timezone, year, month));
	});

	// Worked by hand and agreeing with Luxon above: 31 × 24 − 1 and 30 × 24 + 1.
	it('has 743 hours in March 2027 and 721 in November 2027 in Chicago', () => {
		expect(monthHours('America/Chicago', '2027-03')).toBe(743);
		expect(monthHours('America/Chicago', '2027-11')).toBe(721);
	});

	it('adds up to 8760 hours over the year', () => {
		const calendar = buildCalendar('America/Chicago', null, billingSpans({ start: '2027-01', months: 12 }));
		expect(calendar.spans.reduce((sum, span) => sum + span.hours, 0)).toBe(8760);
	});
});

describe('the intervals of a daylight-saving day', () => {
	const [spring] = dayShapes('America/Chicago', dayNumber('2027-03-14'), dayNumber('2027-03-14'));
	const [fall] = dayShapes('America/Chicago', dayNumber('2027-11-07'), dayNumber('2027-11-07'));

	it('skips 02:00–02:45 on the spring-forward day (23 hours)', () => {
		expect(spring?.minutes.length).toBe(92);
		expect(Array.from(spring?.minutes.slice(7, 9) ?? [])).toEqual([105, 180]);
	});

	it('repeats 01:00–01:45 on the fall-back day (25 hours)', () => {
		expect(fall?.minutes.length).toBe(100);
		expect(Array.from(fall?.minutes.slice(4, 12) ?? [])).toEqual([60, 75, 90, 105, 60, 75, 90, 105]);
	});

	it('keeps each repeated hour as its own hour for hourly demand', () => {
		expect(fall?.hourStarts.length).toBe(25);
		expect(spring?.hourStarts.length).toBe(23);
	});
});

describe('a time zone whose clocks change at midnight', () => {
	// Cuba falls back from 01:00 to 00:00 on 2026-11-01, so that day's midnight happens twice.
	const [ambiguous] = dayShapes('America/Havana', dayNumber('2026-11-01'), dayNumber('2026-11-01'));

	it('begins the day at the first of two midnights, giving it 25 hours', () => {
		expect(ambiguous?.minutes.length).toBe(100);
		expect(Array.from(ambiguous?.minutes.slice(0, 6) ?? [])).toEqual([0, 15, 30, 45, 0, 15]);
	});

	it('keeps the year as long as Luxon measures it', () => {
		const year = buildCalendar('America/Havana', null, billingSpans({ start: '2026-01', months: 12 }));
		const start = DateTime.fromObject({ year: 2026, month: 1, day: 1 }, { zone: 'America/Havana' });
		const reference = Interval.fromDateTimes(start, start.plus({ years: 1 })).length('hours');
		expect(year.spans.reduce((sum, span) => sum + span.hours, 0)).toBe(reference);
	});
});

describe('public holidays', () => {
	it('marks the days date-holidays lists as public holidays, and only those', () => {
		const reference = new Holidays('US', 'TX')
			.getHolidays(2027)
			.filter((holiday) => holiday.type === 'public')
			.map((holiday) => holiday.date.slice(0, 10));
		const calendar = buildCalendar(
			'America/Chicago',
			{ country: 'US', region: 'TX' },
			billingSpans({ start: '2027-01', months: 12 })
		);
		const holidayDays = calendar.spans.reduce((sum, span) => {
			let days = 0;
			for (const [index, count] of span.classCounts) if (calendar.classes[index]?.holiday) days += count;
			return sum + days;
		}, 0);
		expect(holidayDays).toBe(new Set(reference).size);
	});

	it('takes an explicit list of dates instead', () => {
		const calendar = buildCalendar('UTC', { dates: ['2027-06-02'] }, [
			{ from: '2027-06-01', to: '2027-06-03' }
		]);
		const holidays = calendar.classes.filter((day) => day.holiday);
		expect(holidays).toHaveLength(1);
		expect(calendar.spans[0]?.days).toBe(3);
	});
});
