/**
 * Where the cumulative chart writes each payback ring's label, in pixels, so that labels neither
 * overlap one another nor leave the plot: several scenarios often pay back in the same year, and a
 * phone has little room. Every label is also in the list under the chart, so one may be shared.
 */

/** A ring's centre in pixels and the label it should carry ("year ~3.4"). */
export interface MarkerPoint {
	x: number;
	y: number;
	text: string;
}

/** A label's baseline start (or end, for `anchor: 'end'`) in pixels. */
export interface MarkerLabel {
	x: number;
	y: number;
	text: string;
	anchor: 'start' | 'end';
}

/** About 6.5 px a character of the small bold label text, and its height above the baseline. */
const CHAR_PX = 6.5;
const TEXT_PX = 12;
/** Offsets of the baseline from the ring's centre, tried in turn: above, below, further out. */
const OFFSETS = [-9, 17, -23, 31, -37, 45];
const GAP_PX = 9;
/** A ring's radius and stroke. */
const RING_PX = 6;
/** Rings this close with the same text share the first one's label. */
const SAME_PX = 12;

interface Box {
	left: number;
	right: number;
	top: number;
	bottom: number;
}

const overlaps = (a: Box, b: Box) =>
	a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

/**
 * One label per ring, or null where a ring shares the label of an earlier one at the same place.
 * A label sits right of its ring, or left of it in the right part of the plot, at the first offset
 * that is clear of the rings and of earlier labels, and inside the plot's `height`.
 */
export function placeMarkerLabels(
	points: readonly MarkerPoint[],
	width: number,
	height: number
): (MarkerLabel | null)[] {
	// Labels keep clear of every ring as well as of each other.
	const taken: Box[] = points.map((p) => ({
		left: p.x - RING_PX,
		right: p.x + RING_PX,
		top: p.y - RING_PX,
		bottom: p.y + RING_PX
	}));
	const labelled: MarkerPoint[] = [];
	return points.map((point) => {
		const shared = labelled.some(
			(other) =>
				other.text === point.text &&
				Math.abs(other.x - point.x) <= SAME_PX &&
				Math.abs(other.y - point.y) <= SAME_PX
		);
		if (shared) return null;
		const anchor = point.x > width * 0.6 ? 'end' : 'start';
		const x = anchor === 'end' ? point.x - GAP_PX : point.x + GAP_PX;
		const textWidth = point.text.length * CHAR_PX;
		const boxAt = (y: number): Box => ({
			left: anchor === 'end' ? x - textWidth : x,
			right: anchor === 'end' ? x : x + textWidth,
			top: y - TEXT_PX,
			bottom: y + 2
		});
		const inside = OFFSETS.map((offset) => point.y + offset).filter((y) => y - TEXT_PX >= 0 && y <= height);
		const y =
			inside.find((y) => !taken.some((box) => overlaps(box, boxAt(y)))) ??
			inside[0] ??
			point.y + (OFFSETS[0] ?? 0);
		taken.push(boxAt(y));
		labelled.push(point);
		return { x, y, text: point.text, anchor };
	});
}
