import { describe, expect, it } from 'vitest';
import { chartDomain, designWarnings, tablePoints } from './results-text';

const lift = (name: string, messages: string[]) =>
	({ name, warnings: messages.map((message) => ({ code: 'x', message })) }) as never;

describe('the warnings a design lists', () => {
	it('lists each message once, naming the air-lift when there are several', () => {
		const shown = designWarnings({
			warnings: [{ code: 'pump', message: 'The pump runs near its limit.' }],
			airlifts: [lift('Grow bed', ['Too shallow.']), lift('Sump', ['Too shallow.', 'Too shallow.'])]
		});
		expect(shown.map((w) => w.message)).toEqual([
			'The pump runs near its limit.',
			'Grow bed: Too shallow.',
			'Sump: Too shallow.'
		]);
	});

	it('does not repeat a riser’s warning the design already says', () => {
		const shown = designWarnings({
			warnings: [{ code: 'x', message: 'Air-lift: Too shallow.' }],
			airlifts: [lift('Air-lift', ['Too shallow.'])]
		});
		expect(shown.map((w) => w.message)).toEqual(['Air-lift: Too shallow.']);
	});
});

describe('the riser chart', () => {
	it('reaches past the curve and the design point, from zero', () => {
		const curve = [
			{ airLpm: 0, waterLpm: 0 },
			{ airLpm: 40, waterLpm: 30 }
		];
		expect(chartDomain(curve, { airLpm: 50, waterLpm: 20 })).toEqual({
			airLpm: [0, 52.5],
			waterLpm: [0, 33]
		});
		expect(chartDomain([], { airLpm: 0, waterLpm: 0 })).toEqual({ airLpm: [0, 1], waterLpm: [0, 1] });
	});

	it('tables at most twelve points of a long curve, first and last kept', () => {
		const curve = Array.from({ length: 41 }, (_, i) => ({ airLpm: i, waterLpm: i }));
		const rows = tablePoints(curve);
		expect(rows).toHaveLength(12);
		expect(rows[0]).toEqual(curve[0]);
		expect(rows.at(-1)).toEqual(curve[40]);
	});
});
