import { STANDARD_GRAVITY_M_PER_S2 as G } from './units';
import { barometricPressureAtm, STANDARD_ATMOSPHERE_PA, waterDensityKgPerM3 } from './water';

/** An air-lift riser in SI units: inner diameter, injection depth H_s, lift h, and the water's density. */
export interface Riser {
	diameterM: number;
	submergenceM: number;
	liftM: number;
	densityKgPerM3: number;
}

export interface CurvePoint {
	airLpm: number;
	waterLpm: number;
}

export interface RiserCurve {
	curve: CurvePoint[];
	maxWaterFlowLpm: number;
	airAtMaxWaterLpm: number;
}

/**
 * Effective Fanning friction factor of the riser for design: Stenning & Martin (1968) fitted about
 * 0.004–0.010 (entrance effects included) and recommend a fixed value; this is the middle of that range.
 */
export const RISER_FANNING_FACTOR = 0.007;

const LPM = 60_000;

/**
 * The water a riser carries for a free-air flow, m³/s, by the momentum balance of Stenning & Martin
 * (1968, J. Eng. Power 90:106, Eq. 17; Kassab et al. 2009 Eq. 19):
 * H_s/L = 1/(1 + Q_g/(s·Q_L)) + (V₁²/(2·g·L))·[(K+1) + (K+2)·Q_g/Q_L], V₁ = Q_L/A, K = 4·f·L/D,
 * Q_g the air at the riser's mean pressure p_a + ρ·g·H_s/2 (isothermal), and the Griffith & Wallis
 * slug-flow slip s = 1.2 + 0.2·Q_g/Q_L + 0.35·√(g·D)/V₁. The right side rises with Q_L, so the root is
 * found by bisection; no root above zero means the air cannot lift the water (0).
 * Example (derived from the model): a 25 mm riser 0.7 m submerged with 0.3 m of lift carries about
 * 19.7 L/min of water on 29.5 L/min of free air.
 */
export function riserWaterFlowM3PerS(
	freeAirM3PerS: number,
	riser: Riser,
	ambientPa: number,
	fanning = RISER_FANNING_FACTOR
): number {
	const lengthM = riser.submergenceM + riser.liftM;
	const area = (Math.PI * riser.diameterM ** 2) / 4;
	const meanPa = ambientPa + (riser.densityKgPerM3 * G * riser.submergenceM) / 2;
	const gas = (freeAirM3PerS * ambientPa) / meanPa;
	const k = (4 * fanning * lengthM) / riser.diameterM;
	const driftFlow = 0.35 * Math.sqrt(G * riser.diameterM) * area;
	const ratio = riser.submergenceM / lengthM;
	const excess = (water: number) => {
		const slipFlow = 1.2 * water + 0.2 * gas + driftFlow;
		const holdup = slipFlow / (slipFlow + gas);
		const velocityHead = (water / area) ** 2 / (2 * G * lengthM);
		const friction = water > 0 ? velocityHead * (k + 1 + ((k + 2) * gas) / water) : 0;
		return holdup + friction - ratio;
	};
	if (gas <= 0 || excess(0) >= 0) return 0;
	let high = area;
	while (excess(high) < 0 && high < 1e6) high *= 2;
	let low = 0;
	for (let i = 0; i < 200 && high - low > high * 1e-12; i++) {
		const middle = (low + high) / 2;
		if (excess(middle) < 0) low = middle;
		else high = middle;
	}
	return (low + high) / 2;
}

/**
 * The riser's water-against-air curve (it rises, peaks and falls as friction and slip take over) and
 * its peak, found by golden-section search past the first doubling that loses water.
 * Example (derived from the model): the 25 mm riser above peaks at about 21.3 L/min of water on
 * about 50 L/min of air.
 */
export function riserLimits(riser: Riser, ambientPa: number, points = 40): RiserCurve {
	const water = (air: number) => riserWaterFlowM3PerS(air, riser, ambientPa);
	let high = (Math.PI * riser.diameterM ** 2) / 4 / 10;
	while (water(high * 2) > water(high) && high < 1e6) high *= 2;
	let low = high / 4;
	high *= 2;
	const golden = (Math.sqrt(5) - 1) / 2;
	for (let i = 0; i < 200 && high - low > high * 1e-9; i++) {
		const a = high - golden * (high - low);
		const b = low + golden * (high - low);
		if (water(a) < water(b)) low = a;
		else high = b;
	}
	const airAtMax = (low + high) / 2;
	const span = airAtMax * 2.5;
	const curve = Array.from({ length: points + 1 }, (_, i) => {
		const air = (span * i) / points;
		return { airLpm: air * LPM, waterLpm: water(air) * LPM };
	});
	return { curve, maxWaterFlowLpm: water(airAtMax) * LPM, airAtMaxWaterLpm: airAtMax * LPM };
}

/** The riser's curve for the designer's chart, from the same inputs as `airlift`. */
export function riserCurve(
	input: {
		riserInnerDiameterM: number;
		submergenceM: number;
		liftM: number;
		temperatureC: number;
		salinityGPerKg: number;
		altitudeM: number;
	},
	points = 40
): RiserCurve {
	const riser: Riser = {
		diameterM: input.riserInnerDiameterM,
		submergenceM: input.submergenceM,
		liftM: input.liftM,
		densityKgPerM3: waterDensityKgPerM3(input.temperatureC, input.salinityGPerKg)
	};
	return riserLimits(riser, barometricPressureAtm(input.altitudeM) * STANDARD_ATMOSPHERE_PA, points);
}
