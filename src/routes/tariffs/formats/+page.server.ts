import { TARIFF_SHEET_COLUMNS } from '$lib/server/tariffs/sheet-import';
import type { PageServerLoad } from './$types';

export const load = (() => ({
	columns: TARIFF_SHEET_COLUMNS.map((c) => ({ ...c }))
})) satisfies PageServerLoad;
