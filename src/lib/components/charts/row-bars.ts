/**
 * The measures of a chart of horizontal bars, one row a name: each row is the name on a line of
 * its own above its bar, so long names need no room along an axis on a phone.
 */

/** The height of one row: its name above, its bar below. */
export const ROW_PX = 46;
/** The room the name takes above the bar. */
export const NAME_PX = 18;
/** Around the rows: room for the axis and its name below. */
export const ROW_PADDING = { top: 4, right: 8, bottom: 44, left: 14 };

/** The height of the drawing for `rowCount` rows, in px. */
export function rowsHeightPx(rowCount: number): number {
	return rowCount * ROW_PX + ROW_PADDING.top + ROW_PADDING.bottom;
}

/** A name cut to `maxChars` characters with an ellipsis, so that it stays on its row. */
export function shortName(name: string, maxChars: number): string {
	return name.length > maxChars ? `${name.slice(0, maxChars - 1)}…` : name;
}

/** Where one row's bar goes: its top and height in px, the row's band, and the scale along the bars. */
export interface RowBand {
	/** The bar's top, below the name. */
	y: number;
	height: number;
	/** The row's top (the name's line) and its whole height. */
	top: number;
	band: number;
	x: (amount: number) => number;
}
