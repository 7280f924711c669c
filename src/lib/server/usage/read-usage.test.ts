import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseGreenButton } from './green-button';
import { yearOfQuarterHours } from './green-button-fixture';
import { MAX_USAGE_BYTES, readUsageFile, usageFormat } from './read-usage';

const bytesOf = (text: string) => new TextEncoder().encode(text);
const CHICAGO = 'America/Chicago';

describe('telling the format from the bytes', () => {
	const cases: [text: string, format: string][] = [
		['<?xml version="1.0"?><feed/>', 'green-button'],
		['\uFEFF\r\n  <feed/>', 'green-button'],
		['timestamp,kWh\n', 'csv'],
		['%PDF-1.7', 'csv']
	];
	it.each(cases)('reads %j as %s', (text, format) => {
		expect(usageFormat(bytesOf(text))).toBe(format);
	});
});

// Starting a worker thread takes seconds on a busy 2-core machine (5 s timed out under a load of 11).
describe('reading a file in a worker thread', { timeout: 30_000 }, () => {
	it('reads the invented hourly Green Button file', async () => {
		const read = await readUsageFile(
			new Uint8Array(readFileSync('tests/fixtures/green-button/hourly.xml')),
			CHICAGO
		);
		expect(read.format).toBe('green-button');
		expect('intervals' in read && read.intervals.length).toBe(48);
		expect('intervals' in read && read.intervals[0]).toEqual({
			start: new Date('2026-01-09T06:00:00Z'),
			seconds: 3600,
			kwh: 0.9
		});
	});

	it('reads a sheet in the site’s time zone and passes its row problems back', async () => {
		const good = await readUsageFile(
			bytesOf('timestamp,kWh\n2026-01-09 00:00,1\n2026-01-09 01:00,2\n'),
			CHICAGO
		);
		expect('intervals' in good && good.intervals.map((i) => i.start.toISOString())).toEqual([
			'2026-01-09T06:00:00.000Z',
			'2026-01-09T07:00:00.000Z'
		]);
		const bad = await readUsageFile(
			bytesOf('timestamp,kWh\n2026-01-09 00:00,x\n2026-01-09 01:00,1\n'),
			CHICAGO
		);
		expect('issues' in bad && bad.issues).toEqual([
			{ line: 2, column: 'kWh', message: expect.stringMatching(/number/) }
		]);
	});

	it('answers every one of several files sent at once, though only two parse at a time', async () => {
		const sheets = [1, 2, 3].map((kwh) =>
			bytesOf(`timestamp,kWh\n2026-01-09 00:00,${kwh}\n2026-01-09 01:00,${kwh}\n`)
		);
		const reads = await Promise.all(sheets.map((bytes) => readUsageFile(bytes, CHICAGO)));
		expect(reads.map((read) => ('intervals' in read ? read.intervals[0]!.kwh : read.error))).toEqual([
			1, 2, 3
		]);
	});

	it('refuses bytes that are not UTF-8 text', async () => {
		const read = await readUsageFile(new Uint8Array([0x25, 0x50, 0x44, 0x46, 0xff, 0xfe, 0x00]), CHICAGO);
		expect('error' in read && read.error).toMatch(/^The file is not text/);
	});

	it('refuses an empty file and one over 10 MB without starting a worker', async () => {
		expect(await readUsageFile(new Uint8Array(0), CHICAGO)).toMatchObject({ error: 'The file is empty.' });
		expect(await readUsageFile(new Uint8Array(MAX_USAGE_BYTES + 1), CHICAGO)).toMatchObject({
			error: 'The file is over 10 MB.'
		});
	});
});

describe('a 10 MB file', () => {
	/** Runs `work` while a 10 ms timer ticks; the longest wait between ticks is how long the loop was blocked. */
	async function longestStall(work: () => unknown) {
		let last = performance.now();
		let longestMs = 0;
		const timer = setInterval(() => {
			const now = performance.now();
			longestMs = Math.max(longestMs, now - last);
			last = now;
		}, 10);
		const started = performance.now();
		await new Promise((resolve) => setTimeout(resolve, 20));
		const result = await work();
		await new Promise((resolve) => setTimeout(resolve, 20));
		clearInterval(timer);
		return {
			result,
			longestMs: Math.max(longestMs, performance.now() - last),
			totalMs: performance.now() - started
		};
	}

	it('parses a year of 15-minute readings while the event loop keeps running', async () => {
		const xml = yearOfQuarterHours();
		const bytes = bytesOf(xml);
		expect(bytes.byteLength).toBeGreaterThan(9.5e6);
		expect(bytes.byteLength).toBeLessThanOrEqual(MAX_USAGE_BYTES);

		// The same file parsed on this thread: the loop stops for the whole parse (over a second here).
		const blocking = await longestStall(() => parseGreenButton(xml));
		expect(blocking.longestMs).toBeGreaterThan(100);

		// In the worker the timer keeps firing. The machine's other load delays it now and then, so the
		// bound is relative: a stall of a quarter of the blocking parse would already be a failure.
		const offThread = await longestStall(() => readUsageFile(bytes, CHICAGO));
		const read = offThread.result as Awaited<ReturnType<typeof readUsageFile>>;
		expect('intervals' in read && read.intervals.length).toBe(365 * 96);
		expect(offThread.longestMs).toBeLessThan(blocking.longestMs / 4);
	}, 60_000);
});
