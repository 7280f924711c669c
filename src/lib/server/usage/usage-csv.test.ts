import { describe, expect, it } from 'vitest';
import { rowIssueText, type UsageRead } from './interval';
import { parseUsageCsv } from './usage-csv';

const CHICAGO = 'America/Chicago';

function rowsOf(read: UsageRead) {
	if ('error' in read) throw new Error(`refused: ${read.error}`);
	return read.intervals.map((i) => ({ start: i.start.toISOString(), seconds: i.seconds, kwh: i.kwh }));
}
const refusal = (read: UsageRead) => ('error' in read ? read : { error: 'read without error', issues: [] });
const issueTexts = (read: UsageRead) => (refusal(read).issues ?? []).map(rowIssueText);
const sheet = (...lines: string[]) => lines.join('\n');

describe('a sheet with offsets in its timestamps', () => {
	it('reads each row as one reading lasting until the next, the last as long as the one before', () => {
		const read = parseUsageCsv(
			sheet(
				'Timestamp,kWh',
				'2026-01-09T00:00-06:00,0.9',
				'2026-01-09T01:00-06:00,1.2',
				'2026-01-09T02:00-06:00,0.75'
			),
			CHICAGO
		);
		expect(rowsOf(read)).toEqual([
			{ start: '2026-01-09T06:00:00.000Z', seconds: 3600, kwh: 0.9 },
			{ start: '2026-01-09T07:00:00.000Z', seconds: 3600, kwh: 1.2 },
			{ start: '2026-01-09T08:00:00.000Z', seconds: 3600, kwh: 0.75 }
		]);
	});

	it('reads UTC times ending in Z whatever the site’s zone', () => {
		const read = parseUsageCsv(
			sheet('timestamp,kwh', '2026-01-09T06:00:00Z,1', '2026-01-09T06:15:00Z,1'),
			CHICAGO
		);
		expect(rowsOf(read).map((r) => [r.start, r.seconds])).toEqual([
			['2026-01-09T06:00:00.000Z', 900],
			['2026-01-09T06:15:00.000Z', 900]
		]);
	});
});

describe('a sheet of local clock times', () => {
	it('reads them in the site’s time zone', () => {
		const read = parseUsageCsv(
			sheet('timestamp,kWh', '2026-07-01 00:00,0.5', '2026-07-01 00:30,0.5'),
			CHICAGO
		);
		// Central daylight time is UTC−5 in July (US daylight saving rules, Energy Policy Act of 2005).
		expect(rowsOf(read)[0]!.start).toBe('2026-07-01T05:00:00.000Z');
	});

	// US clocks jump from 02:00 to 03:00 on the second Sunday of March and fall back from 02:00 to 01:00
	// on the first Sunday of November (Energy Policy Act of 2005): 8 March and 1 November in 2026.
	it('gives the spring-forward day 23 hours: 01:00 is followed an hour later by 03:00', () => {
		const read = parseUsageCsv(
			sheet(
				'timestamp,kWh',
				'2026-03-08 00:00,1',
				'2026-03-08 01:00,1',
				'2026-03-08 03:00,1',
				'2026-03-08 04:00,1'
			),
			CHICAGO
		);
		expect(rowsOf(read).map((r) => [r.start, r.seconds])).toEqual([
			['2026-03-08T06:00:00.000Z', 3600],
			['2026-03-08T07:00:00.000Z', 3600],
			['2026-03-08T08:00:00.000Z', 3600],
			['2026-03-08T09:00:00.000Z', 3600]
		]);
	});

	it('refuses a clock time the spring change skips', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh', '2026-03-08 01:00,1', '2026-03-08 02:30,1'), CHICAGO);
		expect(issueTexts(read)).toEqual([
			'Row 3, timestamp: does not exist in America/Chicago: the clocks jump forward at that hour'
		]);
	});

	it('reads the hour repeated in November twice, once in daylight and once in standard time', () => {
		const read = parseUsageCsv(
			sheet(
				'timestamp,kWh',
				'2026-11-01 00:00,1',
				'2026-11-01 01:00,2',
				'2026-11-01 01:00,3',
				'2026-11-01 02:00,4'
			),
			CHICAGO
		);
		expect(rowsOf(read)).toEqual([
			{ start: '2026-11-01T05:00:00.000Z', seconds: 3600, kwh: 1 },
			{ start: '2026-11-01T06:00:00.000Z', seconds: 3600, kwh: 2 },
			{ start: '2026-11-01T07:00:00.000Z', seconds: 3600, kwh: 3 },
			{ start: '2026-11-01T08:00:00.000Z', seconds: 3600, kwh: 4 }
		]);
	});
});

describe('how long each reading lasts', () => {
	it('takes a seconds column when there is one', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh,seconds', '2026-01-09 00:00,0.2,900'), CHICAGO);
		expect(rowsOf(read)).toEqual([{ start: '2026-01-09T06:00:00.000Z', seconds: 900, kwh: 0.2 }]);
	});

	it('takes a minutes column when there is one', () => {
		const read = parseUsageCsv(
			sheet('timestamp,kWh,minutes', '2026-01-09 00:00,0.2,15', '2026-01-09 01:00,0.2,15'),
			CHICAGO
		);
		expect(rowsOf(read).map((r) => r.seconds)).toEqual([900, 900]);
	});

	it('gives the reading before a hole in the data the usual length, not the length of the hole', () => {
		const read = parseUsageCsv(
			sheet(
				'timestamp,kWh',
				'2026-01-09 00:00,1',
				'2026-01-09 01:00,1',
				'2026-01-09 02:00,1',
				'2026-01-09 09:00,1'
			),
			CHICAGO
		);
		expect(rowsOf(read).map((r) => r.seconds)).toEqual([3600, 3600, 3600, 3600]);
	});

	it('sorts rows that come out of order', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh', '2026-01-09 01:00,2', '2026-01-09 00:00,1'), CHICAGO);
		expect(rowsOf(read).map((r) => r.kwh)).toEqual([1, 2]);
	});
});

describe('rows refused, each by row and column', () => {
	it('names every value that needs attention and stores nothing', () => {
		const read = parseUsageCsv(
			sheet(
				'timestamp,kWh',
				'2026-01-09 00:00,0.9',
				'2026-01-09 01:00,lots',
				'9 Jan 2026,1',
				'2026-01-09 03:00,-1',
				'2026-01-09 04:00,"0,5"'
			),
			CHICAGO
		);
		expect(refusal(read).error).toBe('4 values need attention; nothing was imported.');
		expect('intervals' in read).toBe(false);
		expect(issueTexts(read)).toEqual([
			'Row 3, kWh: must be a number with a dot for decimals, like 0.12',
			'Row 4, timestamp: must be a time like 2026-03-08 01:00 (local) or 2026-03-08T01:00-06:00 (with its offset)',
			'Row 5, kWh: must not be negative',
			'Row 6, kWh: must use a dot for decimals, like 0.12 (not 0,12)'
		]);
	});

	it('refuses two rows at the same time', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh', '2026-01-09 00:00,1', '2026-01-09T06:00Z,1'), CHICAGO);
		expect(issueTexts(read)).toEqual(['Row 3, timestamp: is the same time as row 2']);
	});

	it('refuses a date that does not exist', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh', '2026-02-30 00:00,1', '2026-03-01 00:00,1'), CHICAGO);
		expect(issueTexts(read)).toEqual(['Row 2, timestamp: is not a real date and time']);
	});

	it('refuses readings that overlap by their stated length', () => {
		const read = parseUsageCsv(
			sheet('timestamp,kWh,seconds', '2026-01-09 00:00,1,3600', '2026-01-09 00:30,1,1800'),
			CHICAGO
		);
		expect(issueTexts(read)).toEqual(['Row 2, seconds: runs past the start of row 3']);
	});

	it('refuses a length that is not a whole number of seconds', () => {
		const read = parseUsageCsv(sheet('timestamp,kWh,seconds', '2026-01-09 00:00,1,15.5'), CHICAGO);
		expect(issueTexts(read)).toEqual([
			'Row 2, seconds: must be a whole number of seconds, more than 0 and at most one day'
		]);
	});

	it('lists at most 100 problems but counts them all', () => {
		const rows = Array.from({ length: 150 }, (_, i) => `2026-01-09T${String(i % 24).padStart(2, '0')}:00Z,x`);
		const read = parseUsageCsv(sheet('timestamp,kWh', ...rows), CHICAGO);
		expect(refusal(read).error).toMatch(/^150 values need attention/);
		expect(refusal(read).issues).toHaveLength(100);
	});
});

describe('files refused whole', () => {
	const cases: [situation: string, text: string, message: RegExp][] = [
		[
			'no header row naming the columns',
			sheet('2026-01-09 00:00,1', '2026-01-09 01:00,1'),
			/first row must name its columns, timestamp and kWh/
		],
		['a header without readings', sheet('timestamp,kWh', '', ''), /header row but no readings/],
		['an empty file', '', /first row must name its columns/],
		[
			'one reading without a length',
			sheet('timestamp,kWh', '2026-01-09 00:00,1'),
			/needs a seconds or minutes column/
		],
		[
			'a quoted cell never closed',
			sheet('timestamp,kWh', '"2026-01-09 00:00,1'),
			/a quoted cell is never closed/
		],
		[
			'readings two days apart',
			sheet('timestamp,kWh', '2026-01-09 00:00,1', '2026-01-11 00:00,1'),
			/more than a day apart/
		]
	];
	it.each(cases)('refuses %s', (_situation, text, message) => {
		expect(refusal(parseUsageCsv(text, CHICAGO)).error).toMatch(message);
	});
});
