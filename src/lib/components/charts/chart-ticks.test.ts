import { describe, expect, it } from 'vitest';
import { ticksThatFit, tickWidthPx } from './chart-ticks';

const months = ['Jan 27', 'Feb 27', 'Mar 27', 'Apr 27', 'May 27', 'Jun 27'].concat([
	'Jul 27',
	'Aug 27',
	'Sep 27',
	'Oct 27',
	'Nov 27',
	'Dec 27'
]);

describe('ticksThatFit', () => {
	it('names every month on a desk-wide axis', () => {
		expect(ticksThatFit(months, 900, 6)).toHaveLength(12);
	});

	it('names every second month on a phone-wide axis, so "Jan 27" never touches "Feb 27"', () => {
		// A 390 px phone leaves about 298 px for the plot between its padding.
		const shown = ticksThatFit(months, 298, 6);
		expect(shown).toEqual(['Jan 27', 'Mar 27', 'May 27', 'Jul 27', 'Sep 27', 'Nov 27']);
		expect(shown.length * tickWidthPx(6)).toBeLessThanOrEqual(298);
	});

	it('names at least the first tick on an axis too narrow for any', () => {
		expect(ticksThatFit(months, 10, 6)).toEqual(['Jan 27']);
	});
});
