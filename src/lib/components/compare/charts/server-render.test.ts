import { describe, expect, it } from 'vitest';
import type { Component } from 'svelte';
import { render } from 'svelte/server';
import type { ComparisonReport } from '$lib/compare/types';
import CategoryKwhChart from './CategoryKwhChart.svelte';
import ChargeKindChart from './ChargeKindChart.svelte';
import CumulativeCostChart from './CumulativeCostChart.svelte';
import MonthlyCostChart from './MonthlyCostChart.svelte';
import { inventedReport } from './compare-chart.fixture';

// The invented comparison of compare-chart.fixture.ts, rendered as the server sends it.

const html = (component: Component<{ report: ComparisonReport }>) =>
	render(component, { props: { report: inventedReport() } }).body;

describe('the charts before the browser draws them', () => {
	it('send the legend and the table, and no drawing', () => {
		for (const chart of [MonthlyCostChart, CumulativeCostChart, ChargeKindChart, CategoryKwhChart]) {
			const body = html(chart);
			expect(body).toContain('<figcaption');
			expect(body).toContain('<table');
			expect(body).not.toContain('lc-layout-svg');
		}
	});

	it('name the baseline in the monthly legend and give each month’s bills', () => {
		const body = html(MonthlyCostChart);
		expect(body).toContain('One large air pump (baseline)');
		expect(body).toContain('February 2027');
		expect(body).toContain('$36.75');
	});

	it('say in words where each scenario pays back', () => {
		const body = html(CumulativeCostChart);
		expect(body).toContain('Two small air pumps pays back in year ~2.7.');
		expect(body).toContain('Timer on the pump never costs more than the baseline.');
	});

	it('total each scenario’s charges and kWh', () => {
		expect(html(ChargeKindChart)).toContain('$76.75');
		expect(html(CategoryKwhChart)).toContain('UV sterilisers');
	});
});
