/** The dash that tells one line from another besides its colour (SVG stroke-dasharray). */
export const LEGEND_DASH = '6 4';

/** One entry of a chart's legend: a square swatch, or a short line (dashed where `dashed`). */
export interface LegendEntry {
	key: string | number;
	name: string;
	colour: string;
	dashed?: boolean;
}
