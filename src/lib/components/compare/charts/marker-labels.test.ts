import { describe, expect, it } from 'vitest';
import { placeMarkerLabels } from './marker-labels';

// Invented ring positions in pixels, in a plot 300 px wide and 200 px high.
const PLOT_WIDTH_PX = 300;
const PLOT_HEIGHT_PX = 200;
const place = (rings: Parameters<typeof placeMarkerLabels>[0]) =>
	placeMarkerLabels(rings, PLOT_WIDTH_PX, PLOT_HEIGHT_PX);

describe('one payback ring', () => {
	it('is labelled just above and right of the ring', () => {
		expect(place([{ x: 100, y: 100, text: 'year ~3.4' }])).toEqual([
			{ x: 109, y: 91, text: 'year ~3.4', anchor: 'start' }
		]);
	});

	it('is labelled left of the ring in the right part of the plot', () => {
		expect(place([{ x: 250, y: 100, text: 'year ~8' }])[0]).toMatchObject({
			x: 241,
			anchor: 'end'
		});
	});

	it('is labelled below the ring when above would leave the plot', () => {
		expect(place([{ x: 100, y: 5, text: 'year ~1' }])[0]?.y).toBe(22);
	});
});

describe('rings close together', () => {
	it('share one label when they say the same at the same place', () => {
		const labels = place([
			{ x: 240, y: 60, text: 'year ~8' },
			{ x: 243, y: 58, text: 'year ~8' }
		]);
		expect(labels[1]).toBeNull();
	});

	it('put the second label below the ring when the first took the space above', () => {
		const labels = place([
			{ x: 100, y: 100, text: 'year ~5.7' },
			{ x: 104, y: 102, text: 'year ~5.9' }
		]);
		// The first label's box spans y 79–93; above the second ring (y 93) would overlap it.
		expect(labels.map((label) => label?.y)).toEqual([91, 119]);
	});
});
