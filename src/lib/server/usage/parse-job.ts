import { parseGreenButton } from './green-button';
import type { RowIssue } from './interval';
import { parseUsageCsv } from './usage-csv';

/** What the usage worker thread does with one uploaded file. */

export type UsageFormat = 'green-button' | 'csv';
export type ParseJob = { format: UsageFormat; bytes: Uint8Array; timezone: string };
/** Intervals go back as columns of typed arrays: moved, not copied, so the main thread does no work. */
export type ParseAnswer =
	{ starts: Float64Array; seconds: Float64Array; kwh: Float64Array } | { error: string; issues?: RowIssue[] };

const NOT_TEXT = 'The file is not text: upload a Green Button XML file or a timestamp,kWh CSV sheet.';

export function answer({ format, bytes, timezone }: ParseJob): ParseAnswer {
	let text: string;
	try {
		text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
	} catch {
		return { error: NOT_TEXT };
	}
	if (text.includes('\0')) return { error: NOT_TEXT };
	const read = format === 'green-button' ? parseGreenButton(text) : parseUsageCsv(text, timezone);
	if ('error' in read) return read;
	const n = read.intervals.length;
	const columns = { starts: new Float64Array(n), seconds: new Float64Array(n), kwh: new Float64Array(n) };
	read.intervals.forEach((interval, i) => {
		columns.starts[i] = interval.start.getTime();
		columns.seconds[i] = interval.seconds;
		columns.kwh[i] = interval.kwh;
	});
	return columns;
}
