import Papa from 'papaparse';
import { readFirstSheet } from './first-sheet';

/**
 * Reading an uploaded sheet (CSV, or the first worksheet of an XLSX workbook) into rows of trimmed
 * text cells, for the tariff and equipment imports. Nothing here knows what the columns mean.
 */
export type SheetKind = 'csv' | 'xlsx';
export type Grid = { line: number; cells: string[] }[];

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

/**
 * The non-blank rows of a sheet as it is read: the header and at most `maxRows` rows below it. One row
 * more and the sheet is over the limit; `add` then answers false and the reader stops there, so a sheet
 * of 250,000 rows is never read past its 2,002nd.
 */
class Rows {
	readonly grid: Grid = [];
	over = false;
	constructor(private readonly keep: number) {}
	add(line: number, cells: string[]): boolean {
		const trimmed = cells.map((cell) => unquote(cell.trim()));
		if (blank(trimmed)) return true;
		if (this.grid.length === this.keep) {
			this.over = true;
			return false;
		}
		this.grid.push({ line, cells: trimmed });
		return true;
	}
}

/** Null when the text was read into `rows` (up to where they passed the limit), else the message. */
function readCsv(bytes: Uint8Array, rows: Rows): string | null {
	let text: string;
	try {
		text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
	} catch {
		return 'The file is not a CSV text file (it is not UTF-8 text)';
	}
	if (text.includes('\0')) return 'The file is not a CSV text file';
	let line = 0;
	let unclosed: number | null = null;
	// Row by row (papaparse's step mode), aborted once the rows pass the limit.
	Papa.parse<string[]>(text, {
		skipEmptyLines: false,
		step: (result, parser) => {
			line += 1;
			if (result.errors.some((error) => error.type === 'Quotes')) {
				unclosed = line;
				parser.abort();
			} else if (!rows.add(line, result.data)) parser.abort();
		}
	});
	return unclosed === null ? null : `Row ${unclosed}: a quoted cell is never closed`;
}

/** The sheet is read no further than the row past the limit, so the message cannot say how many it has. */
export const tooManyRows = (maxRows: number, rowWord: string) =>
	`The sheet has more than ${maxRows} ${rowWord} rows; one import can hold at most ${maxRows}`;
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
	const rows = new Rows(maxRows + 1);
	const refused =
		kind === 'csv'
			? readCsv(bytes, rows)
			: await readFirstSheet(bytes, (row) => rows.add(row.line, row.cells));
	if (refused) return { error: refused };
	if (rows.over) return { error: tooManyRows(maxRows, rowWord) };
	const [header, ...body] = rows.grid;
	if (!header) return { error: `The sheet is empty: it needs a header row and at least one ${rowWord} row` };
	if (body.length === 0) return { error: `The sheet has a header row but no ${rowWord} rows` };
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
