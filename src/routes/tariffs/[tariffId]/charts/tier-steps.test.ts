import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { tierCharts, tierSteps } from './tier-steps';

// Invented tiers for these tests only; no real utility or rate.

describe('tierSteps', () => {
	it('starts each tier where the one before ends', () => {
		const steps = tierSteps([
			{ uptoKwh: 500, perKwh: 0.05 },
			{ uptoKwh: 1500, perKwh: 0.065 },
			{ uptoKwh: null, perKwh: 0.08 }
		]);
		expect(steps).toEqual([
			{ fromKwh: 0, toKwh: 500, perKwh: 0.05 },
			{ fromKwh: 500, toKwh: 1500, perKwh: 0.065 },
			{ fromKwh: 1500, toKwh: null, perKwh: 0.08 }
		]);
	});
});

describe('tierCharts over a tariff', () => {
	const tariff: TariffInput = {
		currency: 'USD',
		energyCharges: [
			{ label: 'Energy', type: 'flat', perKwh: 0.1 },
			{
				label: 'Delivery',
				type: 'tiered',
				months: [6, 7, 8],
				tiers: [
					{ uptoKwh: 600, perKwh: 0.05 },
					{ uptoKwh: null, perKwh: 0.08 }
				]
			},
			{ label: 'Single tier', type: 'tiered', tiers: [{ uptoKwh: null, perKwh: 0.07 }] }
		]
	};

	it('keeps only the tiered charges, with their months', () => {
		const charts = tierCharts(tariff);
		expect(charts.map((chart) => [chart.label, chart.months])).toEqual([
			['Delivery', [6, 7, 8]],
			['Single tier', undefined]
		]);
	});

	it('runs the kWh axis half as far again past the last boundary, or to 1,000 kWh without one', () => {
		expect(tierCharts(tariff).map((chart) => chart.axisKwh)).toEqual([900, 1000]);
	});
});
