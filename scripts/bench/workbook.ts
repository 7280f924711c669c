// The workbook's part of the bench, loaded by `workbookModules()` (growth.ts) with `$lib` mapped.
export { comparisonWorkbook } from '$lib/server/exports/comparison-workbook';
export { exportOf } from '$lib/server/exports/workbook-exports';
