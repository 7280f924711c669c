import type { RequestIssue } from '$lib/calc';
import type { PanelField } from './pumping-panel';

/** Where each of the API's field paths is shown on the pumping helper's form. */
const FIELD_OF: Record<string, PanelField> = {
	fluid: 'fluid',
	'air.depth': 'depth',
	'air.depthUnit': 'depth',
	...Object.fromEntries(
		(['flow', 'staticLift', 'pipeLength', 'innerDiameter'] as const).flatMap((field) => [
			[`pump.${field}`, field],
			[`pump.${field}Unit`, field]
		])
	),
	'pump.hazenWilliamsC': 'hazenWilliamsC',
	'pump.efficiencyPercent': 'efficiencyPercent',
	'pump.frictionMethod': 'frictionMethod',
	'pump.roughnessMm': 'roughnessMm',
	'pump.waterTemperatureC': 'waterTemperatureC',
	'pump.fittings': 'fittings'
};

const FITTING_ROW = /^pump\.fittings\.(\d+)\.(kind|count)$/;

/**
 * The API's issues at the boxes they concern: a fitting's at its row (by position), any other (a whole
 * part, the request) in `other`.
 */
export function fieldIssues(issues: readonly RequestIssue[]): {
	byField: Partial<Record<PanelField, string[]>>;
	byFittingRow: Partial<Record<number, string[]>>;
	other: string[];
} {
	const byField: Partial<Record<PanelField, string[]>> = {};
	const byFittingRow: Partial<Record<number, string[]>> = {};
	const other: string[] = [];
	for (const issue of issues) {
		const field = FIELD_OF[issue.path];
		const row = FITTING_ROW.exec(issue.path);
		if (field) (byField[field] ??= []).push(issue.message);
		else if (row) (byFittingRow[Number(row[1])] ??= []).push(issue.message);
		else other.push(issue.message);
	}
	return { byField, byFittingRow, other };
}
