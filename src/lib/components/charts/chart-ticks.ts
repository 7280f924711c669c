/**
 * Axis ticks that thin out instead of colliding: a narrow chart (a phone) names every second or third
 * month, a wide one names them all. The table under each chart still names every period in full.
 */

/** About 6.5 px a character of the small (text-xs) tick labels, plus a 6 px gap between labels. */
const CHAR_PX = 6.5;
const GAP_PX = 6;

/** Every `n`th value, so that at most `max` ticks are named (the first always is). */
export function thinTicks<T>(values: readonly T[], max: number): T[] {
	const step = Math.max(1, Math.ceil(values.length / Math.max(1, max)));
	return values.filter((_, index) => index % step === 0);
}

/** Room one tick label needs, in px, when the longest label has `labelChars` characters. */
export function tickWidthPx(labelChars: number): number {
	return Math.max(labelChars, 3) * CHAR_PX + GAP_PX;
}

/** The values whose labels fit side by side on an axis `axisWidthPx` wide without touching. */
export function ticksThatFit<T>(values: readonly T[], axisWidthPx: number, labelChars: number): T[] {
	return thinTicks(values, Math.floor(axisWidthPx / tickWidthPx(labelChars)));
}
