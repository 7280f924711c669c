import type { ComparisonReport } from '$lib/compare/types';
import { safeFileName } from '$lib/server/exports/download';

/** "alder-creek-trout-hatchery-demo-comparison-2027" from the baseline's site and the year compared. */
export function exportFileName(report: ComparisonReport, what: string): string {
	const site = report.scenarios[report.baseline]?.siteName ?? 'runrate';
	return safeFileName(site, what === 'comparison' ? 'comparison' : `${what}`, report.query.start.slice(0, 4));
}
