// Values JavaScript holds that PostgreSQL cannot store: U+0000 or a lone surrogate in text or jsonb, and
// whole numbers past its integer columns. Forms refuse them at the boundary, beside the field, instead
// of failing at the database with a 500.
import { NUL_MESSAGE, storableText, unstorableMessage } from '$lib/calc';

export { NUL_MESSAGE, SURROGATE_MESSAGE, storableText, UNSTORABLE, unstorableMessage } from '$lib/calc';

/**
 * The dotted path of the first string or key in a value (parsed JSON, a device list) that cannot be
 * stored, with the reason in words; null when all can. Walks with its own stack, so hostile nesting
 * cannot overflow the call stack.
 */
export function unstorableIn(value: unknown): { path: string; message: string } | null {
	const stack: [unknown, string][] = [[value, '']];
	for (let next = stack.pop(); next; next = stack.pop()) {
		const [node, path] = next;
		if (typeof node === 'string' && !storableText(node))
			return { path, message: unstorableMessage(node) ?? NUL_MESSAGE };
		if (!node || typeof node !== 'object') continue;
		for (const [key, child] of Object.entries(node)) {
			const at = path ? `${path}.${key}` : key;
			if (!storableText(key)) return { path: at, message: unstorableMessage(key) ?? NUL_MESSAGE };
			stack.push([child, at]);
		}
	}
	return null;
}

/** A form field holding JSON (the tariff editor's payload), parsed; unreadable JSON is undefined and
 * left to the parser that reads the form, with its own message. */
export function jsonField(text: unknown): unknown {
	try {
		return JSON.parse(String(text ?? ''));
	} catch {
		return undefined;
	}
}

/** The largest value of a PostgreSQL integer column, such as a row's revision. */
export const MAX_REVISION = 2 ** 31 - 1;

/**
 * A hidden revision field as the stale-write check takes it: a whole number that fits PostgreSQL's
 * integer, else -1, which matches no row and so answers as a conflicting save (409).
 */
export function revisionOf(raw: unknown): number {
	const revision = Number(raw);
	return Number.isInteger(revision) && revision >= 0 && revision <= MAX_REVISION ? revision : -1;
}
