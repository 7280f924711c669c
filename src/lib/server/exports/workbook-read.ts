/** Reading an exported workbook back in the workbook's tests. */
import ExcelJS from 'exceljs';
import { beforeAll } from 'vitest';
import { type ComparisonExport, comparisonWorkbook } from './comparison-workbook';

/** Builds the workbook of an export and reads it back with exceljs, as a reader's program would open it. */
export async function readBack(input: ComparisonExport): Promise<ExcelJS.Workbook> {
	const buffer = await comparisonWorkbook(input);
	const workbook = new ExcelJS.Workbook();
	// exceljs types its input as its own Buffer (an ArrayBuffer); Node's Buffer is what it reads at run time.
	await workbook.xlsx.load(buffer as unknown as ExcelJS.Buffer);
	return workbook;
}

/**
 * The workbook of `input`, built and read back once before a describe's tests (a workbook takes a
 * while): call the returned function in a test to get it.
 */
export function readBackOnce(input: ComparisonExport): () => ExcelJS.Workbook {
	let workbook: ExcelJS.Workbook | undefined;
	beforeAll(async () => {
		workbook = await readBack(input);
	});
	return () => workbook!;
}

/** A sheet of the workbook by name; a missing one fails the test. */
export function sheet(workbook: ExcelJS.Workbook, name: string): ExcelJS.Worksheet {
	const found = workbook.getWorksheet(name);
	if (!found) throw new Error(`No sheet ${name}`);
	return found;
}

/** The letter of the Monthly sheet's column headed `header` (row 4, the first such); none fails the test. */
export function monthlyColumn(monthly: ExcelJS.Worksheet, header: string): string {
	let found = 0;
	monthly.getRow(4).eachCell((cell, col) => {
		if (!found && cell.value === header) found = col;
	});
	if (!found) throw new Error(`no column ${header}`);
	return monthly.getColumn(found).letter;
}

/** A formula cell's formula (shared copies give theirs translated) and cached result. */
export function formulaAt(
	worksheet: ExcelJS.Worksheet,
	address: string
): { formula: string; result: unknown } {
	const cell = worksheet.getCell(address);
	if (cell.type !== ExcelJS.ValueType.Formula) throw new Error(`${address} holds no formula`);
	// exceljs reads a cached 0 back as no result.
	return { formula: cell.formula, result: cell.result ?? 0 };
}

/** Every text cell of a sheet. */
export function texts(worksheet: ExcelJS.Worksheet): string[] {
	const found: string[] = [];
	worksheet.eachRow((row) =>
		row.eachCell((cell) => void (typeof cell.value === 'string' && found.push(cell.value)))
	);
	return found;
}
