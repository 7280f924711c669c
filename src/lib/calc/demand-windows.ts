import type { ClockWindow, DaySelector } from './clock';
import { type RuleIssue, hourlyWindowIssues } from './tariff';

/**
 * The hours a demand charge measures. `windows` alone: the same hours on every day its `days` select
 * (none: the whole day). With `weekendWindows` too (only on a charge of every day): weekdays are
 * measured in `windows` and weekend days — holidays the tariff prices as weekends included — in
 * `weekendWindows`, and the billing period still has one peak over both. A whole weekend day is the
 * window 00:00–24:00. This is how commercial rates write an off-peak demand period of weekday nights
 * and whole weekends (common practice).
 */
export interface DemandHours {
	days: DaySelector;
	windows?: readonly ClockWindow[] | undefined;
	weekendWindows?: readonly ClockWindow[] | undefined;
}

/** The windows a charge measures on a day that prices as a weekend (`weekend`) or as a weekday. */
export function demandWindowsOn(charge: DemandHours, weekend: boolean): readonly ClockWindow[] | undefined {
	return weekend && charge.weekendWindows ? charge.weekendWindows : charge.windows;
}

/**
 * Weekend windows need a charge of every day with weekday windows (otherwise they would measure
 * nothing, or hours the days already leave out); on 60-minute demand they start and end on the hour,
 * as the weekday windows do.
 */
export function demandWindowIssues(charge: DemandHours & { intervalMinutes: number }): RuleIssue[] {
	const issues: RuleIssue[] = [];
	if (charge.intervalMinutes === 60) {
		for (const key of ['windows', 'weekendWindows'] as const)
			for (const issue of hourlyWindowIssues(charge[key]))
				issues.push({ ...issue, path: [key, ...issue.path] });
	}
	if (!charge.weekendWindows) return issues;
	if (charge.days !== 'all') {
		issues.push({
			path: ['weekendWindows'],
			message: 'Other hours at weekends need a charge measured every day'
		});
	} else if (!charge.windows || charge.windows.length === 0) {
		issues.push({
			path: ['weekendWindows'],
			message: 'Other hours at weekends need the hours measured on weekdays too'
		});
	}
	return issues;
}
