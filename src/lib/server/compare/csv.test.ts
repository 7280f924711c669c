import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { compare, compareRequestSchema } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import { FORMULA_TEXTS, LOOKS_LIKE_FORMULA, neutralised } from '$lib/server/exports/formula-texts';
import { hatcheryRequest } from '$lib/server/exports/workbook-fixtures';
import { comparisonCsv, monthlyCsv } from './csv';

// Names a spreadsheet would run as formulas come out with a leading apostrophe; figures stay numbers.
describe('the comparison and monthly CSV tables', () => {
	const request = compareRequestSchema.parse(hatcheryRequest());
	const report: ComparisonReport = {
		query: {
			scenarios: ['s1', 's2'],
			baseline: 's1',
			start: '2027-01',
			horizonYears: 10,
			discountPercent: 4.5,
			escalationPercent: 2.75,
			emissionKgPerKwh: 0.41,
			emissionSource: FORMULA_TEXTS[0]
		},
		currency: 'USD',
		timezone: 'America/Chicago',
		baseline: 0,
		scenarios: request.scenarios.map((_, s) => ({
			id: `s${s + 1}`,
			name: FORMULA_TEXTS[s]!,
			siteId: 'site-1',
			siteName: FORMULA_TEXTS[2 + s]!,
			tariffName: FORMULA_TEXTS[4 + s]!,
			tariffVersion: 1,
			tariffSource: 'Invented for a test',
			tariffCheckedOn: '2026-12-01',
			deviceCount: 3,
			kwhByCategory: {},
			redundancy: [],
			caution: false
		})),
		result: compare(request),
		assumptions: []
	};
	const rowsOf = (csv: string) => Papa.parse<string[]>(csv.trimEnd(), { skipEmptyLines: true }).data;

	it('neutralise the scenario, site and tariff names, and the monthly headers made of names', () => {
		const [, ...rows] = rowsOf(comparisonCsv(report));
		expect(rows.map((row) => row.slice(0, 3))).toEqual([
			[neutralised(FORMULA_TEXTS[0]), neutralised(FORMULA_TEXTS[2]), neutralised(`${FORMULA_TEXTS[4]} v1`)],
			[neutralised(FORMULA_TEXTS[1]), neutralised(FORMULA_TEXTS[3]), neutralised(`${FORMULA_TEXTS[5]} v1`)]
		]);
		const [header] = rowsOf(monthlyCsv(report));
		expect(header?.slice(1, 3)).toEqual([
			`${neutralised(FORMULA_TEXTS[0])} kWh`,
			`${neutralised(FORMULA_TEXTS[0])} cost USD`
		]);
		expect(header?.filter((cell) => LOOKS_LIKE_FORMULA.test(cell))).toEqual([]);
	});

	it('leave the figures, negative differences from the baseline among them, as plain numbers', () => {
		const [, ...rows] = rowsOf(comparisonCsv(report));
		const figures = rows.flatMap((row) => row.slice(4));
		expect(figures.every((cell) => /^(-?\d+(\.\d+)?)?$/.test(cell))).toBe(true);
		expect(figures.some((cell) => cell.startsWith('-'))).toBe(true);
	});
});
