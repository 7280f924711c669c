/**
 * Issue 17's retrofit as a whole comparison report, for the tests of every output: a 1.5 kW pump
 * always on, already installed, against a proposal of a 90 W pump and two 60 W air pumps bought for
 * $800 in all, saving $1,083.32 a year (the flat rate is derived so that it does:
 * 1083.32 ÷ ((1500 − 210) W × 8.76 kWh per W-year)). Simple payback by its definition (extra capital ÷
 * yearly saving; any engineering-economics text): 800 ÷ 1083.32 ≈ 0.74 years. Invented figures.
 */
import { DELIVERY_NOT_KNOWN } from '$lib/text/delivery-figures';
import { compare, compareRequestSchema, type CompareRequest, type CompareRequestInput } from '$lib/calc';
import { device, flatTariff } from '$lib/calc/requests.fixture';
import type { ComparisonReport } from './types';

export const RETROFIT_RATE = 1083.32 / ((1500 - 210) * 8.76);

export function retrofitRequest(more: Partial<CompareRequestInput> = {}): CompareRequest {
	return compareRequestSchema.parse({
		period: { start: '2027-01', months: 12 },
		timezone: 'UTC',
		holidays: null,
		tariff: flatTariff(RETROFIT_RATE),
		scenarios: [
			{
				name: 'Pump installed now',
				status: 'installed',
				equipment: [
					device({
						name: 'Demo pump 1.5 kW',
						category: 'water-pump',
						power: { watts: 1500 },
						purchaseCost: 650,
						installCost: 150,
						lifeYears: 8
					})
				]
			},
			{
				name: 'Small pump and air pumps',
				status: 'proposed',
				equipment: [
					device({
						name: 'Demo pump 90 W',
						category: 'water-pump',
						power: { watts: 90 },
						purchaseCost: 500,
						installCost: 60
					}),
					device({
						name: 'Air pump',
						category: 'air-pump',
						quantity: 2,
						power: { watts: 60 },
						purchaseCost: 120
					})
				],
				oneOffCosts: []
			}
		],
		baseline: 0,
		finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 3 },
		emissionFactorKgPerKwh: 0,
		...more
	});
}

/** The report GET /api/v1/compare would answer for the retrofit (equipment words filled in by hand). */
export function retrofitReport(more: Partial<CompareRequestInput> = {}): ComparisonReport {
	const request = retrofitRequest(more);
	const result = compare(request);
	return {
		query: {
			scenarios: ['s0', 's1'],
			baseline: 's0',
			start: '2027-01',
			horizonYears: request.finance.horizonYears,
			discountPercent: request.finance.discountPercent,
			escalationPercent: request.finance.escalationPercent,
			emissionKgPerKwh: request.emissionFactorKgPerKwh,
			emissionSource: ''
		},
		currency: 'USD',
		timezone: 'UTC',
		baseline: 0,
		scenarios: request.scenarios.map((scenario, i) => ({
			id: `s${i}`,
			name: scenario.name,
			status: scenario.status,
			description: '',
			oneOffCosts: scenario.oneOffCosts,
			equipment: [],
			workspaceName: 'Demo workspace (invented)',
			siteId: 'site',
			siteName: 'Demo pond (invented)',
			tariffName: 'Demo flat rate (invented)',
			tariffVersion: 1,
			tariffSource: 'Invented for a test',
			tariffCheckedOn: '2026-12-01',
			tariffUtility: 'Demo Pond Power (invented)',
			tariffEffectiveFrom: '2026-07-01',
			tariffEffectiveTo: '2027-12-31',
			tariffUrdbLabel: 'demo-label-0001',
			deviceCount: scenario.equipment.length,
			kwhByCategory: {},
			redundancy: [],
			caution: false,
			delivery: DELIVERY_NOT_KNOWN
		})),
		result,
		assumptions: []
	};
}
