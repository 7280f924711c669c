import { describe, expect, it } from 'vitest';
import { shapePeak, stepLinePath } from './load-shape';

// Identity scales: the path's numbers are hours and kWh themselves.
const same = (n: number) => n;

describe('drawing an hourly line as steps', () => {
	it('holds each hour’s figure across the hour and joins the hours', () => {
		expect(stepLinePath([1, 2], same, same)).toBe('M0,1L1,1L1,2L2,2');
	});

	it('breaks the line at an hour without readings', () => {
		expect(stepLinePath([1, null, 3], same, same)).toBe('M0,1L1,1M2,3L3,3');
	});

	it('draws nothing when no hour has readings', () => {
		expect(stepLinePath([null, null], same, same)).toBe('');
	});
});

describe('the axis peak', () => {
	it('is the highest figure of either line', () => {
		expect(shapePeak({ weekday: [1, null, 2.5], weekend: [3, null, null] })).toBe(3);
	});

	it('is 0 for a shape without figures', () => {
		expect(shapePeak({ weekday: [null], weekend: [] })).toBe(0);
	});
});
