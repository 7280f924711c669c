import type { ComparisonReport } from '$lib/compare/types';
import { LEGEND_DASH, type LegendEntry } from '$lib/components/charts/chart-legend';
import { CATEGORY_COLOURS, CATEGORY_NAMES } from '$lib/components/charts/chart-style';
import type { Category } from '$lib/components/charts/chart-style';

/**
 * How the compare charts tell scenarios apart. The colours come from the scenario charts' family
 * (ink, reed, amber, the water blue, the violet, the tax brown): the baseline always takes the dark
 * ink, and the others follow in the order compared. The baseline's line is also dashed, and every
 * chart carries a table with the same figures, so no fact rests on colour alone.
 */
export const SCENARIO_COLOURS = ['#3c4f57', '#2f7a62', '#c58a2c', '#5b8fa8', '#7d6aa8', '#7c4a0f'] as const;

/** The dash of the baseline's line (SVG stroke-dasharray). */
export const BASELINE_DASH = LEGEND_DASH;

/** A scenario as the charts label and colour it; `index` is its place in `report.scenarios`. */
export interface ScenarioKey {
	index: number;
	/** The scenario's name, with its site's when the comparison spans more than one site. */
	name: string;
	colour: string;
	baseline: boolean;
}

/**
 * The compared scenarios in order, each with its label and colour. Past six scenarios (more than a
 * comparison allows) the colours repeat rather than fail.
 */
export function scenarioKeys(report: ComparisonReport): ScenarioKey[] {
	const sites = new Set(report.scenarios.map((scenario) => scenario.siteId));
	let next = 1;
	return report.scenarios.map((scenario, index) => {
		const baseline = index === report.baseline;
		const slot = baseline ? 0 : next++;
		const colour = SCENARIO_COLOURS[slot % SCENARIO_COLOURS.length] ?? SCENARIO_COLOURS[0];
		const name = sites.size > 1 ? `${scenario.name} (${scenario.siteName})` : scenario.name;
		return { index, name, colour, baseline };
	});
}

/** A scenario's name as the legends, tables and bars give it: the baseline says so. */
export function scenarioName(key: ScenarioKey): string {
	return key.baseline ? `${key.name} (baseline)` : key.name;
}

/** The scenarios as a legend: the baseline says so, and its line is dashed. */
export function scenarioLegend(keys: readonly ScenarioKey[]): LegendEntry[] {
	return keys.map((key) => ({
		key: key.index,
		name: scenarioName(key),
		colour: key.colour,
		dashed: key.baseline
	}));
}

const isCategory = (key: string): key is Category => Object.hasOwn(CATEGORY_NAMES, key);

/** A device category's name on the compare charts; an unknown one (newer data) shows its key. */
export function categoryName(key: string): string {
	return isCategory(key) ? CATEGORY_NAMES[key] : key;
}

/** A device category's colour; an unknown one takes the colour of "Other". */
export function categoryColour(key: string): string {
	return isCategory(key) ? CATEGORY_COLOURS[key] : CATEGORY_COLOURS.other;
}
