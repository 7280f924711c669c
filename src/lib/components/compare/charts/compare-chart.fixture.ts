import { DELIVERY_NOT_KNOWN } from '$lib/text/delivery-figures';
import type { ChargeLine, PeriodResult, ScenarioResult } from '$lib/calc';
import type { ComparedScenario, ComparisonReport } from '$lib/compare/types';

/**
 * An invented comparison for the compare charts' tests: no real utility, site, person or rate.
 * Two months instead of twelve and round figures, so every sum can be checked by hand.
 */

export function period(label: string, charges: ChargeLine[]): PeriodResult {
	const total = charges.reduce((sum, charge) => sum + charge.amount, 0);
	return {
		label,
		from: `${label}-01`,
		to: `${label}-28`,
		days: 28,
		hours: 672,
		kwh: 0,
		peakKw: 0,
		charges,
		total,
		sharedCost: 0,
		equipment: []
	};
}

const fixed = (amount: number): ChargeLine => ({ kind: 'fixed', label: 'Customer charge', amount });
const energy = (amount: number): ChargeLine => ({ kind: 'energy', label: 'Energy', amount });

function scenarioResult(name: string, cashFlows: number[], periods: PeriodResult[]): ScenarioResult {
	const annualCost = periods.reduce((sum, p) => sum + p.total, 0);
	return {
		name,
		status: 'proposed',
		annualKwh: 0,
		annualCost,
		capitalCost: cashFlows[0] ?? 0,
		maintenancePerYear: 0,
		savingsPerYear: 0,
		simplePaybackYears: null,
		lifecycleCost: 0,
		co2KgPerYear: 0,
		cashFlows,
		periods
	};
}

function compared(id: string, name: string, kwhByCategory: Record<string, number>): ComparedScenario {
	return {
		id,
		name,
		status: 'proposed',
		description: '',
		oneOffCosts: [],
		equipment: [],
		workspaceName: 'Demo workspace (invented)',
		siteId: 'site-1',
		siteName: 'Willow Creek Demo Farm',
		tariffName: 'Example Co-op Small Farm (invented)',
		tariffVersion: 1,
		tariffSource: 'Invented for the tests',
		tariffCheckedOn: '2026-11-01',
		tariffUtility: 'Example Co-op (invented)',
		tariffEffectiveFrom: '2026-01-01',
		tariffEffectiveTo: null,
		tariffUrdbLabel: null,
		deviceCount: 2,
		kwhByCategory,
		redundancy: [],
		caution: false,
		delivery: DELIVERY_NOT_KNOWN
	};
}

/**
 * Three scenarios over January and February 2027 and a four-year horizon, the first the baseline:
 * - One large air pump: bills 40 and 36.75; spends 1000, then 500 a year.
 * - Two small air pumps: bills 28 (with a 2 credit) and 25; spends 1800, then 200 a year, so it
 *   crosses below the baseline two thirds of the way through year 3.
 * - Timer on the pump: bills 42 and 40; spends 900, then 520 a year, never more than the baseline.
 */
export function inventedReport(): ComparisonReport {
	return {
		query: {
			scenarios: ['a', 'b', 'c'],
			baseline: 'a',
			start: '2027-01',
			horizonYears: 4,
			discountPercent: 0,
			escalationPercent: 0,
			emissionKgPerKwh: 0.4,
			emissionSource: 'Invented example factor'
		},
		currency: 'USD',
		timezone: 'America/Chicago',
		baseline: 0,
		scenarios: [
			compared('a', 'One large air pump', { 'air-pump': 300, 'water-pump': 500 }),
			compared('b', 'Two small air pumps', { 'air-pump': 200, 'water-pump': 500, uv: 40 }),
			compared('c', 'Timer on the pump', { 'grow-tent': 12, 'water-pump': 450, 'air-pump': 300 })
		],
		result: {
			scenarios: [
				scenarioResult(
					'One large air pump',
					[1000, 500, 500, 500, 500],
					[
						period('2027-01', [fixed(10), energy(30)]),
						period('2027-02', [fixed(10), energy(25), { kind: 'tax', label: 'Sales tax', amount: 1.75 }])
					]
				),
				scenarioResult(
					'Two small air pumps',
					[1800, 200, 200, 200, 200],
					[
						period('2027-01', [fixed(10), energy(20), { kind: 'rider', label: 'Credit', amount: -2 }]),
						period('2027-02', [fixed(10), energy(15)])
					]
				),
				scenarioResult(
					'Timer on the pump',
					[900, 520, 520, 520, 520],
					[period('2027-01', [fixed(10), energy(32)]), period('2027-02', [fixed(10), energy(30)])]
				)
			]
		},
		assumptions: []
	};
}
