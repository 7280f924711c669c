import { z } from 'zod';

/**
 * Zod building blocks whose messages read as plain sentences ("Amps must be zero or more"), named by
 * the field a person typed into. Zod 4's `z.number()` already refuses NaN and ±Infinity.
 */

export interface Bounds {
	min?: number;
	max?: number;
	/** Strictly greater than. */
	above?: number;
	integer?: boolean;
}

function figure(value: number): string {
	return value.toLocaleString('en-US', { maximumFractionDigits: 6 });
}

function required(label: string, kind: string) {
	return (issue: { input: unknown }) =>
		issue.input === undefined ? `${label} is required` : `${label} must be ${kind}`;
}

/** A finite number within bounds. */
export function amount(label: string, bounds: Bounds = {}) {
	let schema = z.number({ error: required(label, 'a number') });
	if (bounds.integer) schema = schema.int({ error: `${label} must be a whole number` });
	if (bounds.above !== undefined) {
		schema = schema.gt(bounds.above, { error: `${label} must be more than ${figure(bounds.above)}` });
	}
	if (bounds.min !== undefined) {
		const message =
			bounds.min === 0 ? `${label} must be zero or more` : `${label} must be at least ${figure(bounds.min)}`;
		schema = schema.min(bounds.min, { error: message });
	}
	if (bounds.max !== undefined) {
		schema = schema.max(bounds.max, { error: `${label} must be at most ${figure(bounds.max)}` });
	}
	return schema;
}

/** A trimmed, non-empty string of bounded length, without U+0000 (which no database column can hold). */
export function text(label: string, maxLength = 80) {
	return z
		.string({ error: required(label, 'text') })
		.trim()
		.min(1, { error: `${label} must not be empty` })
		.max(maxLength, { error: `${label} must be at most ${maxLength} characters` })
		.refine((value) => !value.includes('\u0000'), {
			error: `${label} holds an invisible control character (U+0000); remove it`
		});
}

/** One of a fixed list of words. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
	return z.enum(values, { error: required(label, `one of: ${values.join(', ')}`) });
}

/** A list of bounded length. */
export function list<T extends z.ZodType>(label: string, item: T, bounds: { min?: number; max: number }) {
	let schema = z.array(item, { error: required(label, 'a list') });
	if (bounds.min) {
		schema = schema.min(bounds.min, {
			error: bounds.min === 1 ? `${label} must not be empty` : `${label} needs at least ${bounds.min} entries`
		});
	}
	return schema.max(bounds.max, { error: `${label} can have at most ${figure(bounds.max)} entries` });
}

/** An object; extra keys are ignored. */
export function record<T extends z.ZodRawShape>(label: string, shape: T) {
	return z.object(shape, { error: required(label, 'an object') });
}
