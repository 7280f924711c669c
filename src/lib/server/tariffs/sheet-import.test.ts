import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { tiered } from '$lib/calc/tariffs.fixture';
import { MAX_SHEET_ROWS, TARIFF_SHEET_COLUMNS } from './sheet-columns';
import { describeRowError, parseTariffSheet } from './sheet-import';
import { tariffSheetTemplateCsv } from './sheet-template';

// Invented rows: the utilities and rates are fictional.
const FLAT: Record<string, string> = {
	utility: 'Demo Valley Power Cooperative (invented)',
	name: 'Pumping flat rate',
	country: 'US',
	customer_class: 'agricultural',
	currency: 'USD',
	timezone: 'America/Boise',
	effective_from: '2027-01-01',
	source: 'Invented for a test',
	checked_on: '2026-12-01',
	energy_per_kwh: '0.12'
};
const HEADER = [...Object.keys(FLAT), 'effective_to', 'holiday_country', 'holiday_region', 'rider_label'];
const TIER_HEADER = [
	...HEADER,
	'rider_per_kwh',
	...[1, 2, 3].flatMap((n) => [`tier${n}_upto_kwh`, `tier${n}_per_kwh`])
];

const encode = (text: string) => new TextEncoder().encode(text);
const csv = (rows: Record<string, string>[], header = HEADER) =>
	encode(Papa.unparse({ fields: header, data: rows.map((row) => header.map((name) => row[name] ?? '')) }));
const tieredRow = (tiers: Record<string, string>) => ({
	...FLAT,
	name: 'Tiered',
	energy_per_kwh: '',
	...tiers
});
const parseCsv = (rows: Record<string, string>[], header = HEADER) =>
	parseTariffSheet(csv(rows, header), 'csv');

describe('a CSV of flat and tiered tariffs', () => {
	it('reads the template’s two example rows into tariffs, lines counted from the header', async () => {
		const result = await parseTariffSheet(encode(tariffSheetTemplateCsv()), 'csv');
		expect(result.sheetErrors).toEqual([]);
		expect(result.errors).toEqual([]);
		const [flat, tiers] = result.rows;
		expect(result.rows.map((row) => row.line)).toEqual([2, 3]);
		expect(flat?.meta).toMatchObject({ utility: 'Demo Valley Power Cooperative (invented)', code: 'DV-R1' });
		expect(flat?.meta.holidays).toEqual({ country: 'US', region: 'ID' });
		expect(flat?.structure).toMatchObject({
			currency: 'USD',
			fixedCharges: [{ label: 'Customer charge', perMonth: 15.5 }],
			energyCharges: [{ type: 'flat', perKwh: 0.124 }],
			riders: [{ label: 'Power cost adjustment', perKwh: 0.011 }],
			taxes: [{ label: 'Franchise tax', percent: 3 }]
		});
		expect(tiers?.structure.energyCharges).toEqual([
			tiered('Energy', [500, 0.098], [1000, 0.128], [null, 0.162])
		]);
		expect(tiers?.structure.fixedCharges).toEqual([{ label: 'Customer charge', perDay: 0.4 }]);
		expect(tiers?.structure.minimumMonthly).toBe(18);
		expect(tiers?.version).toMatchObject({ effectiveFrom: '2027-01-01', effectiveTo: null });
	});

	it('matches header names whatever their case and spacing, and counts blank lines', async () => {
		const header = HEADER.map((name) => ` ${name.toUpperCase()} `).join(',');
		const row = HEADER.map((name) => FLAT[name] ?? '').join(',');
		const result = await parseTariffSheet(encode(`\uFEFF${header}\n\n${row}\n`), 'csv');
		expect(result.sheetErrors).toEqual([]);
		expect(result.rows.map((r) => r.line)).toEqual([3]);
	});

	it('takes a class written in words and leaves formula-like text as it is', async () => {
		const result = await parseCsv([{ ...FLAT, customer_class: 'Small commercial', name: '=Flat+1' }]);
		expect(result.rows[0]?.meta).toMatchObject({ customerClass: 'small-commercial', name: '=Flat+1' });
	});

	it('reads a negative rider as a credit', async () => {
		const result = await parseCsv([{ ...FLAT, rider_label: 'Credit', rider_per_kwh: '-0.004' }], TIER_HEADER);
		expect(result.rows[0]?.structure.riders).toEqual([{ label: 'Credit', perKwh: -0.004 }]);
	});
});

describe('an XLSX workbook', () => {
	async function workbookBytes(fill: (sheet: ExcelJS.Worksheet) => void): Promise<Uint8Array> {
		const workbook = new ExcelJS.Workbook();
		fill(workbook.addWorksheet('Tariffs'));
		return new Uint8Array(await workbook.xlsx.writeBuffer());
	}

	it('reads numbers, date cells and formula results, numbering rows as the sheet does', async () => {
		const bytes = await workbookBytes((sheet) => {
			sheet.addRow(TIER_HEADER);
			const values = TIER_HEADER.map((name) => FLAT[name] ?? null);
			const at = (name: string) => TIER_HEADER.indexOf(name);
			values[at('energy_per_kwh')] = { formula: '0.1+0.02', result: 0.12 } as never;
			values[at('effective_from')] = new Date(Date.UTC(2027, 0, 1)) as never;
			sheet.addRow(values);
			sheet.addRow([]);
			const row = [...values];
			row[at('energy_per_kwh')] = '';
			row[at('tier1_upto_kwh')] = 600 as never;
			row[at('tier1_per_kwh')] = 0.1 as never;
			row[at('tier2_per_kwh')] = 0.15 as never;
			row[at('name')] = 'Tiered';
			sheet.getRow(4).values = row;
		});
		const result = await parseTariffSheet(bytes, 'xlsx');
		expect(result.sheetErrors).toEqual([]);
		expect(result.errors).toEqual([]);
		expect(result.rows.map((r) => r.line)).toEqual([2, 4]);
		expect(result.rows[0]?.structure.energyCharges).toEqual([
			{ label: 'Energy', type: 'flat', perKwh: 0.12 }
		]);
		expect(result.rows[0]?.version.effectiveFrom).toBe('2027-01-01');
		expect(result.rows[1]?.structure.energyCharges[0]).toMatchObject({
			tiers: [
				{ uptoKwh: 600, perKwh: 0.1 },
				{ uptoKwh: null, perKwh: 0.15 }
			]
		});
	});

	it('refuses a workbook with only a header row', async () => {
		const bytes = await workbookBytes((sheet) => void sheet.addRow(HEADER));
		const result = await parseTariffSheet(bytes, 'xlsx');
		expect(result.sheetErrors).toEqual(['The sheet has a header row but no tariff rows']);
	});
});

describe('rows with mistakes', () => {
	it('reports each bad cell with its row and column, and keeps the good rows', async () => {
		const result = await parseCsv([
			FLAT,
			{ ...FLAT, energy_per_kwh: '-0.1' },
			{ ...FLAT, energy_per_kwh: '0,12' },
			{ ...FLAT, energy_per_kwh: 'twelve cents' },
			{ ...FLAT, customer_class: 'farmer' },
			{ ...FLAT, effective_from: '2027-02-30' },
			{ ...FLAT, timezone: 'Mars/Olympus_Mons' },
			{ ...FLAT, holiday_country: 'US', holiday_region: 'ZZ' },
			{ ...FLAT, currency: 'dollars' },
			{ ...FLAT, effective_to: '2026-12-31' },
			{ ...FLAT, utility: '' },
			{ ...FLAT, holiday_region: 'WI' }
		]);
		expect(result.rows.map((row) => row.line)).toEqual([2]);
		expect(result.errors).toEqual([
			{ line: 3, field: 'energy_per_kwh', message: 'Energy per kWh must be zero or more' },
			{
				line: 4,
				field: 'energy_per_kwh',
				message: 'Energy per kWh must use a dot for decimals, like 0.12 (not 0,12)'
			},
			{
				line: 5,
				field: 'energy_per_kwh',
				message: 'Energy per kWh must be a number with a dot for decimals, like 0.12'
			},
			{
				line: 6,
				field: 'customer_class',
				message:
					'Customer class must be one of: residential, small-commercial, commercial, agricultural, industrial, other'
			},
			{ line: 7, field: 'effective_from', message: 'Effective from is not a real calendar date' },
			{ line: 8, field: 'timezone', message: 'Time zone must be an IANA name such as America/Chicago' },
			{ line: 9, field: 'holiday_region', message: 'No holiday calendar for region ZZ of US' },
			{ line: 10, field: 'currency', message: 'Currency must be a three-letter code such as USD' },
			{ line: 11, field: 'effective_to', message: 'Effective to must be on or after effective from' },
			{ line: 12, field: 'utility', message: 'Utility is required' },
			{ line: 13, field: 'holiday_region', message: 'Give holiday_country together with holiday_region' }
		]);
	});

	it('words an error as a person reads it', async () => {
		const result = await parseCsv([FLAT, FLAT, { ...FLAT, energy_per_kwh: '-1' }]);
		expect(result.errors.map(describeRowError)).toEqual([
			'Row 3, effective_from: Row 2 already gives this tariff a version from 2027-01-01',
			'Row 4, energy_per_kwh: Energy per kWh must be zero or more'
		]);
	});

	it('asks for either a flat rate or tiers, and for a rider’s amount', async () => {
		const result = await parseCsv(
			[
				{ ...FLAT, tier1_per_kwh: '0.1' },
				{ ...FLAT, energy_per_kwh: '' },
				{ ...FLAT, rider_label: 'Fuel cost adjustment' }
			],
			TIER_HEADER
		);
		expect(result.errors).toEqual([
			{ line: 2, field: 'energy_per_kwh', message: 'Give energy_per_kwh or tiers, not both' },
			{
				line: 3,
				field: 'energy_per_kwh',
				message: 'Give energy_per_kwh for a flat tariff, or tier1_per_kwh and on for a tiered one'
			},
			{ line: 4, field: 'rider_per_kwh', message: 'Give rider_per_kwh with rider_label' }
		]);
	});
});

describe('tiers out of order', () => {
	it.each([
		[
			'a tier that ends below the one before',
			{
				tier1_upto_kwh: '500',
				tier1_per_kwh: '0.1',
				tier2_upto_kwh: '400',
				tier2_per_kwh: '0.12',
				tier3_per_kwh: '0.2'
			},
			{ field: 'tier2_upto_kwh', message: 'Each tier must end above the one before (500 kWh)' }
		],
		[
			'a gap between tiers',
			{ tier1_upto_kwh: '500', tier1_per_kwh: '0.1', tier3_per_kwh: '0.2' },
			{ field: 'tier3_per_kwh', message: 'Tier 3 follows an empty tier 2; fill the tiers in order' }
		],
		[
			'a last tier with an end',
			{ tier1_upto_kwh: '500', tier1_per_kwh: '0.1', tier2_upto_kwh: '900', tier2_per_kwh: '0.2' },
			{
				field: 'tier2_upto_kwh',
				message: 'Leave the last tier’s upto_kwh empty: the last tier covers all kWh above the one before'
			}
		],
		[
			'an open tier before the last',
			{ tier1_per_kwh: '0.1', tier2_per_kwh: '0.2' },
			{ field: 'tier1_upto_kwh', message: 'Tier 1 up to kWh is required: only the last tier is open-ended' }
		]
	])('reports %s at the tier’s column', async (_, tiers, expected) => {
		const result = await parseCsv([tieredRow(tiers)], TIER_HEADER);
		expect(result.rows).toEqual([]);
		expect(result.errors).toEqual([{ line: 2, ...expected }]);
	});

	it('asks for the rate of a tier that only has an end', async () => {
		const result = await parseCsv([tieredRow({ tier1_upto_kwh: '500', tier2_per_kwh: '0.2' })], TIER_HEADER);
		expect(result.errors).toEqual([
			{ line: 2, field: 'tier1_per_kwh', message: 'Tier 1 per kWh is required' }
		]);
	});
});

describe('sheets that cannot be read', () => {
	it.each([
		['an empty file', new Uint8Array(), 'csv', 'The file is empty'],
		[
			'a file of blank lines',
			encode('\n \n,,\n'),
			'csv',
			'The sheet is empty: it needs a header row and at least one tariff row'
		],
		[
			'a header without rows',
			encode(`${HEADER.join(',')}\n`),
			'csv',
			'The sheet has a header row but no tariff rows'
		],
		[
			'garbage bytes as XLSX',
			new Uint8Array([0x50, 0x4b, 7, 1, 255, 0, 42, 13]),
			'xlsx',
			'The file is not a readable XLSX workbook'
		],
		['binary bytes as CSV', new Uint8Array([0x75, 0, 0x74, 0x69]), 'csv', 'The file is not a CSV text file'],
		[
			'a quote that never closes',
			encode(`${HEADER.join(',')}\n"Demo,US\n`),
			'csv',
			'Row 2: a quoted cell is never closed'
		]
	] as const)('refuses %s with a sheet-level error', async (_, bytes, kind, message) => {
		await expect(parseTariffSheet(bytes, kind)).resolves.toEqual({
			rows: [],
			errors: [],
			sheetErrors: [message]
		});
	});

	it('names unknown columns and missing required ones', async () => {
		const header = [
			...HEADER.filter((name) => name !== 'source' && name !== 'checked_on'),
			'Colour',
			'notes'
		];
		const result = await parseCsv([FLAT], header);
		expect(result.sheetErrors).toEqual([
			'Unknown columns: colour, notes (the format lists the columns a sheet can have)',
			'Missing required columns: source, checked_on'
		]);
		expect(result.rows).toEqual([]);
	});

	it('refuses cells under no column name', async () => {
		const text = `${HEADER.join(',')},\n${HEADER.map((name) => FLAT[name] ?? '').join(',')},stray,more\n`;
		const result = await parseTariffSheet(encode(text), 'csv');
		expect(result.sheetErrors).toEqual([
			`Column ${HEADER.length + 1} has cells but no name in the header row`,
			'Row 2 has more cells than the header row has columns'
		]);
	});

	it('refuses a column named twice', async () => {
		const result = await parseCsv([FLAT], [...HEADER, 'Utility']);
		expect(result.sheetErrors).toEqual(['Column “utility” appears more than once']);
	});

	it(`refuses more than ${MAX_SHEET_ROWS} rows and more than 5 MB`, async () => {
		const rows = Array.from({ length: MAX_SHEET_ROWS + 1 }, () => FLAT);
		const many = await parseCsv(rows);
		expect(many.sheetErrors).toEqual([
			`The sheet has more than ${MAX_SHEET_ROWS} tariff rows; one import can hold at most 2000`
		]);
		const big = await parseTariffSheet(new Uint8Array(5 * 2 ** 20 + 1), 'csv');
		expect(big.sheetErrors).toEqual(['The file is larger than 5 MB, the most an import sheet can be']);
	});
});

describe('the documented format', () => {
	it('lists each column once, the required ones first among the template’s header', () => {
		const names = TARIFF_SHEET_COLUMNS.map((c) => c.name);
		expect(new Set(names).size).toBe(names.length);
		expect(TARIFF_SHEET_COLUMNS.filter((c) => c.required).map((c) => c.name)).toEqual([
			'utility',
			'name',
			'country',
			'customer_class',
			'currency',
			'timezone',
			'effective_from',
			'source',
			'checked_on'
		]);
		expect(tariffSheetTemplateCsv().split('\r\n')[0]).toBe(names.join(','));
	});
});
