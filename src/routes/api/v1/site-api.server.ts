// Answers shared by the site, scenario and equipment routes of the machine API.
import { json } from '@sveltejs/kit';
import type { RequestIssue } from '$lib/calc';
import { apiError } from '$lib/server/api';
import { tariffChoiceProblem, type TariffChooser } from '$lib/server/tariffs/usable';

/** Readings of one person's workspace data: never kept by a shared cache. */
export const PRIVATE = { 'Cache-Control': 'private, no-store' } as const;

export const invalid = (issues: RequestIssue[]) =>
	apiError(400, 'invalid_request', 'Some fields need attention.', issues);

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

/**
 * A tariff chosen for a site or scenario, checked by the one rule (`tariffChoiceProblem`): the public
 * library or the site's own workspace, a guest only public ones and those already chosen, and a pinned
 * version that exists. Unknown and foreign ids get the same answer.
 */
export async function tariffChoiceIssue(
	chooser: TariffChooser,
	choice: { tariffId: string | null; tariffVersion: number | null },
	prefix = ''
): Promise<RequestIssue | null> {
	const problem = await tariffChoiceProblem(chooser, choice);
	return problem && { path: `${prefix}${problem.field}`, message: problem.message };
}
