import { describe, expect, it } from 'vitest';
import { RATE_RAMP, rateColour } from './rate-palette';

describe('rateColour', () => {
	it('runs from the palest colour for the cheapest rate to the deepest for the dearest', () => {
		const colour = rateColour([0.06, 0.32]);
		// d3-scale writes interpolated colours as rgb(); the ends are the ramp's own stops.
		expect(colour(0.06)).toBe('rgb(214, 232, 218)');
		expect(colour(0.32)).toBe('rgb(124, 74, 15)');
		expect(colour(1)).toBe(colour(0.32));
	});

	it('uses the middle of the ramp when every rate is the same', () => {
		expect(rateColour([0.1, 0.1])(0.1)).toBe(RATE_RAMP[2]);
	});
});
