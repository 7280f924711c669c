// A site's stored readings over 12 whole local months as the core's meter series, or why they cannot be one.
import { DateTime } from 'luxon';
import type { Meter } from '$lib/calc';

/** One stored reading as read for pricing: its start, its length and its kWh. */
export type Reading = { start: Date; seconds: number; kwh: number };

/** The months a metered year covers, in the site's zone: the first month's start and the end (exclusive). */
export type YearSpan = { from: DateTime; to: DateTime };

export type MeteredSeries =
	{ ok: true; meter: Meter; firstMonth: string; values: number } | { ok: false; message: string };

const METER_MINUTES = [15, 30, 60] as const;
type MeterMinutes = (typeof METER_MINUTES)[number];

const isMeterMinutes = (minutes: number): minutes is MeterMinutes =>
	(METER_MINUTES as readonly number[]).includes(minutes);

const count = (n: number) => n.toLocaleString('en-US');

/** "March 2027" */
export const monthName = (month: DateTime) => month.setLocale('en-US').toFormat('LLLL yyyy');

/**
 * The 12 whole local months ending where the stored readings end: the month the last reading ends in
 * counts only if it ends at the month's very end. Null when the readings hold fewer than 12 such months;
 * `wholeMonths` then says how many they do hold.
 */
export function lastWholeYear(
	firstStart: Date,
	lastEnd: Date,
	zone: string
): { span: YearSpan } | { span: null; wholeMonths: number } {
	const to = DateTime.fromJSDate(lastEnd, { zone }).startOf('month');
	const first = DateTime.fromJSDate(firstStart, { zone });
	const firstWhole = first.equals(first.startOf('month'))
		? first
		: first.startOf('month').plus({ months: 1 });
	const wholeMonths = Math.max(0, Math.round(to.diff(firstWhole, 'months').months));
	if (wholeMonths < 12) return { span: null, wholeMonths };
	return { span: { from: to.minus({ months: 12 }), to } };
}

/**
 * The readings of `span` (sorted by start, all inside it) as kWh per real interval from the span's local
 * start — a fall-back day in November holds 100 quarter hours, a spring-forward day 92. All readings
 * must share one length of 15, 30 or 60 minutes and sit on that grid; a missing interval is a gap,
 * never a zero: the message names the first gap's local time and how many intervals are missing.
 */
export function meterSeries(readings: readonly Reading[], span: YearSpan): MeteredSeries {
	const zone = span.from.zoneName ?? 'UTC';
	const lengths = new Set(readings.map((r) => r.seconds));
	if (lengths.size > 1) {
		const minutes = [...lengths].sort((a, b) => a - b).map((s) => `${count(s / 60)} minutes`);
		return {
			ok: false,
			message: `This usage mixes interval lengths (${minutes.join(', ')}); pricing a year needs readings of one length: 15, 30 or 60 minutes.`
		};
	}
	const minutes = readings.length ? readings[0]!.seconds / 60 : 60;
	if (!isMeterMinutes(minutes))
		return {
			ok: false,
			message: `This usage is in intervals of ${count(minutes)} minutes; pricing a year needs readings of 15, 30 or 60 minutes.`
		};
	const stepMs = minutes * 60_000;
	const fromMs = span.from.toMillis();
	const values = Math.round((span.to.toMillis() - fromMs) / stepMs);
	const kwh = new Array<number>(values).fill(Number.NaN);
	for (const r of readings) {
		const offset = r.start.getTime() - fromMs;
		const index = offset / stepMs;
		if (!Number.isInteger(index) || index < 0 || index >= values) {
			const local = DateTime.fromJSDate(r.start, { zone }).toFormat('yyyy-MM-dd HH:mm');
			return {
				ok: false,
				message: `The reading at ${local} (${zone}) does not start on the ${minutes}-minute grid from midnight; pricing a year needs readings on that grid.`
			};
		}
		kwh[index] = r.kwh;
	}
	const firstGap = kwh.findIndex((v) => Number.isNaN(v));
	if (firstGap >= 0) {
		const missing = kwh.reduce((n, v) => n + (Number.isNaN(v) ? 1 : 0), 0);
		const local = DateTime.fromMillis(fromMs + firstGap * stepMs, { zone }).toFormat('yyyy-MM-dd HH:mm');
		return {
			ok: false,
			message:
				`The usage has a gap: ${count(missing)} ${minutes}-minute ${missing === 1 ? 'interval is' : 'intervals are'} missing ` +
				`between ${monthName(span.from)} and ${monthName(span.to.minus({ months: 1 }))}, the first at ${local} (${zone}). ` +
				'Import the missing readings to price the year; a gap is never counted as zero use.'
		};
	}
	return {
		ok: true,
		meter: { start: span.from.toFormat("yyyy-MM-dd'T'HH:mm"), intervalMinutes: minutes, kwh },
		firstMonth: span.from.toFormat('yyyy-MM'),
		values
	};
}
