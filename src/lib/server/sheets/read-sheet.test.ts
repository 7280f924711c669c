import { describe, expect, it } from 'vitest';
import { parseBillSheet } from '$lib/server/bills/bill-sheet';
import { parseEquipmentSheet } from '$lib/server/sites/equipment-sheet/parse';
import { parseTariffSheet } from '$lib/server/tariffs/sheet-import';
import { linuxProgram, pngHead, windowsProgram, zipBomb } from './hostile-fixture';
import { MAX_SHEET_BYTES, readSheet, type SheetKind } from './read-sheet';
import { TOO_BIG_UNPACKED } from './zip-guard';

// The routes of the three imports put a sheet-level error next to their file field (`sheet`).
const read = (bytes: Uint8Array, kind: SheetKind) =>
	readSheet(bytes, kind, { maxRows: 10, rowWord: 'device' });
const BOMB = zipBomb(60 * 1024 * 1024);

describe('a program or an image under a sheet’s name', () => {
	const cases: [what: string, bytes: Uint8Array, kind: SheetKind, message: string][] = [
		['a Windows program named .xlsx', windowsProgram(), 'xlsx', 'The file is not a readable XLSX workbook'],
		['a Linux program named .xlsx', linuxProgram(), 'xlsx', 'The file is not a readable XLSX workbook'],
		['a PNG image named .xlsx', pngHead(), 'xlsx', 'The file is not a readable XLSX workbook'],
		[
			'a Windows program named .csv',
			windowsProgram(),
			'csv',
			'The file is not a CSV text file (it is not UTF-8 text)'
		],
		['a Linux program named .csv', linuxProgram(), 'csv', 'The file is not a CSV text file'],
		['a PNG image named .csv', pngHead(), 'csv', 'The file is not a CSV text file (it is not UTF-8 text)']
	];
	it.each(cases)('refuses %s', async (_, bytes, kind, message) => {
		expect(await read(bytes, kind)).toEqual({ error: message });
	});
});

describe('a body over the limit', () => {
	it.each(['csv', 'xlsx'] as const)(
		'is refused as %s by its length, before anything reads it',
		async (kind) => {
			expect(await read(new Uint8Array(MAX_SHEET_BYTES + 1), kind)).toEqual({
				error: 'The file is larger than 5 MB, the most an import sheet can be'
			});
		}
	);
});

describe('a zip bomb named .xlsx', () => {
	it('is refused by the shared reader before exceljs opens it', async () => {
		expect(await read(BOMB, 'xlsx')).toEqual({ error: TOO_BIG_UNPACKED });
	});

	it('is refused by each import with the same sheet-level message', async () => {
		expect((await parseTariffSheet(BOMB, 'xlsx')).sheetErrors).toEqual([TOO_BIG_UNPACKED]);
		expect(await parseEquipmentSheet(BOMB, 'xlsx')).toEqual({ error: TOO_BIG_UNPACKED });
		expect(await parseBillSheet(BOMB, 'xlsx', [])).toEqual({ error: TOO_BIG_UNPACKED });
	});
});
