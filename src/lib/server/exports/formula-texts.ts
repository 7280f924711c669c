import ExcelJS from 'exceljs';

/**
 * Texts a spreadsheet would run as formulas, one for each leading character OWASP's "CSV Injection"
 * page lists, for the tests of every export that writes a user's text into a CSV or XLSX file.
 * Invented texts; example.org addresses only.
 */
export const FORMULA_TEXTS = [
	'=HYPERLINK("http://example.org/x","Pump")',
	'+1+1',
	'-2+3',
	'@SUM(1+1)',
	'\t=1+1',
	'\r=1+1'
] as const;

/** A cell that starts like a formula: what no export may write. */
export const LOOKS_LIKE_FORMULA = /^[=+\-@\t\r]/;

export const neutralised = (text: string) => `'${text}`;

/** A neutralised text as a workbook reads back: XML 1.0 §2.11 has a parser read a CR as a line feed. */
export const readBackAs = (text: string) => neutralised(text).replace(/\r\n?/g, '\n');

/** Every text cell and every number (values and cached formula results) of a workbook. */
export function cellsOf(workbook: ExcelJS.Workbook): { texts: string[]; numbers: number[] } {
	const texts: string[] = [];
	const numbers: number[] = [];
	for (const sheet of workbook.worksheets)
		sheet.eachRow((row) =>
			row.eachCell((cell) => {
				if (typeof cell.value === 'string') texts.push(cell.value);
				if (typeof cell.value === 'number') numbers.push(cell.value);
				if (cell.type === ExcelJS.ValueType.Formula && typeof cell.result === 'number')
					numbers.push(cell.result);
			})
		);
	return { texts, numbers };
}
