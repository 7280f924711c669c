import { describe, expect, it } from 'vitest';
import { paybackYears } from './format';

// Simple payback is the extra outlay over the yearly saving (common practice); a scenario that costs
// no more to buy and saves money pays back at once, one that saves nothing never does.
describe('paybackYears', () => {
	it('says "at once" when there is no extra outlay', () => {
		expect(paybackYears(0)).toBe('at once: it costs no more to buy than the baseline');
	});
	it('gives years to two decimals, as a retrofit often pays back within a year', () => {
		expect(paybackYears(2.345)).toBe('2.35 years');
		expect(paybackYears(800 / 1083.32)).toBe('0.74 years');
	});
	it('gives one decimal past ten years', () => {
		expect(paybackYears(12.345)).toBe('12.3 years');
	});
	it('says "never" when the scenario saves nothing', () => {
		expect(paybackYears(null)).toBe('never: it saves nothing a year');
	});
});
