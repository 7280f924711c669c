/**
 * What the usage readers hand on: metered intervals, or why a file was refused. Nothing here reads a
 * file; the Green Button and CSV readers share these shapes and limits.
 */

/** One metered interval: `kwh` used in the `seconds` from `start`. */
export type Interval = { start: Date; seconds: number; kwh: number };

/** A refusal of one row of a CSV file ("Row 7, kwh: must be a number …"). */
export type RowIssue = { line: number; column: string; message: string };

export type UsageRead = { intervals: Interval[] } | { error: string; issues?: RowIssue[] };

/** About 28 years of 15-minute readings: far past any real download, short of exhausting memory. */
export const MAX_INTERVALS = 1_000_000;

/** A daily reading is the longest a load shape or a billing period can use; longer ones are refused. */
export const MAX_INTERVAL_SECONDS = 86_400;

export const rowIssueText = (issue: RowIssue) => `Row ${issue.line}, ${issue.column}: ${issue.message}`;

/** "2026-01-05 06:00Z", for messages about one reading. */
export const readingTime = (date: Date) =>
	date
		.toISOString()
		.replace('T', ' ')
		.replace(/:00\.000Z$/, 'Z')
		.replace(/\.000Z$/, 'Z');

/**
 * Sorted intervals, or the first place two of them claim the same time: the file then holds the same
 * use twice (two meters, or hourly and 15-minute readings of one), and adding both would double it.
 */
export function sortedWithoutOverlap(intervals: Interval[]): { intervals: Interval[] } | { error: string } {
	const sorted = intervals.slice().sort((a, b) => a.start.getTime() - b.start.getTime());
	for (let i = 1; i < sorted.length; i++) {
		const before = sorted[i - 1]!;
		const at = sorted[i]!;
		if (before.start.getTime() + before.seconds * 1000 > at.start.getTime())
			return {
				error:
					`Two readings cover the same time at ${readingTime(at.start)}: the file seems to hold the same ` +
					'use twice (two meters, or hourly and 15-minute readings). Download one meter’s interval use alone.'
			};
	}
	return { intervals: sorted };
}
