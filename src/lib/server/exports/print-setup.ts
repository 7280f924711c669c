import type { Worksheet } from 'exceljs';

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
	const range = sheet.dimensions.range;
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
