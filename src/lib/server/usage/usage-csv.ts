import Papa from 'papaparse';
import { blank, numberCell } from '../sheets/read-sheet';
import {
	MAX_INTERVAL_SECONDS,
	MAX_INTERVALS,
	type Interval,
	type RowIssue,
	type UsageRead
} from './interval';
import { readTimestamp, type DayOffsets } from './usage-time';

/**
 * A usage sheet: a header row naming a `timestamp` and a `kWh` column, then one row per reading.
 * Each reading lasts until the next one starts (the last repeats the length before it), unless a
 * `seconds` or `minutes` column says how long it lasted.
 */

/** Enough of the refused rows to fix a file; the message gives the full count. */
const MAX_ISSUES = 100;

type Row = { line: number; ms: number; kwh: number; seconds: number | null };
type Columns = { timestamp: number; kwh: number; length: number | null; perMinute: boolean };

const key = (cell: string) => cell.toLowerCase().replace(/[\s_()]/g, '');

function columnsOf(header: string[]): Columns | null {
	const at = (...names: string[]) => header.findIndex((cell) => names.includes(key(cell)));
	const timestamp = at('timestamp', 'start');
	const kwh = at('kwh');
	const seconds = at('seconds');
	const minutes = at('minutes');
	if (timestamp < 0 || kwh < 0) return null;
	const length = seconds >= 0 ? seconds : minutes >= 0 ? minutes : null;
	return { timestamp, kwh, length, perMinute: seconds < 0 && minutes >= 0 };
}

function lengthOf(raw: string, perMinute: boolean): { value: number } | { message: string } {
	const unit = perMinute ? 'minutes' : 'seconds';
	const value = Number(raw) * (perMinute ? 60 : 1);
	if (!/^\d+$/.test(raw) || value <= 0 || value > MAX_INTERVAL_SECONDS)
		return { message: `must be a whole number of ${unit}, more than 0 and at most one day` };
	return { value };
}

/**
 * The length of each reading from the gap to the next one. A gap longer than the usual one is a hole
 * in the data, not one long reading, so that reading gets the usual length. Returns the usual gap.
 */
function fillLengths(rows: Row[]): number {
	const counts = new Map<number, number>();
	for (let i = 1; i < rows.length; i++) {
		const gap = (rows[i]!.ms - rows[i - 1]!.ms) / 1000;
		counts.set(gap, (counts.get(gap) ?? 0) + 1);
	}
	const usual = [...counts].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0]![0];
	for (let i = 0; i < rows.length; i++) {
		const next = rows[i + 1];
		rows[i]!.seconds = next ? Math.min((next.ms - rows[i]!.ms) / 1000, usual) : rows[i - 1]!.seconds;
	}
	return usual;
}

/** Refused values, counted in full but listed only up to MAX_ISSUES. */
class Refusals {
	readonly listed: RowIssue[] = [];
	count = 0;
	add(issue: RowIssue) {
		if (this.count++ < MAX_ISSUES) this.listed.push(issue);
	}
}

function readRows(
	body: { line: number; cells: string[] }[],
	columns: Columns,
	zone: string,
	refusals: Refusals
) {
	const lengthColumn = columns.perMinute ? 'minutes' : 'seconds';
	const rows: Row[] = [];
	const days: DayOffsets = new Map();
	let before: number | null = null;
	for (const { line, cells } of body) {
		const time = readTimestamp(cells[columns.timestamp] ?? '', zone, before, days);
		// numberCell words its message after a label; here the column is named first ("Row 7, kWh: must …").
		const kwh = numberCell(cells[columns.kwh] ?? '', '');
		const length = columns.length === null ? null : lengthOf(cells[columns.length] ?? '', columns.perMinute);
		if ('message' in time) refusals.add({ line, column: 'timestamp', message: time.message });
		if ('message' in kwh) refusals.add({ line, column: 'kWh', message: kwh.message.trimStart() });
		else if (kwh.value < 0) refusals.add({ line, column: 'kWh', message: 'must not be negative' });
		if (length && 'message' in length) refusals.add({ line, column: lengthColumn, message: length.message });
		if ('ms' in time && 'value' in kwh) {
			before = time.ms;
			const seconds = length && 'value' in length ? length.value : null;
			rows.push({ line, ms: time.ms, kwh: kwh.value, seconds });
		}
	}
	rows.sort((a, b) => a.ms - b.ms || a.line - b.line);
	for (let i = 1; i < rows.length; i++) {
		const [earlier, row] = [rows[i - 1]!, rows[i]!];
		if (earlier.ms === row.ms)
			refusals.add({
				line: row.line,
				column: 'timestamp',
				message: `is the same time as row ${earlier.line}`
			});
		else if (earlier.seconds !== null && earlier.ms + earlier.seconds * 1000 > row.ms)
			refusals.add({
				line: earlier.line,
				column: lengthColumn,
				message: `runs past the start of row ${row.line}`
			});
	}
	return rows;
}

/** Reads a timestamp,kWh sheet (UTF-8 text) whose local times are in `zone`. */
export function parseUsageCsv(text: string, zone: string): UsageRead {
	const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
	const quote = parsed.errors.find((error) => error.type === 'Quotes');
	if (quote) return { error: `Row ${(quote.row ?? 0) + 1}: a quoted cell is never closed.` };
	const [header, ...body] = parsed.data
		.map((cells, i) => ({ line: i + 1, cells: cells.map((cell) => cell.trim()) }))
		.filter((row) => !blank(row.cells));
	const columns = header ? columnsOf(header.cells) : null;
	if (!columns)
		return {
			error:
				'The file is neither a Green Button XML file nor a usage sheet: a sheet’s first row must name ' +
				'its columns, timestamp and kWh.'
		};
	if (body.length === 0) return { error: 'The sheet has a header row but no readings.' };
	if (body.length > MAX_INTERVALS)
		return { error: `The sheet has ${body.length} readings; one import can hold at most ${MAX_INTERVALS}.` };
	if (body.length === 1 && columns.length === null)
		return { error: 'A sheet of one reading needs a seconds or minutes column to say how long it lasted.' };

	const refusals = new Refusals();
	const rows = readRows(body, columns, zone, refusals);
	if (refusals.count > 0) {
		const values = refusals.count === 1 ? 'value needs' : 'values need';
		return { error: `${refusals.count} ${values} attention; nothing was imported.`, issues: refusals.listed };
	}
	if (columns.length === null && fillLengths(rows) > MAX_INTERVAL_SECONDS)
		return { error: 'The readings are more than a day apart; Runrate imports readings of a day or less.' };
	return {
		intervals: rows.map((row): Interval => ({ start: new Date(row.ms), seconds: row.seconds!, kwh: row.kwh }))
	};
}
