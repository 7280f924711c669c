import Papa from 'papaparse';
import { describe, expect, it, vi } from 'vitest';
import { readFirstSheet, type SheetRow } from './first-sheet';
import { rowXml, tallSheet, workbookOf } from './hostile-fixture';
import { readSheet } from './read-sheet';
import { NOT_A_WORKBOOK } from './zip-guard';

const LIMIT = { maxRows: 2000, rowWord: 'device' };
const OVER = 'The sheet has more than 2000 device rows; one import can hold at most 2000';
/** CPU time of this process (all its threads) spent in `run`, in ms. */
async function cpuMs(run: () => Promise<unknown>): Promise<number> {
	const start = process.cpuUsage();
	await run();
	const used = process.cpuUsage(start);
	return (used.user + used.system) / 1000;
}

describe('a sheet far past the row limit', () => {
	const TALL = tallSheet(250_000);

	it('is read no further than the row past the limit', async () => {
		let rows = 0;
		const refused = await readFirstSheet(TALL, () => ++rows <= 2001);
		expect(refused).toBeNull();
		// The header, 2,000 rows, and the one that shows the sheet is over: not 250,001.
		expect(rows).toBe(2002);
	});

	it('is refused with the row-limit message in a bounded time (250,000 rows, 2.5 MB)', async () => {
		expect(TALL.byteLength).toBeLessThan(3 * 1024 * 1024);
		let answer: unknown;
		const used = await cpuMs(async () => (answer = await readSheet(TALL, 'xlsx', LIMIT)));
		expect(answer).toEqual({ error: OVER });
		// Measured about 200 ms of CPU here; reading the whole sheet took 3,700 ms. Generous for a busy machine.
		expect(used).toBeLessThan(2000);
	});

	it('stops before rows that would break the sheet: a malformed row past the limit is never parsed', async () => {
		// The break sits 18,000 rows (about 1 MB of XML) past the limit, beyond any chunk read with it.
		const rows = Array.from({ length: 21_000 }, (_, i) => rowXml(i + 1, [`Pump ${i}`, 5]));
		rows.splice(20_000, 0, '<row r="20001"><c r="A20001"><v>1</c></row></sheetData><oops');
		expect(await readSheet(workbookOf([rows.join('')]), 'xlsx', LIMIT)).toEqual({ error: OVER });
		// The same break within the limit is read and refused.
		const short = rows.slice(19_000);
		short.unshift(rowXml(1, ['name', 'watts']));
		expect(await readSheet(workbookOf([short.join('')]), 'xlsx', LIMIT)).toEqual({ error: NOT_A_WORKBOOK });
	});

	it('as CSV, is parsed row by row and abandoned past the limit', async () => {
		const lines = ['name,watts', ...Array.from({ length: 250_000 }, (_, i) => `Pump ${i},5`)];
		// An unclosed quote at row 3,000: reading the whole text would report it instead.
		lines[3000] = '"Pump,5';
		const bytes = new TextEncoder().encode(lines.join('\n'));
		const parse = vi.spyOn(Papa, 'parse');
		expect(await readSheet(bytes, 'csv', LIMIT)).toEqual({ error: OVER });
		expect(parse).toHaveBeenCalledTimes(1);
		expect(parse.mock.calls[0]![1]).toHaveProperty('step');
		parse.mockRestore();
		const short = new TextEncoder().encode(
			lines
				.slice(0, 3001)
				.join('\n')
				.replace(/^(.*\n){1000}/, 'name,watts\n')
		);
		expect(await readSheet(short, 'csv', LIMIT)).toEqual({
			error: 'Row 2002: a quoted cell is never closed'
		});
	});
});

describe('a sheet within the limit', () => {
	it('reads every row of 2,000, numbered as the sheet numbers them, blank rows left out', async () => {
		const lines = [rowXml(1, ['name', 'watts']), '<row r="2"/>'];
		for (let line = 3; line <= 2002; line++) lines.push(rowXml(line, [`Pump ${line}`, line]));
		const read = await readSheet(workbookOf([lines.join('')]), 'xlsx', LIMIT);
		expect('body' in read && read.body.length).toBe(2000);
		expect('body' in read && read.body.at(-1)).toEqual({ line: 2002, cells: ['Pump 2002', '2002'] });
	});

	it('reads the first tab, whichever part holds it', async () => {
		const first = rowXml(1, ['from the first tab']);
		const second = rowXml(1, ['from the second tab']);
		const rows: SheetRow[] = [];
		// sheet2.xml is the first tab; sheet1.xml the second.
		expect(await readFirstSheet(workbookOf([second, first], [2, 1]), (row) => rows.push(row) > 0)).toBeNull();
		expect(rows).toEqual([{ line: 1, cells: ['from the first tab'] }]);
	});
});
