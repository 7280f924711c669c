// The first month of a scenario's priced year: the month after this one, or the adviser's choice.
import { DateTime } from 'luxon';

/** How far from today a chosen first month may lie, in years, back or forward. */
export const MONTHS_REACH_YEARS = 10;

/**
 * The first month to price, 'YYYY-MM'; `issue` says in words why the month asked for was not used (the
 * default year is priced instead, so the rest of the page still answers), and `asked` keeps what was
 * typed for the field.
 */
export type FirstMonth = { month: string; asked: string; issue: string | null };

const MONTH = /^(\d{4})-(\d{2})$/;

/**
 * The first month of the 12 to price, in the site's zone: by default the month after the current one
 * (an estimate is about the coming year); `?from=YYYY-MM` chooses another, which must be a real month
 * within 10 years of the current one. `firstMonthOf(null, 'America/Chicago', now)` on 3 December 2026
 * is 2027-01.
 */
export function firstMonthOf(asked: string | null, timezone: string, now: Date): FirstMonth {
	const thisMonth = DateTime.fromJSDate(now).setZone(timezone).startOf('month');
	const month = thisMonth.plus({ months: 1 }).toFormat('yyyy-MM');
	const typed = (asked ?? '').trim();
	if (!typed) return { month, asked: '', issue: null };
	const parts = MONTH.exec(typed);
	const chosen = parts ? DateTime.fromObject({ year: Number(parts[1]), month: Number(parts[2]) }) : null;
	if (!chosen?.isValid)
		return { month, asked: typed, issue: 'Enter the first month as a year and a month, such as 2027-01.' };
	const earliest = thisMonth.minus({ years: MONTHS_REACH_YEARS });
	const latest = thisMonth.plus({ years: MONTHS_REACH_YEARS });
	const key = chosen.toFormat('yyyy-MM');
	if (key < earliest.toFormat('yyyy-MM') || key > latest.toFormat('yyyy-MM'))
		return {
			month,
			asked: typed,
			issue: `Choose a first month within ${MONTHS_REACH_YEARS} years of today: from ${earliest.toFormat('LLLL yyyy')} to ${latest.toFormat('LLLL yyyy')}.`
		};
	return { month: key, asked: typed, issue: null };
}
