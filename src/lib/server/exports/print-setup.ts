import type { Worksheet } from 'exceljs';
import { columnName } from './cells';

/** How one sheet prints: which rows (and columns) repeat on every page, and how many pages wide it is. */
export interface SheetPrint {
	/** Rows repeated at the top of every page, "1:4". */
	titleRows?: string;
	/** Columns repeated at the left of every page, "A:A". */
	titleColumns?: string;
	/** Pages across: 1 for the narrow sheets; the wide ones (48 monthly columns) get more. */
	pagesWide?: number;
}

/**
 * Print setup for a sheet, so the workbook prints to a few readable pages instead of dozens of split
 * columns: the used range as the print area, landscape, fitted to `pagesWide` pages across (as many
 * down as it needs), the title rows repeated, narrow margins in inches (exceljs's unit).
 */
export function printSetup(sheet: Worksheet, print: SheetPrint = {}): void {
	const range = usedRange(sheet);
	sheet.pageSetup = {
		...sheet.pageSetup,
		orientation: 'landscape',
		fitToPage: true,
		fitToWidth: print.pagesWide ?? 1,
		fitToHeight: 0,
		horizontalCentered: false,
		margins: { left: 0.4, right: 0.4, top: 0.5, bottom: 0.5, header: 0.3, footer: 0.3 },
		...(range ? { printArea: range } : {}),
		...(print.titleRows ? { printTitlesRow: print.titleRows } : {}),
		...(print.titleColumns ? { printTitlesColumn: print.titleColumns } : {})
	};
	sheet.headerFooter = { ...sheet.headerFooter, oddFooter: '&L&A&RPage &P of &N' };
}

/**
 * The range from the first to the last cell written, as `sheet.dimensions` gives it for a workbook in
 * memory; a streaming sheet does not keep its dimensions, but holds its rows until it is committed.
 */
function usedRange(sheet: Worksheet): string | undefined {
	let top = 0;
	let bottom = 0;
	let left = Infinity;
	let right = 0;
	sheet.eachRow((row, r) => {
		// Row.dimensions (the row's first and last cell with a value) is in exceljs but not its types.
		const used = (row as typeof row & { dimensions: { min: number; max: number } | null }).dimensions;
		if (!used) return;
		top ||= r;
		bottom = r;
		left = Math.min(left, used.min);
		right = Math.max(right, used.max);
	});
	return top ? `${columnName(left)}${top}:${columnName(right)}${bottom}` : undefined;
}
