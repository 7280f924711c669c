import { describe, expect, it } from 'vitest';
import { clockRows } from './weekly-clock';

// Invented periods; slot n is the quarter hour starting n × 15 minutes after midnight.
const slot = (hhmm: string) => (Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3))) / 15;

describe('the week at a glance', () => {
	it('marks a weekday evening peak on weekdays only', () => {
		const rows = clockRows([{ days: 'weekdays', windows: [{ start: '16:00', end: '21:00' }] }]);
		expect(rows.weekday[slot('15:45')]).toBe(-1);
		expect(rows.weekday[slot('16:00')]).toBe(0);
		expect(rows.weekday[slot('20:45')]).toBe(0);
		expect(rows.weekday[slot('21:00')]).toBe(-1);
		expect(rows.weekend.every((period) => period === -1)).toBe(true);
	});

	it('covers both ends of the day for a window past midnight', () => {
		const rows = clockRows([{ windows: [{ start: '22:00', end: '06:00' }] }]);
		expect(rows.weekend[slot('23:45')]).toBe(0);
		expect(rows.weekend[slot('05:45')]).toBe(0);
		expect(rows.weekend[slot('12:00')]).toBe(-1);
	});

	it('gives an hour to the first period that covers it, as the calculation does', () => {
		const rows = clockRows([
			{ days: 'all', windows: [{ start: '12:00', end: '14:00' }] },
			{ days: 'all', windows: [{ start: '13:00', end: '15:00' }] }
		]);
		expect(rows.weekday[slot('13:30')]).toBe(0);
		expect(rows.weekday[slot('14:30')]).toBe(1);
	});

	it('shows nothing for a period with no hours yet', () => {
		expect(clockRows([{ windows: [] }]).weekday.every((period) => period === -1)).toBe(true);
	});
});
