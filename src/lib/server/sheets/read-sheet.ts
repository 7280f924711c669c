import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { NOT_A_WORKBOOK, refuseZip } from './zip-guard';

/**
 * Reading an uploaded sheet (CSV, or the first worksheet of an XLSX workbook) into rows of trimmed
 * text cells, for the tariff and equipment imports. Nothing here knows what the columns mean.
 */
export type SheetKind = 'csv' | 'xlsx';
export type Grid = { line: number; cells: string[] }[];
export type Read = { grid: Grid } | { error: string };

export const MAX_SHEET_BYTES = 5 * 1024 * 1024;

/** The kind a file name announces, or null; the reader still refuses bytes that are not that kind. */
export function sheetKind(fileName: string): SheetKind | null {
	const name = fileName.toLowerCase();
	if (name.endsWith('.csv') || name.endsWith('.txt')) return 'csv';
	if (name.endsWith('.xlsx')) return 'xlsx';
	return null;
}

/** A cell written by our exports as text that looks like a formula ("'=x") reads back as it was typed. */
const unquote = (cell: string) => (/^'[=+\-@]/.test(cell) ? cell.slice(1) : cell);

function readCsv(bytes: Uint8Array): Read {
	let text: string;
	try {
		text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
	} catch {
		return { error: 'The file is not a CSV text file (it is not UTF-8 text)' };
	}
	if (text.includes('\0')) return { error: 'The file is not a CSV text file' };
	const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false });
	const quote = parsed.errors.find((error) => error.type === 'Quotes');
	if (quote) return { error: `Row ${(quote.row ?? 0) + 1}: a quoted cell is never closed` };
	return {
		grid: parsed.data.map((cells, i) => ({ line: i + 1, cells: cells.map((cell) => unquote(cell.trim())) }))
	};
}

function cellText(value: ExcelJS.CellValue): string {
	if (value === null || value === undefined) return '';
	// Date cells come back as UTC midnight of the date the sheet shows.
	if (value instanceof Date) return Number.isNaN(value.getTime()) ? '' : value.toISOString().slice(0, 10);
	if (typeof value !== 'object') return String(value);
	if ('richText' in value) return value.richText.map((run) => run.text).join('');
	if ('error' in value) return value.error;
	if ('formula' in value || 'sharedFormula' in value) return cellText(value.result as ExcelJS.CellValue);
	if ('text' in value) return cellText(value.text as ExcelJS.CellValue);
	return '';
}

async function readXlsx(bytes: Uint8Array, maxRows: number, rowWord: string): Promise<Read> {
	// exceljs unpacks every part into memory: a workbook that unpacks too far never reaches it.
	const refused = await refuseZip(bytes);
	if (refused) return { error: refused };
	const workbook = new ExcelJS.Workbook();
	try {
		// exceljs types its argument as an ArrayBuffer; a copy gives exactly the file's bytes.
		await workbook.xlsx.load(bytes.slice().buffer);
	} catch {
		return { error: NOT_A_WORKBOOK };
	}
	const sheet = workbook.worksheets[0];
	if (!sheet) return { error: 'The workbook has no worksheet' };
	if (sheet.actualRowCount > maxRows + 1)
		return { error: tooManyRows(sheet.actualRowCount - 1, maxRows, rowWord) };
	const grid: Grid = [];
	sheet.eachRow((row, line) => {
		const cells: string[] = [];
		row.eachCell((cell, col) => (cells[col - 1] = unquote(cellText(cell.value).trim())));
		grid.push({ line, cells: Array.from(cells, (cell) => cell ?? '') });
	});
	return { grid };
}

export const tooManyRows = (count: number, maxRows: number, rowWord: string) =>
	`The sheet has ${count} ${rowWord} rows; one import can hold at most ${maxRows}`;
export const blank = (cells: string[]) => cells.every((cell) => cell === '');

export interface SheetTable {
	header: Grid[number];
	body: Grid;
}

/**
 * The header row and the non-blank rows below it, or why the file cannot be read as a sheet at all
 * (empty, too big, not that kind of file, no rows). `rowWord` names a row in messages ("tariff").
 */
export async function readSheet(
	bytes: Uint8Array,
	kind: SheetKind,
	{ maxRows, rowWord }: { maxRows: number; rowWord: string }
): Promise<SheetTable | { error: string }> {
	if (bytes.byteLength === 0) return { error: 'The file is empty' };
	if (bytes.byteLength > MAX_SHEET_BYTES) {
		return { error: 'The file is larger than 5 MB, the most an import sheet can be' };
	}
	const read = kind === 'csv' ? readCsv(bytes) : await readXlsx(bytes, maxRows, rowWord);
	if ('error' in read) return read;
	const [header, ...body] = read.grid.filter((row) => !blank(row.cells));
	if (!header) return { error: `The sheet is empty: it needs a header row and at least one ${rowWord} row` };
	if (body.length === 0) return { error: `The sheet has a header row but no ${rowWord} rows` };
	if (body.length > maxRows) return { error: tooManyRows(body.length, maxRows, rowWord) };
	return { header, body };
}

const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_DECIMAL = /^[+-]?\d+,\d+$/;

/** A cell as a number, or the message a person needs: "Watts must use a dot for decimals, like 0.12". */
export function numberCell(raw: string, label: string): { value: number } | { message: string } {
	if (COMMA_DECIMAL.test(raw))
		return { message: `${label} must use a dot for decimals, like 0.12 (not 0,12)` };
	if (!PLAIN_NUMBER.test(raw))
		return { message: `${label} must be a number with a dot for decimals, like 0.12` };
	return { value: Number(raw) };
}
