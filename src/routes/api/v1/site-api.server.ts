// Answers shared by the site, scenario and equipment routes of the machine API.
import { json } from '@sveltejs/kit';
import type { RequestIssue } from '$lib/calc';
import { apiError } from '$lib/server/api';
import { findTariff } from '$lib/server/services/tariff.service';

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
 * A site or scenario may use a tariff of the public library or of its own workspace, and may pin only a
 * version that exists — the same rule as the site form. Anyone else's private tariff reads as unknown.
 */
export async function tariffChoiceIssue(
	workspaceId: string,
	choice: { tariffId: string | null; tariffVersion: number | null },
	prefix = ''
): Promise<RequestIssue | null> {
	if (!choice.tariffId)
		return choice.tariffVersion === null
			? null
			: { path: `${prefix}tariffVersion`, message: 'Pin a version only together with a tariff' };
	const found = await findTariff(choice.tariffId);
	if (!found || (found.tariff.workspaceId && found.tariff.workspaceId !== workspaceId))
		return { path: `${prefix}tariffId`, message: 'Pick a tariff from the library' };
	if (choice.tariffVersion !== null && !found.versions.some((v) => v.number === choice.tariffVersion))
		return {
			path: `${prefix}tariffVersion`,
			message: `That tariff has no version ${choice.tariffVersion}`
		};
	return null;
}
