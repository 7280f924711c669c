import { describe, expect, it } from 'vitest';
import { billSchema } from '$lib/forms/bill.schema';
import { billTemplateCsv, parseBillSheet } from './bill-sheet';

// Invented bills; no real utility or account.
const bytes = (text: string) => new TextEncoder().encode(text);
const read = async (text: string, stored: { periodFrom: string; periodTo: string }[] = []) => {
	const sheet = await parseBillSheet(bytes(text), 'csv', stored);
	if ('error' in sheet) throw new Error(sheet.error);
	return sheet;
};

describe('a bill sheet', () => {
	it('reads the template’s invented rows', async () => {
		const sheet = await read(billTemplateCsv());
		expect(sheet.errors).toEqual([]);
		expect(sheet.rows.map((r) => r.bill)).toEqual([
			{
				periodFrom: '2026-01-06',
				periodTo: '2026-02-04',
				kwh: 1420,
				amount: 231.87,
				peakKw: null,
				lineItems: [],
				notes: 'Invented example row'
			},
			{
				periodFrom: '2026-02-05',
				periodTo: '2026-03-05',
				kwh: 1288,
				amount: 214.02,
				peakKw: null,
				lineItems: [],
				notes: 'Invented example row'
			}
		]);
	});

	it('understands common other column names', async () => {
		const sheet = await read('Start,End,Usage,Total,Demand kW\n2026-04-01,2026-04-30,900,120.5,4.2\n');
		expect(sheet.rows[0]?.bill).toMatchObject({
			periodFrom: '2026-04-01',
			periodTo: '2026-04-30',
			kwh: 900,
			amount: 120.5,
			peakKw: 4.2
		});
	});

	it('names the columns it needs', async () => {
		expect(await parseBillSheet(bytes('from,kwh\n2026-01-01,5\n'), 'csv', [])).toEqual({
			error: 'The header row needs these columns: period_to, amount'
		});
	});

	it('refuses dates out of order, impossible dates and overlaps, row by row', async () => {
		const sheet = await read(
			'period_from,period_to,kwh,amount\n2026-02-10,2026-02-01,5,1\n2026-02-30,2026-03-10,5,1\n2026-05-01,2026-05-31,5,1\n2026-05-20,2026-06-19,5,1\n2026-07-01,2026-07-31,x,1\n2026-09-01,2026-09-30,5,1\n',
			[{ periodFrom: '2026-09-15', periodTo: '2026-10-14' }]
		);
		expect(sheet.errors).toEqual([
			{ line: 2, field: 'period_to', message: 'The last day must not be before the first day' },
			{ line: 3, field: 'period_from', message: 'First day is not a real date' },
			{ line: 5, field: 'period_from', message: 'Overlaps the bill in row 4' },
			{ line: 6, field: 'kwh', message: 'kWh billed must be a number' },
			{ line: 7, field: 'period_from', message: 'Overlaps a bill already entered for this site' }
		]);
		expect(sheet.rows.map((r) => r.line)).toEqual([4]);
	});
});

describe('a bill', () => {
	it('may not span more than 100 days (common practice: utilities bill monthly or bimonthly)', () => {
		const parsed = billSchema.safeParse({
			periodFrom: '2026-01-01',
			periodTo: '2026-04-30',
			kwh: 1,
			amount: 1
		});
		expect(parsed.success).toBe(false);
		expect(parsed.error?.issues[0]?.message).toBe('A billing period is at most 100 days; this one is 120');
	});
});
