import { describe, expect, it } from 'vitest';
import { jsonField, nulPath, revisionOf, withoutNul } from './storable';

describe('text PostgreSQL cannot store', () => {
	it('tells text with U+0000 from text without', () => {
		expect(withoutNul('Raceway pump 1')).toBe(true);
		expect(withoutNul('Raceway\u0000pump')).toBe(false);
	});

	it('names the dotted path of the first string holding U+0000', () => {
		const tariff = { structure: { energyCharges: [{ label: 'Energy' }, { label: 'Rider\u0000' }] } };
		expect(nulPath(tariff)).toBe('structure.energyCharges.1.label');
		expect(nulPath({ meta: { name: 'Farm service' }, rates: [0.12, null, true] })).toBeNull();
	});

	it('names a key holding U+0000 too, since jsonb refuses it there as well', () => {
		expect(nulPath({ structure: { 'a\u0000': 1 } })).toBe('structure.a\u0000');
	});

	it('walks nesting far deeper than the call stack allows', () => {
		let deep: unknown = 'end\u0000';
		for (let i = 0; i < 100_000; i++) deep = [deep];
		expect(nulPath(deep)).toBe(Array(100_000).fill('0').join('.'));
	});
});

describe('a form field holding JSON', () => {
	it('reads U+0000 written as an escape in the JSON text', () => {
		expect(nulPath(jsonField('{"meta":{"name":"N\\u0000"}}'))).toBe('meta.name');
	});

	it('leaves unreadable JSON and a missing field to the parser', () => {
		expect(jsonField('{"meta":')).toBeUndefined();
		expect(jsonField(null)).toBeUndefined();
	});
});

describe('a hidden revision field', () => {
	it('keeps a whole number that fits an integer column', () => {
		expect(revisionOf('0')).toBe(0);
		expect(revisionOf('7')).toBe(7);
		expect(revisionOf(String(2 ** 31 - 1))).toBe(2 ** 31 - 1);
	});

	it('reads a missing field as 0, as the forms always have', () => {
		expect(revisionOf(null)).toBe(0);
		expect(revisionOf('')).toBe(0);
	});

	it('turns anything else into -1, which matches no row', () => {
		for (const raw of ['x', 'NaN', '1.5', 'Infinity', '-1', '1e999', String(2 ** 31), '9007199254740993'])
			expect(revisionOf(raw), raw).toBe(-1);
	});
});
