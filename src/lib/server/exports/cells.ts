import type { Alignment, Borders, Cell, CellFormulaValue, Fill, Font, Style, Worksheet } from 'exceljs';
import { neutraliseFormula } from './safe-text';

/** A formula's cached result as the workbook stores it (programs that do not recalculate show it). */
export type Result = number | string | null;

/** Column letters of a 1-based column number: 1 is A, 28 is AB. */
export function columnName(col: number): string {
	let name = '';
	for (let n = col; n > 0; n = Math.floor((n - 1) / 26))
		name = String.fromCharCode(65 + ((n - 1) % 26)) + name;
	return name;
}

/** An A1 reference; `fixed` pins both the column and the row ($A$1). */
export function a1(col: number, row: number, fixed = false): string {
	return fixed ? `$${columnName(col)}$${row}` : `${columnName(col)}${row}`;
}

/** A reference into another sheet. Sheet names are made without apostrophes, so none need doubling. */
export function on(sheet: string, reference: string): string {
	return `'${sheet}'!${reference}`;
}

/** A fixed range of one column, or null when it holds no rows (a scenario without equipment). */
export function columnRange(sheet: string, col: number, from: number, to: number): string | null {
	return to < from ? null : on(sheet, `${a1(col, from, true)}:${a1(col, to, true)}`);
}

/** SUM of the given ranges and references, or 0 when there are none. */
export function sumOf(parts: ReadonlyArray<string | null>): string {
	const present = parts.filter((part): part is string => part !== null);
	return present.length > 0 ? `SUM(${present.join(',')})` : '0';
}

const GREY = { argb: 'FF4B5563' };
/** A column's width when none was set, in characters (the spreadsheets' default). */
const DEFAULT_WIDTH_CHARS = 9;
/** A bold character is about this many normal characters wide. */
const BOLD_CHAR_WIDTH = 1.15;
/** The height of one line of 11-point text, in points. */
const LINE_HEIGHT_PT = 15;
const WRAP: Partial<Alignment> = { wrapText: true, vertical: 'top' };
const BOLD: Partial<Font> = { bold: true };
const solid = (argb: string): Fill => ({ type: 'pattern', pattern: 'solid', fgColor: { argb } });
const HEADER_BORDER: Partial<Borders> = { bottom: { style: 'thin', color: { argb: 'FF9CA3AF' } } };

/** How a cell looks. Live inputs a reader may change have a pale fill, so they stand out. */
const LOOKS = {
	plain: {},
	input: { fill: solid('FFFFF7DB') },
	bold: { font: BOLD },
	wrap: { alignment: WRAP },
	boldWrap: { font: BOLD, alignment: WRAP },
	title: { font: { bold: true, size: 14 }, alignment: WRAP },
	heading: { font: { bold: true, size: 12 } },
	note: { font: { italic: true, color: GREY }, alignment: WRAP },
	helper: { font: { italic: true, color: { argb: 'FF6B7280' } } },
	header: { font: BOLD, fill: solid('FFE5EEF0'), border: HEADER_BORDER, alignment: WRAP }
} satisfies Record<string, Partial<Style>>;

export type Look = keyof typeof LOOKS;

/**
 * Writes cells of one sheet: texts are always neutralised, numbers and formulas get their format.
 * Cells that look alike share one style object, which the writer of the file recognises at once.
 */
export class SheetWriter {
	/** By look, then by number format ('' for none): no key string is built per cell. */
	private readonly styles = new Map<Look, Map<string, Partial<Style>>>();

	constructor(
		readonly sheet: Worksheet,
		readonly name: string
	) {}

	private style(look: Look, numFmt: string | undefined): Partial<Style> {
		let byFormat = this.styles.get(look);
		if (!byFormat) this.styles.set(look, (byFormat = new Map()));
		let style = byFormat.get(numFmt ?? '');
		if (!style) {
			style = numFmt ? { ...LOOKS[look], numFmt } : { ...LOOKS[look] };
			byFormat.set(numFmt ?? '', style);
		}
		return style;
	}

	/** The cell by its row: `sheet.getCell(row, col)` would spell its address and parse it again. */
	private cell(row: number, col: number): Cell {
		return this.sheet.getRow(row).getCell(col);
	}

	text(row: number, col: number, text: string, look: Look = 'plain'): void {
		const cell = this.cell(row, col);
		cell.value = neutraliseFormula(text);
		cell.style = this.style(look, undefined);
	}

	number(row: number, col: number, value: number | null, numFmt?: string, look: Look = 'plain'): void {
		if (value === null) return;
		const cell = this.cell(row, col);
		cell.value = value;
		cell.style = this.style(look, numFmt);
	}

	formula(
		row: number,
		col: number,
		formula: string,
		result: Result,
		numFmt?: string,
		look: Look = 'plain'
	): void {
		const cell = this.cell(row, col);
		cell.value = result === null ? { formula } : { formula, result };
		cell.style = this.style(look, numFmt);
	}

	/**
	 * A formula whose copies fill `ref` (this cell at its top left; see `shared`), marked as shared
	 * here because the streaming writer writes this cell before any copy. That writer numbers the
	 * shared formulas afresh on each row, so a sheet's masters must all be on one row (a test checks
	 * the written file).
	 */
	master(row: number, col: number, formula: string, ref: string, result: Result, numFmt?: string): void {
		const cell = this.cell(row, col);
		// exceljs's own form for a master with its range (its README, "Shared Formula"), not in its types.
		const value: CellFormulaValue & { shareType: 'shared'; ref: string } =
			result === null ? { formula, shareType: 'shared', ref } : { formula, result, shareType: 'shared', ref };
		cell.value = value;
		cell.style = this.style('plain', numFmt);
	}

	/**
	 * A copy of the shared formula whose master cell (above or to the left) is `master`: the file
	 * stores the formula once, and each copy shifts its relative references as a fill-down would.
	 */
	shared(row: number, col: number, master: string, result: Result, numFmt?: string): void {
		const cell = this.cell(row, col);
		cell.value = result === null ? { sharedFormula: master } : { sharedFormula: master, result };
		cell.style = this.style('plain', numFmt);
	}

	/**
	 * A header row: bold on a pale band, wrapped, with a rule beneath. The row is made tall enough for
	 * its longest wrapped label (spreadsheets do not grow a row for wrapped text on opening, so a
	 * printed header would otherwise run over the first row of figures). Set the widths first.
	 */
	headers(row: number, col: number, labels: readonly string[]): void {
		labels.forEach((label, i) => this.text(row, col + i, label, 'header'));
		const lines = Math.max(
			1,
			...labels.map((label, i) => {
				const width = this.sheet.getColumn(col + i).width ?? DEFAULT_WIDTH_CHARS;
				return Math.ceil((label.length * BOLD_CHAR_WIDTH) / Math.max(1, width - 1));
			})
		);
		const current = this.sheet.getRow(row).height ?? 0;
		if (lines > 1) this.sheet.getRow(row).height = Math.max(current, lines * LINE_HEIGHT_PT);
	}

	/** A line of text across `cols` columns (a title, a note). */
	line(row: number, text: string, cols: number, look: Look = 'wrap'): void {
		this.text(row, 1, text, look);
		if (cols > 1) this.sheet.mergeCells(row, 1, row, cols);
	}

	widths(widths: readonly number[], from = 1): void {
		widths.forEach((width, i) => {
			this.sheet.getColumn(from + i).width = width;
		});
	}

	/** Frozen panes, for a sheet of a workbook in memory (a streaming sheet takes them when added). */
	freeze(rows: number, cols: number): void {
		this.sheet.views = [{ state: 'frozen', xSplit: cols, ySplit: rows }];
	}
}
