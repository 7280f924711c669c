import { STANDARD_GRAVITY_M_PER_S2 } from './units';

/**
 * Minor losses: the head a fitting or valve takes, h = K·V²/(2g), V the water speed in the pipe.
 * K values for fully open valves and standard fittings from the EPANET 2 user manual (Rossman 2000,
 * EPA/600/R-00/057, Table 3.3 "Minor loss coefficients for selected fittings"), except the ball valve,
 * which that table lacks: Crane Technical Paper 410 gives a full-port ball valve K = 3·f_T, f_T the
 * fully turbulent friction factor of the pipe size (0.023 for 1-inch, Crane TP-410 p. A-26), so about
 * 0.07 for small sizes. Handbooks differ by up to about 30 % for small fittings; these are typical.
 */
export const FITTING_K = {
	'elbow-90-short': 0.9,
	'elbow-90-medium': 0.8,
	'elbow-90-long': 0.6,
	'elbow-45': 0.4,
	'tee-run': 0.6,
	'tee-branch': 1.8,
	'swing-check-valve': 2.5,
	'gate-valve': 0.2,
	'globe-valve': 10,
	'ball-valve': 0.07,
	'square-entrance': 0.5,
	exit: 1
} as const;

export type FittingKind = keyof typeof FITTING_K;
export const FITTING_KINDS = Object.keys(FITTING_K) as [FittingKind, ...FittingKind[]];

/** A kind of fitting and how many of them the pipe has. */
export interface FittingCount {
	kind: FittingKind;
	count: number;
}

/** ΣK of a list of fittings: each kind's K times how many there are. */
export function totalK(fittings: readonly FittingCount[]): number {
	return fittings.reduce((sum, fitting) => sum + FITTING_K[fitting.kind] * fitting.count, 0);
}

/**
 * The head the fittings take, metres: ΣK·V²/(2g) (Darcy–Weisbach's velocity-head form of minor losses;
 * any fluid-mechanics text). Example: two standard 90° elbows (K 0.9 each) at 1.2 m/s take
 * 1.8 × 1.44 / 19.6133 ≈ 0.132 m.
 */
export function fittingsHeadM(fittings: readonly FittingCount[], velocityMPerS: number): number {
	return (totalK(fittings) * velocityMPerS ** 2) / (2 * STANDARD_GRAVITY_M_PER_S2);
}
