import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { CheapestFigures, RankedTariff, TariffProvenance } from '$lib/cheapest/types';
import { cheapestWorkbook, type CheapestExport } from './cheapest-workbook';
import { formulaAt, sheet, texts } from './workbook-read';

// Invented tariffs and usage (fictional utilities); the figures are arbitrary, the checks are about where
// they land in the workbook and how.

const months = Array.from({ length: 12 }, (_, i) => ({
	month: `2027-${String(i + 1).padStart(2, '0')}`,
	kwh: 100 + i,
	peakKw: 1 + i / 10
}));

const source = (urdbLabel: string | null, ...numbers: number[]): TariffProvenance => ({
	urdbLabel,
	versions: numbers.map((number) => ({
		number,
		effectiveFrom: `202${5 + number}-01-01`,
		effectiveTo: null,
		source: `https://rates.example.org/tariff-${number}`,
		checkedOn: '2026-11-02'
	}))
});

const ranked = (name: string, annualCost: number, current: boolean, differenceToCurrent: number) =>
	({
		id: name,
		name,
		utility: 'Demo Valley Power (invented)',
		current,
		annualCost,
		energyCost: annualCost - 120,
		fixedCost: 120,
		demandCost: 0,
		differenceToCurrent,
		versionNumbers: [2],
		monthlyCosts: months.map(() => annualCost / 12)
	}) satisfies RankedTariff;

const figures: CheapestFigures = {
	priced: 'January 2027 – December 2027, the estimated load of the scenario “Night pumping”',
	currency: 'USD',
	words: ['An invented sentence.'],
	ranked: [
		{
			...ranked('=HYPERLINK("https://evil.example.org","Night saver")', 900, false, -300),
			provenance: source('5e0000000000000000000001', 2)
		},
		{ ...ranked('General service', 1200, true, 0), provenance: source(null, 1, 2) }
	],
	unpriced: [
		{
			id: 'euro',
			name: 'Euro flat',
			utility: '+Eurostrom (invented)',
			current: false,
			reason: 'Priced in EUR; this site pays in USD.',
			provenance: source(null, 3)
		}
	],
	usage: months,
	moreThanCompared: null
};

const input: CheapestExport = {
	siteName: '@Greenhouse (invented)',
	timezone: 'America/Chicago',
	load: 'The scenario “Night pumping” (estimated load)',
	generatedAt: '2026-12-03T15:00:00Z',
	figures
};

let workbook: ExcelJS.Workbook;
beforeAll(async () => {
	workbook = new ExcelJS.Workbook();
	await workbook.xlsx.load((await cheapestWorkbook(input)) as unknown as ExcelJS.Buffer);
});

describe('the cheapest-tariff workbook', () => {
	it('has the four sheets in order', () => {
		expect(workbook.worksheets.map((s) => s.name)).toEqual([
			'Ranking',
			'Usage priced',
			'Monthly costs',
			'Sources'
		]);
	});

	it('ranks the tariffs with the difference as a formula of the annual costs', () => {
		const ranking = sheet(workbook, 'Ranking');
		expect(ranking.getCell('B7').value).toBe('General service');
		expect(ranking.getCell('D6').value).toBe(900);
		expect(formulaAt(ranking, 'E6')).toEqual({ formula: 'D6-$D$7', result: -300 });
		expect(formulaAt(ranking, 'E7')).toEqual({ formula: 'D7-$D$7', result: 0 });
		expect(ranking.getCell('I7').value).toBe('current');
		expect([ranking.getCell('F6').value, ranking.getCell('G6').value]).toEqual([780, 120]);
	});

	it('totals the usage priced with a SUM and the highest peak with a MAX', () => {
		const usage = sheet(workbook, 'Usage priced');
		expect(usage.getCell('A4').value).toBe('January 2027');
		expect(usage.getCell('B15').value).toBe(111);
		// 100 + 101 + … + 111 = 12 × 105.5
		expect(formulaAt(usage, 'B16')).toEqual({ formula: 'SUM(B4:B15)', result: 1266 });
		expect(formulaAt(usage, 'C16')).toEqual({ formula: 'MAX(C4:C15)', result: 2.1 });
	});

	it('lays each month’s bill out by tariff, in the ranking’s order', () => {
		const monthly = sheet(workbook, 'Monthly costs');
		expect(monthly.getCell('C3').value).toBe('General service');
		expect(monthly.getCell('B4').value).toBe(75);
		expect(monthly.getCell('C15').value).toBe(100);
	});

	it('lists every version priced with its dates, source, check date and open rate database label', () => {
		const sources = sheet(workbook, 'Sources');
		expect(sources.getCell('B2').value).toBe("'@Greenhouse (invented)");
		expect(sources.getCell('B3').value).toBe(input.load);
		expect(sources.getCell('B5').value).toBe('3 December 2026, 09:00 (America/Chicago)');
		const rows = [8, 9, 10, 11].map((r) => [1, 3, 4, 5, 6, 7, 8, 9].map((c) => sources.getCell(r, c).value));
		expect(rows[0]).toEqual([
			figures.ranked[0]!.name.replace(/^/, "'"),
			'ranked',
			2,
			'2027-01-01',
			'still in force',
			'https://rates.example.org/tariff-2',
			'2026-11-02',
			'5e0000000000000000000001'
		]);
		expect(rows[1]!.slice(0, 3)).toEqual(['General service', 'ranked', 1]);
		expect(rows[2]!.slice(0, 3)).toEqual(['General service', 'ranked', 2]);
		expect(rows[2]![7]).toBe('none (entered by hand)');
		expect(rows[3]!.slice(0, 4)).toEqual(['Euro flat', 'not compared', 3, '2028-01-01']);
		expect(sources.getCell('B11').value).toBe("'+Eurostrom (invented)");
	});

	it('writes no user text as a formula anywhere', () => {
		for (const ws of workbook.worksheets) {
			for (const text of texts(ws)) expect(text).not.toMatch(/^[=+\-@]/);
			ws.eachRow((row) =>
				row.eachCell((cell) => {
					if (cell.type === ExcelJS.ValueType.Formula) expect(cell.formula).toMatch(/^(SUM|MAX|D\d+-)/);
				})
			);
		}
		expect(sheet(workbook, 'Ranking').getCell('B6').value).toBe(`'${figures.ranked[0]!.name}`);
	});
});
