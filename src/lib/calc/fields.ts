import { z } from 'zod';
import { storableText, UNSTORABLE } from './storable-text';

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

/** A trimmed, non-empty string of bounded length that a database can store (no U+0000, no lone surrogate). */
export function text(label: string, maxLength = 80) {
	return z
		.string({ error: required(label, 'text') })
		.trim()
		.min(1, { error: `${label} must not be empty` })
		.max(maxLength, { error: `${label} must be at most ${maxLength} characters` })
		.refine(storableText, UNSTORABLE);
}

/** One of a fixed list of words. */
export function choice<const T extends readonly [string, ...string[]]>(label: string, values: T) {
	return z.enum(values, { error: required(label, `one of: ${values.join(', ')}`) });
}

/**
 * How many problems one list reports before it stops checking its entries. Hostile input can pack two
 * problems into three bytes (`{}` where a time window belongs); checking every entry of a 1 MB body
 * would build hundreds of thousands of issues and hold the server for seconds. Nested lists each stop
 * on their own, so a request's problems stay in the hundreds whatever its size.
 */
export const PROBLEMS_PER_LIST = 100;

/** Checks each entry with `item`, stopping once the list has found PROBLEMS_PER_LIST problems. */
function checkEntries<T extends z.ZodType>(label: string, item: T, entries: unknown[], ctx: z.RefinementCtx) {
	const out: z.output<T>[] = new Array(entries.length);
	let problems = 0;
	for (let i = 0; i < entries.length; i++) {
		const result = item.safeParse(entries[i]);
		if (result.success) {
			out[i] = result.data;
			continue;
		}
		// The issues keep their code, message and union branches; only the path gains the entry's index.
		for (const issue of result.error.issues) ctx.addIssue({ ...issue, path: [i, ...issue.path] } as never);
		problems += result.error.issues.length;
		if (problems >= PROBLEMS_PER_LIST && i < entries.length - 1) {
			ctx.addIssue({
				code: 'custom',
				message: `${label}: entries after number ${i + 1} were not checked, as the ones before already have ${problems} problems`
			});
			break;
		}
	}
	return out;
}

/**
 * A list of bounded length. The length is checked before any entry (zod stops at `max`), and the
 * entries are checked one by one until the list has found enough problems to report.
 */
export function list<T extends z.ZodType>(
	label: string,
	item: T,
	bounds: { min?: number; max: number; tooMany?: string }
): z.ZodType<z.output<T>[], z.input<T>[]> {
	let schema = z.array(z.unknown(), { error: required(label, 'a list') });
	if (bounds.min) {
		schema = schema.min(bounds.min, {
			error: bounds.min === 1 ? `${label} must not be empty` : `${label} needs at least ${bounds.min} entries`
		});
	}
	schema = schema.max(bounds.max, {
		error: bounds.tooMany ?? `${label} can have at most ${figure(bounds.max)} entries`
	});
	// Typed as the plain array of `item` it stands for, so request types stay those of the entries.
	return schema.transform((entries, ctx) => checkEntries(label, item, entries, ctx)) as unknown as z.ZodType<
		z.output<T>[],
		z.input<T>[]
	>;
}

/** An object; extra keys are ignored. */
export function record<T extends z.ZodRawShape>(label: string, shape: T) {
	return z.object(shape, { error: required(label, 'an object') });
}
