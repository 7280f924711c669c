import { describe, expect, it } from 'vitest';
import { firstMonthOf } from './first-month';

// "Now" is fixed; the site's zone decides which month it is.
const now = new Date('2026-12-03T12:00:00Z');

describe('the first month of a scenario’s year', () => {
	it('is the month after the current one in the site’s zone when none is chosen', () => {
		expect(firstMonthOf(null, 'America/Chicago', now)).toEqual({ month: '2027-01', asked: '', issue: null });
		expect(firstMonthOf('  ', 'America/Chicago', now).month).toBe('2027-01');
	});

	it('follows the site’s zone at a month’s turn', () => {
		// 31 December 2026, 23:30 in Chicago is already January 2027 in UTC.
		const turn = new Date('2027-01-01T05:30:00Z');
		expect(firstMonthOf(null, 'America/Chicago', turn).month).toBe('2027-01');
		expect(firstMonthOf(null, 'UTC', turn).month).toBe('2027-02');
	});

	it('takes a chosen real month within ten years', () => {
		expect(firstMonthOf('2026-03', 'UTC', now)).toEqual({ month: '2026-03', asked: '2026-03', issue: null });
		expect(firstMonthOf('2016-12', 'UTC', now).issue).toBeNull();
		expect(firstMonthOf('2036-12', 'UTC', now).issue).toBeNull();
	});

	it('refuses what is not a month, keeps it for the field and prices the coming year', () => {
		for (const typed of ['2027-13', '2027-00', '27-01', 'January', '2027-1', '2027-01-01']) {
			const found = firstMonthOf(typed, 'UTC', now);
			expect(found).toEqual({
				month: '2027-01',
				asked: typed,
				issue: 'Enter the first month as a year and a month, such as 2027-01.'
			});
		}
	});

	it('refuses a month more than ten years away, naming the range', () => {
		for (const typed of ['2016-11', '2037-01', '1900-01']) {
			const found = firstMonthOf(typed, 'UTC', now);
			expect(found.month).toBe('2027-01');
			expect(found.issue).toBe(
				'Choose a first month within 10 years of today: from December 2016 to December 2036.'
			);
		}
	});
});
