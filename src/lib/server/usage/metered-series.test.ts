import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { lastWholeYear, meterSeries, type Reading } from './metered-series';

const CHICAGO = 'America/Chicago';

/** Readings of `minutes` each, 1 kWh, from one local time to another (real time, so DST days differ). */
function readings(from: string, to: string, minutes: number, zone = CHICAGO): Reading[] {
	const out: Reading[] = [];
	const end = DateTime.fromISO(to, { zone }).toMillis();
	for (let t = DateTime.fromISO(from, { zone }).toMillis(); t < end; t += minutes * 60_000)
		out.push({ start: new Date(t), seconds: minutes * 60, kwh: 1 });
	return out;
}

const span = (from: string, to: string, zone = CHICAGO) => ({
	from: DateTime.fromISO(from, { zone }),
	to: DateTime.fromISO(to, { zone })
});

describe('a whole year of readings', () => {
	it('becomes kWh per real interval from local midnight of the first month', () => {
		const year = span('2026-12-01', '2027-12-01');
		const series = meterSeries(readings('2026-12-01', '2027-12-01', 60), year);
		expect(series.ok).toBe(true);
		if (!series.ok) return;
		// 365 days of 24 hours: the spring-forward day's missing hour and the fall-back day's extra one cancel.
		expect(series.meter).toMatchObject({ start: '2026-12-01T00:00', intervalMinutes: 60 });
		expect(series.values).toBe(8760);
	});

	it('counts 100 quarter hours on the fall-back day in America/Chicago', () => {
		// 2027-11-07: clocks go back from 02:00 CDT to 01:00 CST, so the local day lasts 25 hours (common practice).
		const day = span('2027-11-07', '2027-11-08');
		const series = meterSeries(readings('2027-11-07', '2027-11-08', 15), day);
		expect(series.ok && series.values).toBe(100);
		const spring = meterSeries(readings('2027-03-14', '2027-03-15', 15), span('2027-03-14', '2027-03-15'));
		expect(spring.ok && spring.values).toBe(92);
	});
});

describe('readings that cannot be priced as they are', () => {
	it('names the first gap by its local time and how many intervals are missing', () => {
		const all = readings('2027-03-01', '2027-04-01', 15);
		const start = all.findIndex(
			(r) => r.start.getTime() === DateTime.fromISO('2027-03-10T06:15', { zone: CHICAGO }).toMillis()
		);
		const holed = [...all.slice(0, start), ...all.slice(start + 3)];
		const series = meterSeries(holed, span('2027-03-01', '2027-04-01'));
		expect(series.ok).toBe(false);
		if (series.ok) return;
		expect(series.message).toContain('3 15-minute intervals are missing');
		expect(series.message).toContain('the first at 2027-03-10 06:15 (America/Chicago)');
	});

	it('refuses readings of mixed lengths in words', () => {
		const mixed = [...readings('2027-01-01', '2027-01-15', 15), ...readings('2027-01-15', '2027-02-01', 60)];
		const series = meterSeries(mixed, span('2027-01-01', '2027-02-01'));
		expect(series.ok).toBe(false);
		if (!series.ok)
			expect(series.message).toMatch(/^This usage mixes interval lengths \(15 minutes, 60 minutes\)/);
	});

	it('refuses readings of 5 minutes', () => {
		const series = meterSeries(readings('2027-01-01', '2027-01-02', 5), span('2027-01-01', '2027-01-02'));
		expect(series.ok || series.message).toContain('intervals of 5 minutes');
	});
});

describe('which 12 months are priced', () => {
	const at = (iso: string) => DateTime.fromISO(iso, { zone: CHICAGO }).toJSDate();

	it('takes the 12 whole months before the month the readings end in', () => {
		const year = lastWholeYear(at('2026-11-15T00:00'), at('2027-12-03T10:00'), CHICAGO);
		expect(year.span?.from.toISODate()).toBe('2026-12-01');
		expect(year.span?.to.toISODate()).toBe('2027-12-01');
	});

	it('says how many whole months there are when there are fewer than 12', () => {
		const year = lastWholeYear(at('2027-03-10T00:00'), at('2027-12-01T00:00'), CHICAGO);
		expect(year.span).toBeNull();
		// April to November: 8 whole months; March started on the 10th.
		expect('wholeMonths' in year && year.wholeMonths).toBe(8);
	});
});
