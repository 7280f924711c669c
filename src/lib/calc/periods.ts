import { daysInMonth, parseIsoMonth } from './dates';
import type { Period } from './period.schema';

export interface BillingSpan {
	label: string;
	from: string;
	to: string;
}

function pad(value: number): string {
	return String(value).padStart(2, '0');
}

/**
 * The billing periods of a request: calendar months from `start` ("2027-01" → 2027-01-01…2027-01-31,
 * labelled "2027-01"), or explicit billing periods with inclusive dates, labelled "from/to" (ISO 8601
 * interval notation).
 */
export function billingSpans(period: Period): BillingSpan[] {
	if ('billingPeriods' in period) {
		return period.billingPeriods.map(({ from, to }) => ({ label: `${from}/${to}`, from, to }));
	}
	const start = parseIsoMonth(period.start);
	if (!start) throw new Error(`Not a month: ${period.start}`);
	return Array.from({ length: period.months }, (_, i) => {
		const year = start.year + Math.floor((start.month - 1 + i) / 12);
		const month = ((start.month - 1 + i) % 12) + 1;
		const label = `${year}-${pad(month)}`;
		return { label, from: `${label}-01`, to: `${label}-${pad(daysInMonth(year, month))}` };
	});
}
