import type { PeriodResult } from '$lib/calc';

/** 8,760 hours of an ordinary year over 12: the "average month" a row's figures are in. */
export const AVERAGE_MONTH_HOURS = 730;

/** One row's share of the result in an average month of the priced year. */
export interface MonthShare {
	kwhPerMonth: number;
	costPerMonth: number;
	/** The average month's hours, for its label. */
	monthHours: number;
}

/**
 * Each row's kWh and cost in an average month (the year's figures over its number of months), and
 * that month's length in hours: 730 h in an ordinary year, 732 h in a leap year. It is an average,
 * not a calendar month (a 31-day month has 744 h), so the page labels it with its hours.
 */
export function averageMonth(
	periods: readonly PeriodResult[],
	rowCount: number
): { hours: number; shares: MonthShare[] } {
	if (!periods.length) return { hours: AVERAGE_MONTH_HOURS, shares: [] };
	const hours = periods.reduce((sum, p) => sum + p.hours, 0) / periods.length;
	const shares = Array.from({ length: rowCount }, (_, i) => {
		const kwh = periods.reduce((sum, p) => sum + (p.equipment[i]?.kwh ?? 0), 0);
		const cost = periods.reduce((sum, p) => sum + (p.equipment[i]?.cost ?? 0), 0);
		return { kwhPerMonth: kwh / periods.length, costPerMonth: cost / periods.length, monthHours: hours };
	});
	return { hours, shares };
}
