import { DELIVERY_NOT_KNOWN } from '$lib/text/delivery-figures';
import { describe, expect, it } from 'vitest';
import type { ScenarioResult } from '$lib/calc';
import { retrofitReport } from './retrofit.fixture';
import { summarySentences } from './summary';
import type { ComparisonReport } from './types';

// Invented figures, chosen so the sentences can be checked by hand.
const scenario = (name: string, r: Partial<ScenarioResult>): ScenarioResult => ({
	name,
	status: 'proposed',
	annualKwh: 0,
	annualCost: 0,
	capitalCost: 0,
	maintenancePerYear: 0,
	savingsPerYear: 0,
	simplePaybackYears: null,
	lifecycleCost: 0,
	co2KgPerYear: 0,
	cashFlows: [],
	periods: [],
	...r
});

function report(results: ScenarioResult[], factor = 0): ComparisonReport {
	return {
		query: {
			scenarios: results.map((_, i) => `s${i}`),
			baseline: 's0',
			start: '2027-01',
			horizonYears: 10,
			discountPercent: 5,
			escalationPercent: 2,
			emissionKgPerKwh: factor,
			emissionSource: 'Example value'
		},
		currency: 'USD',
		timezone: 'America/Chicago',
		baseline: 0,
		scenarios: results.map((r, i) => ({
			id: `s${i}`,
			name: r.name,
			status: r.status,
			description: '',
			oneOffCosts: [],
			equipment: [],
			workspaceName: 'Invented workspace',
			siteId: 'x',
			siteName: 'Invented site',
			tariffName: 'Invented tariff',
			tariffVersion: 1,
			tariffSource: 'Invented for the test',
			tariffCheckedOn: '2026-11-01',
			tariffUtility: 'Invented utility',
			tariffEffectiveFrom: '2026-01-01',
			tariffEffectiveTo: null,
			tariffUrdbLabel: null,
			deviceCount: 1,
			kwhByCategory: {},
			redundancy: [],
			caution: false,
			delivery: DELIVERY_NOT_KNOWN
		})),
		result: { scenarios: results },
		assumptions: []
	};
}

const big = scenario('One large pump', {
	annualKwh: 6570,
	annualCost: 1200,
	capitalCost: 900,
	lifecycleCost: 11_000,
	co2KgPerYear: 2628
});

describe('the plain-words summary', () => {
	it('names the saving, the payback in months and the lifecycle difference', () => {
		const small = scenario('Small pump and air-lift', {
			annualKwh: 3285,
			annualCost: 600,
			capitalCost: 1500,
			savingsPerYear: 600,
			simplePaybackYears: 1,
			lifecycleCost: 6500,
			co2KgPerYear: 1314
		});
		expect(summarySentences(report([big, small], 0.4))).toEqual([
			'Choosing “Small pump and air-lift” instead of “One large pump” saves about $600 a year (50 %) on the electricity bill and 3,285 kWh. The extra purchase and installation of $600 pays back in about 1 year (12 months). Over 10 years, counting maintenance and replacements and discounting at 5 % a year, it comes to $4,500 less in today’s money. That is about 1,314 kg of CO₂ a year less.'
		]);
	});

	it('says when a scenario costs more to run and never pays back', () => {
		const worse = scenario('Heater on peak', {
			annualKwh: 7000,
			annualCost: 1300,
			capitalCost: 1000,
			savingsPerYear: -100,
			lifecycleCost: 12_000
		});
		expect(summarySentences(report([big, worse]))[0]).toBe(
			'“Heater on peak” costs about $100 a year more to run than “One large pump” (430 kWh more). It costs $100 more to buy and install, which the running costs never pay back. Over 10 years, counting maintenance and replacements and discounting at 5 % a year, it comes to $1,000 more in today’s money.'
		);
	});

	it('gives payback in years past two years', () => {
		const slow = scenario('Slow', {
			annualCost: 1100,
			capitalCost: 1200,
			savingsPerYear: 100,
			simplePaybackYears: 3,
			lifecycleCost: 10_900
		});
		expect(summarySentences(report([big, slow]))[0]).toContain('pays back in about 3 years');
	});
});

describe('installed against proposed (issue 17’s retrofit)', () => {
	it('counts nothing in year 0 for the installed pump, so the $800 retrofit pays back in about 0.74 years', () => {
		const sentences = summarySentences(retrofitReport());
		expect(sentences[0]).toBe(
			'“Pump installed now” is what is installed now: it is already paid for, so its purchase and installation counts only its one-off costs (none), and its devices are bought again only when their life ends within the horizon.'
		);
		expect(sentences[1]).toContain('saves about $1,083 a year');
		expect(sentences[1]).toContain(
			'The extra purchase and installation of $800 pays back in about 0.74 years (9 months).'
		);
	});

	it('words a payback at once, and says no CO₂ while the emission factor is not set', () => {
		const cheap = retrofitReport();
		const proposal = cheap.result.scenarios[1]!;
		cheap.result.scenarios[1] = { ...proposal, capitalCost: 0, simplePaybackYears: 0 };
		const sentence = summarySentences(cheap)[1]!;
		expect(sentence).toContain('It pays back at once: it costs no more to buy than the baseline.');
		expect(sentence).not.toContain('CO₂');
	});
});
