import { apiError } from '$lib/server/http/json';
import { comparisonFromQuery } from '$lib/server/compare/request';
import { comparisonCsv, monthlyCsv } from '$lib/server/compare/csv';
import { exportFileName } from '$lib/server/compare/file-name';
import { download } from '$lib/server/exports/download';
import type { RequestHandler } from './$types';

/** GET …/export.csv?…&table=comparison|monthly — the comparison table (default) or the monthly table. */
export const GET: RequestHandler = async (event) => {
	const table = event.url.searchParams.get('table') ?? 'comparison';
	if (table !== 'comparison' && table !== 'monthly')
		return apiError(400, 'invalid_request', 'table must be comparison or monthly');
	const found = await comparisonFromQuery(event);
	if (!found.ok) return found.response;
	const { report } = found.comparison;
	const body = table === 'monthly' ? monthlyCsv(report) : comparisonCsv(report);
	return download(body, exportFileName(report, table), 'csv');
};
