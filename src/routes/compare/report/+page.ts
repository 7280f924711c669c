import { error } from '@sveltejs/kit';
import type { ComparisonReport } from '$lib/compare/types';
import type { PageLoad } from './$types';

type Problem = { message: string; issues?: { path: string; message: string }[] };

/** The figures come from GET /api/v1/compare — fetched by the browser as the choices change. */
export const load = (async ({ data, fetch, url }) => {
	if (!url.searchParams.has('scenarios')) return { ...data, report: null, problem: null };
	const response = await fetch(`/api/v1/compare?${url.searchParams}`);
	if (response.status === 404) error(404, 'Not found');
	if (!response.ok) return { ...data, report: null, problem: (await response.json()) as Problem };
	return { ...data, report: (await response.json()) as ComparisonReport, problem: null };
}) satisfies PageLoad;
