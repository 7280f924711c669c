import { describe, expect, it } from 'vitest';
import type { Component } from 'svelte';
import { render } from 'svelte/server';
import { retrofitReport } from '$lib/compare/retrofit.fixture';
import type { ComparisonReport } from '$lib/compare/types';
import { OUTPUT_LABELS, STATUS_LABELS } from '$lib/text/output-labels';
import ComparisonSources from './ComparisonSources.svelte';
import ComparisonTable from './ComparisonTable.svelte';
import ScenarioDetails from './ScenarioDetails.svelte';

// The page, the printable report and the cost justification all draw these components; the workbook
// and CSV have their own tests of the same glossary (comparison-workbook.test.ts, csv.test.ts).
const ORIGIN = 'https://runrate.example.org';
const html = (component: Component<{ report: ComparisonReport }>, report = retrofitReport()) =>
	render(component, { props: { report } }).body.replaceAll('&amp;', '&');

describe('the comparison table names each figure as the glossary does', () => {
	const body = html(ComparisonTable);

	it('uses the glossary’s labels and none of the old names', () => {
		for (const label of [
			'status',
			'runningCost',
			'capital',
			'oneOffCosts',
			'saving',
			'payback',
			'lifecycle'
		] as const)
			expect(body).toContain(OUTPUT_LABELS[label]);
		for (const old of ['Capital cost', 'Savings a year', 'Price escalation', 'Energy (escalated)'])
			expect(body).not.toContain(old);
	});

	it('shows each scenario’s status and issue 17’s retrofit paying back in 0.74 years', () => {
		expect(body).toContain(STATUS_LABELS.installed);
		expect(body).toContain(STATUS_LABELS.proposed);
		expect(body).toContain('0.74 years');
		expect(body).not.toContain('at once');
	});

	it('says CO₂ is not set, and how to set it, until an emission factor is given', () => {
		expect(body).toContain('not set');
		expect(body).toContain('give an emission factor');
		const withFactor = html(ComparisonTable, retrofitReport({ emissionFactorKgPerKwh: 0.4 }));
		expect(withFactor).not.toContain('give an emission factor');
	});
});

describe('each scenario’s details', () => {
	it('list the one-off costs with their notes', () => {
		const report = retrofitReport();
		report.scenarios[1]!.oneOffCosts = [
			{ label: 'Air line and riser pipe', amount: 95, note: 'Invented figure' }
		];
		const body = html(ScenarioDetails, report);
		expect(body).toContain('Air line and riser pipe');
		expect(body).toContain('$95.00');
		expect(body).toContain('Invented figure');
	});
});

describe('the sources', () => {
	it('name the rules by their full address and each tariff version once', () => {
		const body = render(ComparisonSources, {
			props: { report: retrofitReport(), origin: ORIGIN }
		}).body;
		expect(body).toContain('https://runrate.example.org/rules');
		expect(body.match(/Demo flat rate \(invented\), version 1/g)).toHaveLength(1);
	});

	it("give each tariff version's provenance in words: dates in force, source, check, open-data label", () => {
		const body = render(ComparisonSources, {
			props: { report: retrofitReport(), origin: ORIGIN }
		}).body;
		// The invented provenance of retrofit.fixture.ts.
		expect(body).toContain(
			'Demo flat rate (invented), version 1, in force from 1 July 2026 to 31 December 2027: source: Invented for a test, checked 1 December 2026; OpenEI Utility Rate Database label demo-label-0001'
		);
	});
});
