import { describe, expect, it } from 'vitest';
import { siteSchema } from './site.schema';
import {
	jsonField,
	NUL_MESSAGE,
	revisionOf,
	storableText,
	SURROGATE_MESSAGE,
	unstorableIn,
	unstorableMessage
} from './storable';

const pathOf = (value: unknown) => unstorableIn(value)?.path ?? null;

describe('text PostgreSQL cannot store', () => {
	it('tells text with U+0000 from text without', () => {
		expect(storableText('Raceway pump 1')).toBe(true);
		expect(storableText('Raceway\u0000pump')).toBe(false);
		expect(unstorableMessage('Raceway\u0000pump')).toBe(NUL_MESSAGE);
	});

	it('tells a lone half of a surrogate pair from a whole emoji', () => {
		expect(storableText('Pond 💧 and 𝔸')).toBe(true);
		for (const text of [
			'\uD800',
			'Pond \uD83D',
			'\uDCA7 pond',
			'a\uDC00\uD800b',
			'\uD83D\uD83D\uDCA7x\uDCA7'
		])
			expect(storableText(text), JSON.stringify(text)).toBe(false);
		expect(unstorableMessage('Pond \uD83D')).toBe(SURROGATE_MESSAGE);
		expect(unstorableMessage('Pond 💧')).toBeNull();
	});

	it('refuses a lone surrogate in a site name beside the field, in words', () => {
		const parsed = siteSchema.safeParse({
			name: 'Pond \uD800',
			country: 'US',
			currency: 'USD',
			timezone: 'UTC'
		});
		expect(parsed.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
			['name', SURROGATE_MESSAGE]
		]);
	});

	it('names the dotted path of the first string holding U+0000', () => {
		const tariff = { structure: { energyCharges: [{ label: 'Energy' }, { label: 'Rider\u0000' }] } };
		expect(pathOf(tariff)).toBe('structure.energyCharges.1.label');
		expect(pathOf({ meta: { name: 'Farm service' }, rates: [0.12, null, true] })).toBeNull();
		expect(unstorableIn({ devices: [{ name: 'Pump \uDFFF' }] })).toEqual({
			path: 'devices.0.name',
			message: SURROGATE_MESSAGE
		});
	});

	it('names a key holding U+0000 too, since jsonb refuses it there as well', () => {
		expect(pathOf({ structure: { 'a\u0000': 1 } })).toBe('structure.a\u0000');
	});

	it('walks nesting far deeper than the call stack allows', () => {
		let deep: unknown = 'end\u0000';
		for (let i = 0; i < 100_000; i++) deep = [deep];
		expect(pathOf(deep)).toBe(Array(100_000).fill('0').join('.'));
	});
});

describe('a form field holding JSON', () => {
	it('reads U+0000 and lone surrogates written as escapes in the JSON text', () => {
		expect(pathOf(jsonField('{"meta":{"name":"N\\u0000"}}'))).toBe('meta.name');
		expect(pathOf(jsonField('{"meta":{"name":"N\\ud800"}}'))).toBe('meta.name');
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
