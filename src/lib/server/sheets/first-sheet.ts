import ExcelJS from 'exceljs';
import { Readable } from 'node:stream';
import { NOT_A_WORKBOOK, readZip, type ZipEntry } from './zip-guard';

/**
 * The rows of an XLSX workbook's first worksheet, read as a stream: exceljs's streaming reader parses
 * the sheet's XML a chunk at a time and the caller stops as soon as it has seen enough rows, so a sheet
 * of 250,000 rows costs no more than one of 2,001. (exceljs's whole-workbook reader builds every row in
 * memory first: 6 seconds and 650 MB of a single-threaded server for a 2.5 MB file.)
 *
 * The streaming reader is never given the upload itself. It reads an archive front to back by its local
 * headers, where the zip guard (like JSZip) reads the central directory; a file laid out so the two
 * disagree could show the reader parts the guard never counted. So the reader gets an archive rebuilt
 * from the parts the guard inflated and counted, holding only what it needs, in the order it needs:
 * the workbook's relationships and its list of sheets, the styles (without them dates read as
 * numbers), the shared strings, then the worksheets. In that order it never parks a worksheet in a
 * temporary file to wait for the shared strings.
 */

/** A row by its number in the sheet, with each cell's text (untrimmed) in the cell's own column. */
export type SheetRow = { line: number; cells: string[] };
export const NO_WORKSHEET = 'The workbook has no worksheet';

const RELS = 'xl/_rels/workbook.xml.rels';
const WORKBOOK = 'xl/workbook.xml';
const STYLES = 'xl/styles.xml';
const SHARED_STRINGS = 'xl/sharedStrings.xml';
/** The one path exceljs reads worksheets from (its whole-workbook reader too). */
const WORKSHEET = /^xl\/worksheets\/sheet(\d+)\.xml$/;

/** A part the rebuilt archive needs and the workbook may lack: written, stored, by us. */
function made(name: string, xml: string): ZipEntry {
	const data = Buffer.from(xml);
	return { name, method: 0, crc: 0, unpackedBytes: data.byteLength, data };
}

/** Local header and data of each part, then the end record (PKWARE APPNOTE 6.3 §4.3): all unzipper reads. */
function archiveOf(entries: ZipEntry[]): Buffer {
	const pieces: Buffer[] = [];
	for (const entry of entries) {
		const name = Buffer.from(entry.name);
		const header = Buffer.alloc(30);
		header.writeUInt32LE(0x04034b50, 0);
		header.writeUInt16LE(20, 4); // version needed: 2.0; flags 0: the sizes are in this header
		header.writeUInt16LE(entry.method, 8);
		header.writeUInt32LE(entry.crc, 14);
		header.writeUInt32LE(entry.data.byteLength, 18);
		header.writeUInt32LE(entry.unpackedBytes, 22);
		header.writeUInt16LE(name.byteLength, 26);
		pieces.push(header, name, entry.data);
	}
	const end = Buffer.alloc(22);
	end.writeUInt32LE(0x06054b50, 0);
	return Buffer.concat([...pieces, end]);
}

/** The parts the streaming reader needs, in its order, or null when the workbook has no sheet list. */
function readerParts(entries: ZipEntry[]): ZipEntry[] | null {
	const named = new Map(entries.map((entry) => [entry.name, entry]));
	const workbook = named.get(WORKBOOK);
	if (!workbook) return null;
	const sheetNumber = (entry: ZipEntry) => Number(WORKSHEET.exec(entry.name)![1]);
	const sheets = entries.filter((entry) => WORKSHEET.test(entry.name));
	sheets.sort((a, b) => sheetNumber(a) - sheetNumber(b));
	return [
		named.get(RELS) ?? made(RELS, '<Relationships/>'),
		workbook,
		...(named.has(STYLES) ? [named.get(STYLES)!] : []),
		named.get(SHARED_STRINGS) ?? made(SHARED_STRINGS, '<sst/>'),
		...sheets
	];
}

/**
 * The bytes in 64 kB pieces, each handed over on a later turn of the event loop: a stored (not
 * deflated) sheet would otherwise be parsed start to finish without another request getting a turn.
 */
function paced(bytes: Buffer): Readable {
	let at = 0;
	return new Readable({
		read() {
			setImmediate(() => {
				const piece = bytes.subarray(at, at + 64 * 1024);
				at += piece.byteLength;
				this.push(piece.byteLength ? piece : null);
			});
		}
	});
}

/** Number formats that show a date (as exceljs decides it: y, m, d, h, s or b outside quotes and brackets). */
const isDateFormat = (format: string | undefined) =>
	!!format && /[ymdhMsb]/.test(format.replace(/\[[^\]]*]/g, '').replace(/"[^"]*"/g, ''));
/** A spreadsheet's day number as the UTC midnight of that day (1900 date system). */
const fromSerial = (days: number) => new Date(Math.round((days - 25569) * 86_400_000));

/** A cell's value as the text the sheet shows. Dates come back as the ISO date the sheet shows. */
function cellText(value: ExcelJS.CellValue, format?: string): string {
	if (value === null || value === undefined) return '';
	if (value instanceof Date) return Number.isNaN(value.getTime()) ? '' : value.toISOString().slice(0, 10);
	if (typeof value === 'number' && Number.isNaN(value)) return '';
	if (typeof value !== 'object') return String(value);
	if ('richText' in value) return value.richText.map((run) => run.text ?? '').join('');
	if ('error' in value) return value.error;
	if ('formula' in value || 'sharedFormula' in value) {
		// The streaming reader leaves a formula's result a number even where the cell shows a date.
		const result = value.result as ExcelJS.CellValue;
		return typeof result === 'number' && isDateFormat(format)
			? cellText(fromSerial(result))
			: cellText(result);
	}
	if ('text' in value) return cellText(value.text as ExcelJS.CellValue);
	return '';
}

type ReaderState = { model?: { sheets?: { id?: number }[] } };
type SheetState = { id?: number };

/**
 * Calls `take` with each row of the workbook's first worksheet (first in the workbook's own order of
 * tabs) until it returns false or the sheet ends. Null when the sheet was read, else the message.
 */
export async function readFirstSheet(
	bytes: Uint8Array,
	take: (row: SheetRow) => boolean
): Promise<string | null> {
	const entries = await readZip(bytes);
	if (typeof entries === 'string') return entries;
	const parts = readerParts(entries);
	if (!parts) return NOT_A_WORKBOOK;
	const input = paced(archiveOf(parts));
	const reader = new ExcelJS.stream.xlsx.WorkbookReader(input, {
		worksheets: 'emit',
		sharedStrings: 'cache',
		styles: 'cache',
		hyperlinks: 'ignore',
		entries: 'ignore'
	});
	try {
		for await (const sheet of reader) {
			const firstTab = (reader as unknown as ReaderState).model?.sheets?.[0]?.id;
			// Another tab's part: left unread (the reader skips its bytes without parsing them).
			if (firstTab !== undefined && (sheet as unknown as SheetState).id !== firstTab) continue;
			let line = 0;
			for await (const row of sheet) {
				// A row without its number (the attribute is optional) follows the one before.
				line = Number.isInteger(row.number) && row.number > line ? row.number : line + 1;
				const cells: string[] = [];
				row.eachCell((cell, col) => (cells[col - 1] = cellText(cell.value, cell.numFmt)));
				if (!take({ line, cells: Array.from(cells, (cell) => cell ?? '') })) break;
			}
			return null;
		}
		return NO_WORKSHEET;
	} catch {
		return NOT_A_WORKBOOK;
	} finally {
		input.destroy();
	}
}
