import { STANDARD_GRAVITY_M_PER_S2 } from './units';
import { waterDensityKgPerM3, waterViscosityPaS } from './water';

/**
 * Friction in a full pipe by Darcy–Weisbach, with the friction factor from Colebrook (1939) or
 * Swamee & Jain (1976), laminar flow by Hagen–Poiseuille. Lengths in metres, flows in m³/s, heads in
 * metres of the water flowing.
 */

/**
 * Absolute roughness of pipe walls, mm (the "ε" of the Moody diagram): drawn tubing (and smooth
 * plastic) 0.000005 ft = 0.0015 mm, galvanised iron 0.0005 ft = 0.15 mm (Moody 1944, "Friction factors
 * for pipe flow", Trans. ASME 66:671, Fig. 1). 0.15 mm is also EPANET 2's default for a new pipe.
 */
export const ROUGHNESS_MM = { plastic: 0.0015, galvanisedIron: 0.15 } as const;

/** Below this Reynolds number flow in a pipe is taken as laminar (common textbook limit, e.g. White). */
export const LAMINAR_REYNOLDS = 2300;
/** From this Reynolds number flow is taken as fully turbulent; between the two lies the transition. */
export const TURBULENT_REYNOLDS = 4000;

/** Water speed in a full round pipe, m/s: V = Q / (π·D²/4). */
export function pipeVelocityMPerS(flowM3PerS: number, diameterM: number): number {
	return flowM3PerS / ((Math.PI * diameterM ** 2) / 4);
}

/**
 * Reynolds number Re = ρ·V·D/μ of water in a pipe, with the density of Millero & Poisson (1981) and
 * the viscosity of Vogel's equation (see `water.ts`). Example: 1 m/s in a 25 mm pipe at 20 °C ≈ 24,900.
 */
export function reynoldsNumber(
	velocityMPerS: number,
	diameterM: number,
	temperatureC = 20,
	salinityGPerKg = 0
): number {
	const density = waterDensityKgPerM3(temperatureC, salinityGPerKg);
	return (density * Math.abs(velocityMPerS) * diameterM) / waterViscosityPaS(temperatureC, salinityGPerKg);
}

/**
 * Swamee & Jain (1976, J. Hydraulics Div. ASCE 102:657) explicit friction factor:
 * f = 0.25 / [log₁₀(ε/(3.7·D) + 5.74/Re^0.9)]², stated within about 1 % of
 * Colebrook for 5,000 ≤ Re ≤ 1e8 and 1e-6 ≤ ε/D ≤ 0.01 (up to 2.8 % at Re 5,000, ε/D 0.01, measured). Example: Re 1e5, ε/D 1e-4 → 0.018452.
 */
export function swameeJainFrictionFactor(reynolds: number, relativeRoughness: number): number {
	return 0.25 / Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9) ** 2;
}

/** Iterations the Colebrook solver allows itself; it needs fewer than ten from the Swamee–Jain start. */
const COLEBROOK_MAX_ITERATIONS = 50;

/**
 * Colebrook (1939, J. Inst. Civil Engineers 11:133) friction factor of turbulent flow, implicit:
 * 1/√f = −2·log₁₀(ε/(3.7·D) + 2.51/(Re·√f)). Solved by fixed-point iteration on x = 1/√f from the
 * Swamee–Jain value, until x changes by less than 1e-12 (at most 50 steps; the map contracts by a
 * factor under 0.2 at any turbulent Re, so convergence comes in a handful).
 * Example: Re 1e5, ε/D 1e-4 → 0.018514.
 */
export function colebrookFrictionFactor(reynolds: number, relativeRoughness: number): number {
	let x = 1 / Math.sqrt(swameeJainFrictionFactor(reynolds, relativeRoughness));
	for (let i = 0; i < COLEBROOK_MAX_ITERATIONS; i++) {
		const next = -2 * Math.log10(relativeRoughness / 3.7 + (2.51 * x) / reynolds);
		const done = Math.abs(next - x) < 1e-12;
		x = next;
		if (done) break;
	}
	return 1 / x ** 2;
}

/**
 * The Darcy friction factor at any Reynolds number: 64/Re when laminar (Hagen–Poiseuille, Re below
 * 2,300), Colebrook when turbulent (from 4,000). In the transition between them no equation holds;
 * Runrate takes the larger of the two, which is Colebrook's, so a pipe in that range is never
 * under-estimated. Null without flow (no friction factor is defined).
 */
export function darcyFrictionFactor(reynolds: number, relativeRoughness: number): number | null {
	if (!(reynolds > 0)) return null;
	const laminar = 64 / reynolds;
	if (reynolds < LAMINAR_REYNOLDS) return Number.isFinite(laminar) ? laminar : null;
	const turbulent = colebrookFrictionFactor(reynolds, relativeRoughness);
	return reynolds < TURBULENT_REYNOLDS ? Math.max(laminar, turbulent) : turbulent;
}

export interface DarcyFriction {
	velocityMPerS: number;
	reynoldsNumber: number;
	/** Darcy (Moody) friction factor; null without flow. */
	frictionFactor: number | null;
	headLossM: number;
}

/**
 * Darcy–Weisbach head loss h_f = f·(L/D)·V²/(2g) of water in a full pipe (Darcy 1857, Weisbach 1845;
 * any fluid-mechanics text). Laminar flow is computed as Hagen–Poiseuille, h_f = 32·μ·L·V/(ρ·g·D²), the
 * same as f = 64/Re without dividing by a tiny Re. Example: 10 US gpm through 50 ft of 1-inch plastic
 * pipe at 20 °C (1.25 m/s, Re ≈ 31,500, f ≈ 0.0234) loses about 1.11 m (3.6 ft).
 */
export function darcyWeisbach(
	lengthM: number,
	flowM3PerS: number,
	diameterM: number,
	roughnessMm: number,
	temperatureC = 20,
	salinityGPerKg = 0
): DarcyFriction {
	const velocityMPerS = pipeVelocityMPerS(flowM3PerS, diameterM);
	const reynolds = reynoldsNumber(velocityMPerS, diameterM, temperatureC, salinityGPerKg);
	const frictionFactor = darcyFrictionFactor(reynolds, roughnessMm / 1000 / diameterM);
	const g = STANDARD_GRAVITY_M_PER_S2;
	let headLossM = 0;
	if (lengthM > 0 && frictionFactor !== null) {
		headLossM =
			reynolds < LAMINAR_REYNOLDS
				? (32 * waterViscosityPaS(temperatureC, salinityGPerKg) * lengthM * velocityMPerS) /
					(waterDensityKgPerM3(temperatureC, salinityGPerKg) * g * diameterM ** 2)
				: (frictionFactor * (lengthM / diameterM) * velocityMPerS ** 2) / (2 * g);
	}
	return { velocityMPerS, reynoldsNumber: reynolds, frictionFactor, headLossM };
}
