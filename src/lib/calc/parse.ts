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
		out.push({ path: path.map(String).join('.'), message: issue.message });
	}
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
	const unique = issues.filter(
		(issue, i) =>
			issues.findIndex((other) => other.path === issue.path && other.message === issue.message) === i
	);
	return { success: false, error: { error: 'invalid_request', issues: unique } };
}
