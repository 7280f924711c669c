import { tariffSheetTemplateCsv } from '$lib/server/tariffs/sheet-template';
import type { RequestHandler } from './$types';

/** The batch import template: our header and two invented example rows. */
export const GET: RequestHandler = () =>
	new Response(tariffSheetTemplateCsv(), {
		headers: {
			'Content-Type': 'text/csv; charset=utf-8',
			'Content-Disposition': 'attachment; filename="runrate-tariff-import-template.csv"',
			'Cache-Control': 'public, max-age=3600'
		}
	});
