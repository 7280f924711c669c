import { describe, expect, it } from 'vitest';
import type { AirDesign, AirPump } from '$lib/calc';
import { canonical, initialPump, pumpOptions } from './pump-options';

// Invented pumps: the tables are not any maker's.
const small: AirPump = {
	name: 'Small shelf pump (invented)',
	points: [
		{ pressureKPa: 0, airLpm: 40 },
		{ pressureKPa: 15, airLpm: 20 }
	],
	inputWatts: 25,
	wireToAirPercent: 25
};
const typical = [{ id: 'class-a', pump: { ...small, name: 'Class A (invented)' }, note: 'Invented class' }];
const own = [{ id: '6d1c1f4e-0000-4000-8000-000000000001', pump: small }];
const design = (pump: AirPump, source?: AirDesign['pumpSource']) =>
	({ airlifts: [], aeration: null, lineLossKPa: 2, pump, pumpSource: source }) as AirDesign;

describe('the pump list', () => {
	it("lists the workspace's pumps, then the typical classes, each with where it came from", () => {
		const options = pumpOptions(typical, own, null);
		expect(options.map((o) => [o.group, o.label, o.source?.kind])).toEqual([
			['workspace', 'Small shelf pump (invented)', 'workspace'],
			['typical', 'Class A (invented)', 'typical']
		]);
		expect(initialPump(options, null)).toBe('typical:class-a');
	});

	it('reopens a saved design on its own option while that option holds the same table', () => {
		const saved = design(JSON.parse(JSON.stringify(small)), { kind: 'workspace', id: own[0]!.id });
		const options = pumpOptions(typical, own, saved);
		expect(options.some((o) => o.group === 'saved')).toBe(false);
		expect(initialPump(options, saved)).toBe(`workspace:${own[0]!.id}`);
	});

	it('keeps the saved pump as its own option once the workspace changed or removed it', () => {
		const saved = design({ ...small, inputWatts: 30 }, { kind: 'workspace', id: own[0]!.id });
		const options = pumpOptions(typical, own, saved);
		expect(options[0]).toMatchObject({ value: 'saved', group: 'saved', pump: { inputWatts: 30 } });
		expect(initialPump(options, saved)).toBe('saved');
		expect(pumpOptions(typical, [], saved)[0]?.label).toBe(
			'Small shelf pump (invented) (as saved with this design)'
		);
	});
});

describe('canonical JSON', () => {
	it('is the same whatever order the keys come in (jsonb reorders them)', () => {
		expect(canonical({ b: 1, a: [{ d: 2, c: null }] })).toBe(canonical({ a: [{ c: null, d: 2 }], b: 1 }));
		expect(canonical({ a: 1, b: undefined })).toBe(canonical({ a: 1 }));
	});
});

describe('the pump a blank designer opens on', () => {
	it('is the typical class that runs the first air-lift on the fewest watts, never one that cannot', () => {
		const classes = [
			{ id: 'weak', pump: { ...small, name: 'Weak (invented)' }, note: '' },
			{ id: 'thrifty', pump: { ...small, name: 'Thrifty (invented)' }, note: '' },
			{ id: 'hungry', pump: { ...small, name: 'Hungry (invented)' }, note: '' }
		];
		const watts: Record<string, number | null> = {
			'Weak (invented)': null,
			'Thrifty (invented)': 30,
			'Hungry (invented)': 90
		};
		const options = pumpOptions(classes, own, null);
		expect(initialPump(options, null, (pump) => watts[pump.name]!)).toBe('typical:thrifty');
		expect(initialPump(options, null, () => null)).toBe('typical:weak');
	});
});
