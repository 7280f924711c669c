import type { HolidaySpec, Schedule } from '$lib/calc';
import { daysText, monthsText, windowsText } from '$lib/text/tariff';
import { figure } from '$lib/text/numbers';
import { CATEGORY_NAMES } from '$lib/components/equipment/device-fields';

/** A category code in words ("water-pump" → "Water pump", "uv" → "UV steriliser"); an unknown code as it is. */
export const categoryWords = (category: string | undefined): string =>
	CATEGORY_NAMES[(category ?? 'other') as keyof typeof CATEGORY_NAMES] ?? category ?? 'Other';

// The same figures as the tariff words' figureText, with one formatter kept: a workbook of thousands
// of devices would otherwise build a new one per number.
const figureText = (value: number) => figure(value, 5);

/** Only the days that are not every day are worth saying. */
function onDays(days: 'all' | 'weekdays' | 'weekends'): string {
	return days === 'all' ? 'every day' : `on ${daysText(days)}`;
}

function within(windows: ReadonlyArray<{ start: string; end: string }> | undefined): string {
	const text = windowsText(windows);
	return text ? ` within ${text}` : '';
}

/**
 * A schedule in words, as the rules page names them: "Always on", "8 hours a day, on weekdays",
 * "On 06:00–18:00, every day", "15 min on / 45 min off within 06:00–18:00, every day",
 * "4 runs of 30 min a day within 08:00–16:00, every day".
 */
export function scheduleText(schedule: Schedule): string {
	switch (schedule.type) {
		case 'always':
			return 'Always on';
		case 'hours':
			return `${figureText(schedule.hoursPerDay)} hours a day, ${onDays(schedule.days)}`;
		case 'windows':
			return `On ${windowsText(schedule.windows)}, ${onDays(schedule.days)}`;
		case 'cycle':
			return `${figureText(schedule.onMinutes)} min on / ${figureText(schedule.offMinutes)} min off${within(schedule.windows)}, ${onDays(schedule.days)}`;
		case 'runs':
			return `${figureText(schedule.runsPerDay)} runs of ${figureText(schedule.minutesPerRun)} min a day${within(schedule.windows)}, ${onDays(schedule.days)}`;
	}
}

/** Active months in words: "all year", "June–September". */
export function activeMonthsText(months: readonly number[] | undefined): string {
	return months === undefined ? 'all year' : monthsText(months);
}

/** The holiday calendar a comparison used, in words. */
export function holidaysText(holidays: HolidaySpec | undefined): string {
	if (!holidays) return 'No public holidays';
	if ('dates' in holidays) {
		return holidays.dates.length > 0 ? `Holidays listed: ${holidays.dates.join(', ')}` : 'No public holidays';
	}
	const place = holidays.region ? `${holidays.country}-${holidays.region}` : holidays.country;
	return `Public holidays of ${place}, as the date-holidays package lists them`;
}
