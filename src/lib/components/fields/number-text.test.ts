import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { numberDraft, numberText, parseNumber, syncedText } from './number-text';

describe('a box that keeps its text (the tariff editor)', () => {
	it('writes the number a person typed', () => {
		expect(numberDraft('0.12')).toBe(0.12);
		expect(numberDraft(' 12 ')).toBe(12);
		expect(numberDraft('.5')).toBe(0.5);
		expect(numberDraft('-0.004')).toBe(-0.004);
		expect(numberDraft('1e3')).toBe(1000);
	});

	it('never yields NaN or an infinite number, whatever is typed', () => {
		fc.assert(
			fc.property(fc.string(), (text) => {
				const draft = numberDraft(text);
				return typeof draft !== 'number' || Number.isFinite(draft);
			})
		);
		expect(numberDraft('NaN')).toBe('NaN');
	});

	it('shows a loaded value, and nothing for an empty or broken one', () => {
		expect(numberText(0.31)).toBe('0.31');
		expect(numberText(undefined)).toBe('');
		expect(numberText(null)).toBe('');
		expect(numberText(Number.NaN)).toBe('');
		expect(numberText('12abc')).toBe('12abc');
	});

	it('keeps its half-typed text while it means the same value, and follows a changed value', () => {
		expect(syncedText(0, '0.')).toBe('0.');
		expect(syncedText(undefined, '')).toBe('');
		expect(syncedText(0.2, '0.1')).toBe('0.2');
		expect(syncedText(undefined, '5')).toBe('');
		expect(syncedText(null, '')).toBe('');
	});
});

describe('a box that writes numbers only (the equipment table)', () => {
	it('writes the number typed', () => {
		expect(parseNumber(' 12.5 ')).toEqual({ value: 12.5, bad: false });
		expect(parseNumber('.5')).toEqual({ value: 0.5, bad: false });
		expect(parseNumber('-3')).toEqual({ value: -3, bad: false });
	});

	it('writes nothing for an empty box, so the schema says the field is required', () => {
		expect(parseNumber('')).toEqual({ value: undefined, bad: false });
		expect(parseNumber('  ')).toEqual({ value: undefined, bad: false });
	});

	it('writes nothing, and flags the box, for text that is not a number', () => {
		expect(parseNumber('12abc')).toEqual({ value: undefined, bad: true });
		expect(parseNumber('0,9')).toEqual({ value: undefined, bad: true });
		expect(parseNumber('Infinity')).toEqual({ value: undefined, bad: true });
		expect(parseNumber('1e999')).toEqual({ value: undefined, bad: true });
	});

	it('never writes NaN or an infinite number, whatever is typed', () => {
		fc.assert(
			fc.property(fc.string(), (text) => {
				const { value } = parseNumber(text);
				return value === undefined || Number.isFinite(value);
			})
		);
		expect(parseNumber('NaN').value).toBeUndefined();
	});

	it('shows a stored number, and nothing for a missing one', () => {
		expect(numberText(0.31)).toBe('0.31');
		expect(numberText(undefined)).toBe('');
		expect(numberText(null)).toBe('');
		expect(numberText(Number.NaN)).toBe('');
	});
});
