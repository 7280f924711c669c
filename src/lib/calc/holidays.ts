import Holidays from 'date-holidays';

/**
 * Public holidays by country and region, as the `date-holidays` package lists them (its type
 * "public"; bank holidays that are only half days and observances are not holidays here), or an
 * explicit list of dates (tariffs often publish their own).
 */
export type HolidaySpec = { country: string; region?: string | undefined } | { dates: string[] } | null;

const calendars = new Map<string, Holidays>();
const byYear = new Map<string, readonly string[]>();

function publicHolidays(country: string, region: string | undefined, year: number): readonly string[] {
	const key = `${country}|${region ?? ''}|${year}`;
	const known = byYear.get(key);
	if (known) return known;
	const calendarKey = `${country}|${region ?? ''}`;
	let calendar = calendars.get(calendarKey);
	if (!calendar) {
		calendar = region ? new Holidays(country, region) : new Holidays(country);
		calendars.set(calendarKey, calendar);
	}
	// `date` is the holiday's local date and time ("2027-07-05 00:00:00"); the day is what counts.
	const dates = calendar
		.getHolidays(year)
		.filter((holiday) => holiday.type === 'public')
		.map((holiday) => holiday.date.slice(0, 10));
	byYear.set(key, dates);
	return dates;
}

/** The holiday dates ("YYYY-MM-DD") in the given years. */
export function holidayDates(spec: HolidaySpec | undefined, years: readonly number[]): ReadonlySet<string> {
	if (!spec) return new Set();
	if ('dates' in spec) return new Set(spec.dates);
	return new Set(years.flatMap((year) => publicHolidays(spec.country, spec.region, year)));
}
