// The designer's warnings and the riser chart's figures, shaped for the page from the core's result.
import type { AirDesignResult, CurvePoint } from '$lib/calc';

/** A warning as the page lists it: keyed for the list, each message once. */
export type ShownWarning = { key: string; message: string };

/**
 * The design's warnings and each air-lift's own, each message once: several risers of one kind, or the
 * design repeating a riser's warning, would otherwise say the same thing twice. A riser's warning names
 * the air-lift when the design has more than one.
 */
export function designWarnings(result: Pick<AirDesignResult, 'warnings' | 'airlifts'>): ShownWarning[] {
	const named = result.airlifts.length > 1;
	const designWide = result.warnings.map((w) => ({ code: w.code, message: w.message }));
	// A riser's warning the design already repeats (in its own words around it) is not said again.
	const repeated = (message: string) => designWide.some((w) => w.message.includes(message));
	const risers = result.airlifts.flatMap((lift) =>
		lift.warnings
			.filter((w) => !repeated(w.message))
			.map((w) => ({ code: w.code, message: named ? `${lift.name}: ${w.message}` : w.message }))
	);
	const seen = new Set<string>();
	return [...designWide, ...risers]
		.filter((w) => !seen.has(w.message) && Boolean(seen.add(w.message)))
		.map((w, i) => ({ key: `${i}-${w.code}`, message: w.message }));
}

/** The chart's axes: from zero to a little past the curve, the design point and the riser's most. */
export function chartDomain(
	curve: readonly CurvePoint[],
	design: CurvePoint
): { airLpm: [number, number]; waterLpm: [number, number] } {
	const air = Math.max(design.airLpm, ...curve.map((p) => p.airLpm));
	const water = Math.max(design.waterLpm, ...curve.map((p) => p.waterLpm));
	return { airLpm: [0, air > 0 ? air * 1.05 : 1], waterLpm: [0, water > 0 ? water * 1.1 : 1] };
}

/** Evenly spaced rows of the curve for its table: at most `count`, the last point always kept. */
export function tablePoints(curve: readonly CurvePoint[], count = 12): CurvePoint[] {
	if (curve.length <= count) return [...curve];
	const step = (curve.length - 1) / (count - 1);
	return Array.from({ length: count }, (_, i) => curve[Math.round(i * step)]!);
}
