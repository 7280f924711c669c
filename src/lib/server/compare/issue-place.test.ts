import { describe, expect, it } from 'vitest';
import { comparisonPlace } from './issue-place';

const scenarios = [
	{ name: 'Pond A (invented)', devices: [{ name: 'Main pump' }] },
	{ name: 'Pond B (invented)', devices: [{ name: 'Pump' }, { name: 'Blower' }, { name: 'Aerator' }] }
];

describe('comparisonPlace', () => {
	it('names the scenario and device in words, never the request path', () => {
		expect(comparisonPlace('scenarios.1.equipment.2.power.watts', scenarios)).toBe(
			'“Pond B (invented)”, device 3 “Aerator”'
		);
		expect(comparisonPlace('scenarios.0.tariff.energyCharges.0.perKwh', scenarios)).toBe(
			'“Pond A (invented)”, its tariff'
		);
		expect(comparisonPlace('scenarios.0.name', scenarios)).toBe('“Pond A (invented)”');
	});

	it('names the baseline’s settings and falls back to the comparison', () => {
		expect(comparisonPlace('timezone', scenarios)).toBe('The baseline site’s time zone');
		expect(comparisonPlace('holidays.country', scenarios)).toBe('The baseline’s public holidays');
		expect(comparisonPlace('finance.horizonYears', scenarios)).toBe('The comparison');
		expect(comparisonPlace('scenarios.7.equipment.0', scenarios)).toBe('A scenario');
	});
});
