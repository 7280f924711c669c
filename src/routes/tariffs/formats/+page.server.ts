import { TARIFF_SHEET_COLUMNS } from '$lib/server/tariffs/sheet-columns';
import type { PageServerLoad } from './$types';

export const load = (() => ({
	columns: TARIFF_SHEET_COLUMNS.map((c) => ({ ...c }))
})) satisfies PageServerLoad;
