import { describe, expect, it } from 'vitest';
import { paybackYears } from './format';

// Simple payback is the extra outlay over the yearly saving (common practice); a scenario that costs
// no more to buy and saves money pays back at once, one that saves nothing never does.
describe('paybackYears', () => {
	it('says "at once" when there is no extra outlay', () => {
		expect(paybackYears(0)).toBe('at once (no extra outlay)');
	});
	it('gives years to one decimal', () => {
		expect(paybackYears(2.345)).toBe('2.3 years');
	});
	it('says "never" when the scenario saves nothing', () => {
		expect(paybackYears(null)).toBe('never');
	});
});
