// Answers shared by the site, scenario, equipment, bill and tariff routes of the machine API.
import { json } from '@sveltejs/kit';
import type { RequestIssue } from '$lib/calc';
import { apiError } from './json';

/** Readings of one person's workspace data: never kept by a shared cache. */
export const PRIVATE = { 'Cache-Control': 'private, no-store' } as const;

/** 400 with the field issues of a request that failed validation. */
export const invalid = (issues: RequestIssue[]) =>
	apiError(400, 'invalid_request', 'Some fields need attention.', issues);

/** 404; unknown ids and ids the caller may not see get the same answer. */
export const notFound = (message = 'Not found') => apiError(404, 'not_found', message);

/** The answer to a write based on a stale copy; the caller reloads from `currentRevision`. */
export const conflict = (currentRevision: number) =>
	json(
		{
			error: 'conflict',
			message: 'Someone else saved a change here while you were editing.',
			currentRevision
		},
		{ status: 409, headers: { 'Cache-Control': 'no-store' } }
	);

/** 405 with the methods the route does answer, in the body and in `Allow`. */
export function methodNotAllowed(...methods: string[]) {
	const words = methods.length > 1 ? `${methods.slice(0, -1).join(', ')} or ${methods.at(-1)}` : methods[0];
	const response = apiError(405, 'method_not_allowed', `Use ${words}.`);
	response.headers.set('Allow', methods.join(', '));
	return response;
}

/** Why a service wrote nothing: a stale revision, field issues, or nothing at the place named. */
export type Refusal = { conflict: number } | { issues: RequestIssue[] } | { missing: true };

/** The answer to a refused write: 409 for a stale revision, 400 for issues, 404 (`missing`) for no such row. */
export function refusal(refused: Refusal, missing = 'Not found') {
	if ('conflict' in refused) return conflict(refused.conflict);
	if ('issues' in refused) return invalid(refused.issues);
	return notFound(missing);
}
