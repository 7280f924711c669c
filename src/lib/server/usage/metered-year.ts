// The site's last 12 whole months of metered usage, read once, as the core's meter series.
import { and, asc, eq, gte, lt, max, min, sql } from 'drizzle-orm';
import { db } from '../db';
import { usageIntervals } from '../db/schema';
import { lastWholeYear, meterSeries, monthName, type MeteredSeries } from './metered-series';

/**
 * The most readings a year may hold: 366 days of 15-minute readings and the repeated hour of a fall-back
 * day. Rows past it are never read; a year with more rows must hold readings shorter than 15 minutes.
 */
const MAX_YEAR_READINGS = 366 * 96 + 4;

export type MeteredYear = MeteredSeries & { label?: string };

/**
 * The last 12 whole calendar months of the site's readings in its time zone as a meter series
 * (`start` at local midnight of the first month), or a message in words: no usage, fewer than 12 whole
 * months, mixed interval lengths, a gap. Two small aggregate queries and one bounded read of the rows
 * (start, length and kWh only).
 */
export async function meteredYear(site: { id: string; timezone: string }): Promise<MeteredYear> {
	const [extent] = await db
		.select({
			firstStart: min(usageIntervals.start),
			lastEnd: max(
				sql<Date>`${usageIntervals.start} + make_interval(secs => ${usageIntervals.seconds})`
			).mapWith((value: string | Date) => new Date(value))
		})
		.from(usageIntervals)
		.where(eq(usageIntervals.siteId, site.id));
	if (!extent?.firstStart || !extent.lastEnd)
		return {
			ok: false,
			message: 'No metered usage is stored for this site yet: import a year of it to compare tariffs.'
		};
	const year = lastWholeYear(extent.firstStart, extent.lastEnd, site.timezone);
	if (!year.span) {
		const months = year.wholeMonths;
		return {
			ok: false,
			message: `The stored usage holds ${months} whole calendar ${months === 1 ? 'month' : 'months'}; comparing tariffs needs 12 whole months in a row. Import more usage.`
		};
	}
	const { from, to } = year.span;
	const rows = await db
		.select({ start: usageIntervals.start, seconds: usageIntervals.seconds, kwh: usageIntervals.kwh })
		.from(usageIntervals)
		.where(
			and(
				eq(usageIntervals.siteId, site.id),
				gte(usageIntervals.start, from.toJSDate()),
				lt(usageIntervals.start, to.toJSDate())
			)
		)
		.orderBy(asc(usageIntervals.start))
		.limit(MAX_YEAR_READINGS + 1);
	if (rows.length > MAX_YEAR_READINGS)
		return {
			ok: false,
			message: `This usage holds more than ${MAX_YEAR_READINGS.toLocaleString('en-US')} readings a year, so some are shorter than 15 minutes; pricing a year needs readings of 15, 30 or 60 minutes.`
		};
	const series = meterSeries(rows, year.span);
	if (!series.ok) return series;
	const label =
		`${monthName(from)} – ${monthName(to.minus({ months: 1 }))}, ` +
		`${series.values.toLocaleString('en-US')} values of ${series.meter.intervalMinutes} minutes`;
	return { ...series, label };
}
