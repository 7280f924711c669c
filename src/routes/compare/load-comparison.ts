import { error } from '@sveltejs/kit';
import { stillPicking } from '$lib/compare/picking';
import type { ComparisonReport } from '$lib/compare/types';

type Problem = { message: string; issues?: { path: string; message: string }[] };

/**
 * The compare page and its printable report both load the figures from GET /api/v1/compare, fetched
 * by the browser as the choices change; without scenarios in the address, or with fewer than two while
 * the person is still choosing (`picking`), there is nothing to ask.
 */
export async function loadComparison<Data extends object>({
	data,
	fetch,
	url
}: {
	data: Data;
	fetch: typeof globalThis.fetch;
	url: URL;
}) {
	if (!url.searchParams.has('scenarios') || stillPicking(url.searchParams))
		return { ...data, report: null, problem: null };
	const response = await fetch(`/api/v1/compare?${url.searchParams}`);
	if (response.status === 404) error(404, 'Not found');
	if (!response.ok) return { ...data, report: null, problem: (await response.json()) as Problem };
	return { ...data, report: (await response.json()) as ComparisonReport, problem: null };
}
