import { billSchema, type BillInput } from '$lib/forms/bill.schema';
import { type SheetKind, readSheet } from '$lib/server/sheets/read-sheet';

/**
 * Many bills at once from a sheet: one row per bill with the columns below (the header names them; a
 * few common other names are understood). Rows are checked with the form's schema; a row whose period
 * overlaps another row, or a bill already stored, is refused — such bills are entered one by one.
 */
export const BILL_COLUMNS = [
	{
		field: 'periodFrom',
		name: 'period_from',
		meaning: 'First day of the billing period, as 2026-01-01.',
		aliases: ['from', 'start', 'first day']
	},
	{
		field: 'periodTo',
		name: 'period_to',
		meaning: 'Last day of the billing period (inclusive).',
		aliases: ['to', 'end', 'last day']
	},
	{ field: 'kwh', name: 'kwh', meaning: 'kWh billed.', aliases: ['kwh billed', 'usage', 'energy'] },
	{
		field: 'amount',
		name: 'amount',
		meaning: 'Amount billed, in the site’s currency.',
		aliases: ['total', 'amount billed', 'cost']
	},
	{
		field: 'peakKw',
		name: 'peak_kw',
		meaning: 'Peak kW, if the bill shows one.',
		aliases: ['peak', 'demand', 'demand kw']
	},
	{ field: 'notes', name: 'notes', meaning: 'Free text.', aliases: ['note', 'comment'] }
] as const;

export const MAX_BILL_ROWS = 500;

export interface BillSheetRow {
	line: number;
	bill: BillInput;
}
export interface BillSheetError {
	line: number;
	field: string;
	message: string;
}

const words = (header: string) =>
	header
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, ' ')
		.trim();

export async function parseBillSheet(
	bytes: Uint8Array,
	kind: SheetKind,
	stored: { periodFrom: string; periodTo: string }[]
): Promise<{ rows: BillSheetRow[]; errors: BillSheetError[] } | { error: string }> {
	const table = await readSheet(bytes, kind, { maxRows: MAX_BILL_ROWS, rowWord: 'bill' });
	if ('error' in table) return table;
	const header = table.header.cells.map(words);
	const index = new Map<string, number>();
	for (const c of BILL_COLUMNS) {
		const at = header.findIndex((h) => h === words(c.name) || (c.aliases as readonly string[]).includes(h));
		if (at !== -1) index.set(c.field, at);
	}
	const missing = BILL_COLUMNS.filter(
		(c) => c.field !== 'peakKw' && c.field !== 'notes' && !index.has(c.field)
	);
	if (missing.length)
		return { error: `The header row needs these columns: ${missing.map((c) => c.name).join(', ')}` };
	const name = new Map<string, string>(BILL_COLUMNS.map((c) => [c.field, c.name]));
	const rows: BillSheetRow[] = [];
	const errors: BillSheetError[] = [];
	for (const { line, cells } of table.body) {
		const input = Object.fromEntries(
			BILL_COLUMNS.map((c) => [c.field, cells[index.get(c.field) ?? -1] ?? ''])
		);
		const parsed = billSchema.safeParse(input);
		if (!parsed.success) {
			for (const issue of parsed.error.issues) {
				errors.push({ line, field: name.get(String(issue.path[0])) ?? 'row', message: issue.message });
			}
			continue;
		}
		const b = parsed.data;
		const overlaps = (o: { periodFrom: string; periodTo: string }) =>
			o.periodFrom <= b.periodTo && o.periodTo >= b.periodFrom;
		const earlier = rows.find((r) => overlaps(r.bill));
		if (earlier) {
			errors.push({ line, field: 'period_from', message: `Overlaps the bill in row ${earlier.line}` });
		} else if (stored.some(overlaps)) {
			errors.push({ line, field: 'period_from', message: 'Overlaps a bill already entered for this site' });
		} else rows.push({ line, bill: b });
	}
	return { rows, errors };
}

export const billTemplateCsv = () =>
	'period_from,period_to,kwh,amount,peak_kw,notes\r\n2026-01-06,2026-02-04,1420,231.87,,Invented example row\r\n2026-02-05,2026-03-05,1288,214.02,,Invented example row\r\n';
