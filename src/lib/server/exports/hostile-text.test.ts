import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { billTemplateCsv } from '$lib/server/bills/bill-sheet';
import type { DeviceSpec } from '$lib/server/db/schema';
import { equipmentCsv, equipmentTemplateCsv, equipmentXlsx } from '$lib/server/sites/equipment-sheet/write';
import { tariffSheetTemplateCsv } from '$lib/server/tariffs/sheet-template';
import { FORMULA_TEXTS, LOOKS_LIKE_FORMULA, cellsOf, neutralised, readBackAs } from './formula-texts';
import { readBack } from './workbook-read';
import { exportOf } from './workbook-exports';
import { hatcheryRequest } from './workbook-fixtures';
import { TOU_DEMAND_TARIFF } from './workbook-tariffs';

// Every export that writes a user's text into a CSV or XLSX file, given texts a spreadsheet would run
// as formulas: each such cell comes out with a leading apostrophe, while numbers, negative ones too,
// stay numbers. The comparison's CSV tables are tested beside them, in compare/csv.test.ts.

describe('the comparison workbook', () => {
	// The request's schema trims names and labels, so the tab- and CR-led texts go where nothing trims.
	const base = hatcheryRequest();
	const request = hatcheryRequest({
		tariff: { ...TOU_DEMAND_TARIFF, fixedCharges: [{ label: FORMULA_TEXTS[3], perMonth: 14.5 }] },
		scenarios: base.scenarios.map((scenario, s) => ({
			...scenario,
			name: FORMULA_TEXTS[s] ?? scenario.name,
			equipment: scenario.equipment.map((device, d) =>
				d === 0 ? { ...device, name: FORMULA_TEXTS[2] } : device
			)
		}))
	});
	const input = { ...exportOf(request, FORMULA_TEXTS[2]), emissionSource: FORMULA_TEXTS[0] };
	input.scenarios = input.scenarios.map((s) => ({
		...s,
		siteName: FORMULA_TEXTS[4],
		tariffName: FORMULA_TEXTS[5],
		// The provenance is typed by whoever saved the tariff version, so it is hostile too.
		tariffOrigin: {
			utility: FORMULA_TEXTS[1],
			effectiveFrom: '2026-01-01',
			effectiveTo: null,
			source: FORMULA_TEXTS[0],
			checkedOn: '2026-11-20',
			urdbLabel: FORMULA_TEXTS[3]
		}
	}));

	let cells: ReturnType<typeof cellsOf>;
	beforeAll(async () => {
		cells = cellsOf(await readBack(input));
	});

	it('writes no text cell that starts like a formula, and every hostile text with an apostrophe', () => {
		const { texts } = cells;
		expect(texts.filter((text) => LOOKS_LIKE_FORMULA.test(text))).toEqual([]);
		for (const text of FORMULA_TEXTS) expect(texts).toContain(readBackAs(text));
	});

	it("writes the tariff's source and utility as text, a HYPERLINK source too", () => {
		const { texts } = cells;
		expect(texts).toContain(`'=HYPERLINK("http://example.org/x","Pump")`);
		expect(texts).toContain("'+1+1");
		expect(texts).toContain(`'@SUM(1+1) (OpenEI Utility Rate Database)`);
	});

	it('keeps numbers as number cells, a negative rider and savings below the baseline among them', () => {
		const { texts, numbers } = cells;
		expect(numbers).toContain(-0.002); // the invented tariff's efficiency credit per kWh
		expect(numbers.filter((n) => n < 0).length).toBeGreaterThan(1);
		expect(texts.filter((text) => /^'?-?\d+(\.\d+)?$/.test(text))).toEqual([]);
	});
});

describe('the equipment list as CSV and XLSX', () => {
	const devices: DeviceSpec[] = FORMULA_TEXTS.map((text, i) => ({
		name: text,
		notes: FORMULA_TEXTS[(i + 1) % FORMULA_TEXTS.length],
		category: 'water-pump',
		power: { watts: 450 + i },
		schedule: { type: 'always' },
		purchaseCost: 380
	}));

	it('neutralises names and notes in the CSV and leaves the numbers bare', () => {
		const rows = Papa.parse<Record<string, string>>(equipmentCsv(devices).trimEnd(), { header: true }).data;
		expect(rows.map((row) => row.name)).toEqual(FORMULA_TEXTS.map(neutralised));
		expect(rows.map((row) => row.notes)).toEqual(devices.map((device) => neutralised(device.notes!)));
		expect(rows.map((row) => row.watts)).toEqual(['450', '451', '452', '453', '454', '455']);
	});

	it('writes names and notes as neutralised text cells and numbers as number cells in the XLSX', async () => {
		const workbook = new ExcelJS.Workbook();
		await workbook.xlsx.load((await equipmentXlsx(devices, FORMULA_TEXTS[0])) as unknown as ExcelJS.Buffer);
		const { texts, numbers } = cellsOf(workbook);
		expect(texts.filter((text) => LOOKS_LIKE_FORMULA.test(text))).toEqual([]);
		for (const text of FORMULA_TEXTS) expect(texts).toContain(readBackAs(text));
		expect(numbers).toEqual(expect.arrayContaining([450, 455, 380]));
	});
});

describe('the import templates', () => {
	it.each([
		['the tariff template', tariffSheetTemplateCsv()],
		['the equipment template', equipmentTemplateCsv()],
		['the bill template', billTemplateCsv()]
	])('%s holds no cell that starts like a formula', (_, csv) => {
		const cells = Papa.parse<string[]>(csv.trimEnd()).data.flat();
		expect(cells.length).toBeGreaterThan(10);
		expect(cells.filter((cell) => LOOKS_LIKE_FORMULA.test(cell))).toEqual([]);
	});
});
