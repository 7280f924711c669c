import { DELIVERY_NOT_KNOWN } from '$lib/text/delivery-figures';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { compare, compareRequestSchema } from '$lib/calc';
import type { ComparisonReport } from '$lib/compare/types';
import { FORMULA_TEXTS, LOOKS_LIKE_FORMULA, neutralised } from '$lib/server/exports/formula-texts';
import { hatcheryRequest } from '$lib/server/exports/workbook-fixtures';
import { retrofitReport } from '$lib/compare/retrofit.fixture';
import { csvColumn } from '$lib/text/output-labels';
import { comparisonCsv, monthlyCsv } from './csv';
import { DELIVERY_CSV_WORDS } from './delivery-csv';

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
			status: request.scenarios[s]!.status,
			description: FORMULA_TEXTS[3],
			oneOffCosts: request.scenarios[s]!.oneOffCosts,
			equipment: [],
			workspaceName: 'Invented workspace',
			siteId: 'site-1',
			siteName: FORMULA_TEXTS[2 + s]!,
			tariffName: FORMULA_TEXTS[4 + s]!,
			tariffVersion: 1,
			tariffSource: 'Invented for a test',
			tariffCheckedOn: '2026-12-01',
			tariffUtility: 'Invented utility',
			tariffEffectiveFrom: '2026-01-01',
			tariffEffectiveTo: null,
			tariffUrdbLabel: null,
			deviceCount: 3,
			kwhByCategory: {},
			redundancy: [],
			caution: false,
			delivery: DELIVERY_NOT_KNOWN
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
		const [header = [], ...rows] = rowsOf(comparisonCsv(report));
		const words = new Set([
			'status',
			'simple_payback_note',
			'co2_note',
			'one_off_costs_items',
			'description',
			...DELIVERY_CSV_WORDS
		]);
		const numeric = header.flatMap((name, col) => (col >= 4 && !words.has(name) ? [col] : []));
		const figures = rows.flatMap((row) => numeric.map((col) => row[col] ?? ''));
		expect(figures.every((cell) => /^(-?\d+(\.\d+)?)?$/.test(cell))).toBe(true);
		expect(figures.some((cell) => cell.startsWith('-'))).toBe(true);
		expect(rows.map((row) => row[header.indexOf('description')])).toEqual([
			neutralised(FORMULA_TEXTS[3]),
			neutralised(FORMULA_TEXTS[3])
		]);
	});
});

describe('the comparison CSV of issue 17’s retrofit', () => {
	const recordsOf = (csv: string) =>
		Papa.parse<Record<string, string>>(csv.trimEnd(), { header: true, skipEmptyLines: true }).data;

	it('names its columns from the glossary of output labels', () => {
		const [header] = Papa.parse<string[]>(comparisonCsv(retrofitReport()).trimEnd()).data;
		expect(header).toEqual(
			expect.arrayContaining([
				csvColumn('capital', 'USD'),
				csvColumn('oneOffCosts', 'USD'),
				csvColumn('saving', 'USD'),
				'simple_payback_years',
				'simple_payback_note',
				csvColumn('co2', 'kg')
			])
		);
		expect(csvColumn('capital', 'USD')).toBe('purchase_and_installation_USD');
	});

	it('writes the status, and the payback as a number with its words beside it', () => {
		const [installed, proposal] = recordsOf(comparisonCsv(retrofitReport()));
		expect(installed?.status).toBe('Installed (already paid for)');
		expect(installed?.purchase_and_installation_USD).toBe('0.00');
		expect(installed?.simple_payback_years).toBe('');
		expect(proposal?.status).toBe('Proposed (bought now)');
		expect(proposal?.purchase_and_installation_USD).toBe('800.00');
		expect(proposal?.simple_payback_years).toBe('0.74');
		expect(proposal?.simple_payback_note).toBe('0.74 years');
	});

	it('writes a payback at once as 0 and says so, and CO₂ as not set until a factor is given', () => {
		const report = retrofitReport();
		report.result.scenarios[1] = { ...report.result.scenarios[1]!, simplePaybackYears: 0 };
		const [, proposal] = recordsOf(comparisonCsv(report));
		expect(proposal?.simple_payback_years).toBe('0.00');
		expect(proposal?.simple_payback_note).toBe('at once: it costs no more to buy than the baseline');
		expect(proposal?.co2_a_year_kg).toBe('');
		expect(proposal?.co2_note).toBe('not set');
	});

	it('lists the one-off costs with their notes', () => {
		const report = retrofitReport();
		report.scenarios[1]!.oneOffCosts = [
			{ label: 'Electrician’s visit', amount: 120, note: 'Check the circuit' }
		];
		const [, proposal] = recordsOf(comparisonCsv(report));
		expect(proposal?.one_off_costs_USD).toBe('120.00');
		expect(proposal?.one_off_costs_items).toBe('Electrician’s visit: 120.00 (Check the circuit)');
	});

	it('writes what each scenario delivers: figures, empty where not known, the failed unit by name', () => {
		const report = retrofitReport();
		report.scenarios[1]!.delivery = {
			waterLpm: 378.5411784,
			turnoversPerHour: 1.5,
			oxygenSuppliedGramsPerHour: 120,
			oxygenDemandGramsPerHour: 80,
			targetDoMgL: 5,
			mainsDevicesInWater: 0,
			ifLargestFails: {
				waterLpm: 189.27,
				waterUnit: '=Air pump',
				oxygenSuppliedGramsPerHour: 60,
				oxygenUnit: 'Air pump'
			}
		};
		const [installed, proposal] = recordsOf(comparisonCsv(report));
		expect(installed?.water_moved_L_per_min).toBe('');
		expect(installed?.mains_powered_devices_in_the_water).toBe('0');
		// 1 US gallon = 3.785411784 L (NIST Handbook 44, Appendix C).
		expect(proposal?.water_moved_US_gal_per_min).toBe('100.00');
		expect(proposal?.oxygen_supplied_g_O2_per_h).toBe('120.0');
		expect(proposal?.oxygen_demand_g_O2_per_h).toBe('80.0');
		expect(proposal?.largest_water_unit).toBe("'=Air pump");
		expect(proposal?.oxygen_supplied_if_the_largest_unit_fails_g_O2_per_h).toBe('60.0');
	});
});
