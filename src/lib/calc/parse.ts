import type { z } from 'zod';

export interface RequestIssue {
	/** Dotted path to the field, e.g. "equipment.0.power.amps"; "" for the request itself. */
	path: string;
	message: string;
}

export interface InvalidRequest {
	error: 'invalid_request';
	issues: RequestIssue[];
}

export type ParseResult<T> = { success: true; data: T } | { success: false; error: InvalidRequest };

type Path = ReadonlyArray<PropertyKey>;

function valueAt(input: unknown, path: Path): unknown {
	let value = input;
	for (const key of path) {
		if (value === null || typeof value !== 'object') return undefined;
		value = (value as Record<PropertyKey, unknown>)[key];
	}
	return value;
}

/** Issues of a branch that are "this key is missing": the branch likely is not what the sender meant. */
function missingKeys(branch: readonly z.core.$ZodIssue[], input: unknown, base: Path): number {
	return branch.filter(
		(issue) => issue.code === 'invalid_type' && valueAt(input, [...base, ...issue.path]) === undefined
	).length;
}

/**
 * Names the first few unknown keys only: zod's own message lists every one, so a body of 100,000 keys
 * would be answered with a message as long as the body.
 */
function unknownKeys(keys: readonly string[]): string {
	const shown = keys.slice(0, 5).map((key) => (key.length > 40 ? `${key.slice(0, 40)}…` : key));
	const more = keys.length - shown.length;
	const names = more > 0 ? `${shown.join(', ')} and ${more.toLocaleString('en-US')} more` : shown.join(', ');
	return `${keys.length === 1 ? 'This field is' : 'These fields are'} not part of the request: ${names}`;
}

/**
 * Flattens zod issues into path + message pairs. A union that failed in every branch reports the
 * branch the input evidently meant (the one alone in missing the fewest keys); when that is unclear,
 * or the input is empty, it reports the union's own message ("Give power either as watts, or as amps and volts").
 */
function flatten(issues: readonly z.core.$ZodIssue[], input: unknown, base: Path, out: RequestIssue[]): void {
	for (const issue of issues) {
		const path = [...base, ...issue.path];
		if (issue.code === 'invalid_union' && issue.errors.length > 0) {
			const missing = issue.errors.map((branch) => missingKeys(branch, input, path));
			const fewest = Math.min(...missing);
			const value = valueAt(input, path);
			const filledIn = value !== null && typeof value === 'object' && Object.keys(value).length > 0;
			const unique = missing.filter((count) => count === fewest).length === 1;
			const branch = unique && (fewest === 0 || filledIn) ? issue.errors[missing.indexOf(fewest)] : undefined;
			if (branch) {
				flatten(branch, input, path, out);
				continue;
			}
		}
		const message = issue.code === 'unrecognized_keys' ? unknownKeys(issue.keys) : issue.message;
		out.push({ path: path.map(String).join('.'), message });
	}
}

/** Each item once, the first of those with the same key, in order; linear (a Set of keys). */
export function distinctBy<T>(items: readonly T[], key: (item: T) => string): T[] {
	const seen = new Set<string>();
	return items.filter((item) => {
		const k = key(item);
		if (seen.has(k)) return false;
		seen.add(k);
		return true;
	});
}

/** How many problems one answer lists; past that, a last issue says how many were left out. */
export const MAX_REPORTED_ISSUES = 50;

/**
 * Each problem once, in order, at most MAX_REPORTED_ISSUES of them plus a last one saying how many more
 * there are. Linear: a Set of path and message, so a long list costs no more than reading it.
 */
export function reportable(issues: readonly RequestIssue[], max = MAX_REPORTED_ISSUES): RequestIssue[] {
	const distinct = distinctBy(issues, (issue) => `${issue.path}\u0000${issue.message}`);
	const out = distinct.slice(0, max);
	const left = distinct.length - out.length;
	if (left > 0)
		out.push({
			path: '',
			message: `${left} more ${left === 1 ? 'problem was' : 'problems were'} left out; fix these and send again to see the rest`
		});
	return out;
}

/**
 * Parses untrusted JSON with a request schema. On failure it answers the API's 400 body:
 * `{ error: 'invalid_request', issues: [{ path: 'equipment.0.power.amps', message: 'Amps must be zero or more' }] }`.
 */
export function parseRequest<S extends z.ZodType>(schema: S, json: unknown): ParseResult<z.output<S>> {
	if (json === null || typeof json !== 'object' || Array.isArray(json)) {
		return {
			success: false,
			error: {
				error: 'invalid_request',
				issues: [{ path: '', message: 'The request must be a JSON object' }]
			}
		};
	}
	const result = schema.safeParse(json);
	if (result.success) return { success: true, data: result.data };
	const issues: RequestIssue[] = [];
	flatten(result.error.issues, json, [], issues);
	return { success: false, error: { error: 'invalid_request', issues: reportable(issues) } };
}
