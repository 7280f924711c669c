import { isothermalAirWatts } from './air-pump';
import { STANDARD_GRAVITY_M_PER_S2 as G } from './units';
import { barometricPressureAtm, STANDARD_ATMOSPHERE_PA, waterDensityKgPerM3 } from './water';
import { airliftWarnings } from './airlift-warnings';
import { riserLimits, riserWaterFlowM3PerS, type Riser } from './riser';

/** A warning in words a grower understands, with a stable code for programs. */
export interface Warning {
	code: string;
	message: string;
}

export interface AirliftInput {
	riserInnerDiameterM: number;
	/** Depth of the air injection below the water surface, H_s. */
	submergenceM: number;
	/** Height of the discharge above the water surface, h. */
	liftM: number;
	temperatureC: number;
	salinityGPerKg: number;
	altitudeM: number;
	efficiencyPercent: number;
	/** Exactly one of the two flows: the water wanted, or the air available (free air). */
	waterFlowLpm?: number;
	airFlowLpm?: number;
}

export interface AirliftResult {
	waterFlowLpm: number;
	/** Free air: at the site's atmospheric pressure. */
	airFlowLpm: number;
	/** Gauge pressure of the water column at the injection (line and injector losses come on top). */
	injectionPressureKPa: number;
	submergenceRatio: number;
	airToWaterRatio: number;
	hydraulicWatts: number;
	isothermalAirWatts: number;
	maxWaterFlowLpm: number;
	airAtMaxWaterLpm: number;
	curve: { airLpm: number; waterLpm: number }[];
	efficiencyPercent: number;
	densityKgPerM3: number;
	warnings: Warning[];
}

const LPM_PER_M3_PER_S = 60_000;
/** Below this lift the air-lift only circulates water and Nicklin's efficiency means nothing. */
const CIRCULATION_LIFT_M = 0.005;

/**
 * The free air an air-lift needs for a water flow, by Nicklin's (1963) efficiency (as restated by
 * Kassab et al. 2009, Int. J. Heat Fluid Flow 30:88, Eq. 23): η = ρ·g·Q_w·h / (p_a·Q_a·ln(p_in/p_a)),
 * so Q_a = ρ·g·Q_w·h / (η·p_a·ln(p_in/p_a)), with p_in = p_a + ρ·g·H_s. Example (derived from the
 * equation): 20 L/min lifted 0.3 m from 0.7 m deep, fresh water at 20 °C, η 30 % → 29.5 L/min of free air.
 */
export function nicklinAirM3PerS(
	waterM3PerS: number,
	riser: Riser,
	efficiency: number,
	ambientPa: number
): number {
	const inlet = ambientPa + riser.densityKgPerM3 * G * riser.submergenceM;
	const work = riser.densityKgPerM3 * G * waterM3PerS * riser.liftM;
	return work / (efficiency * ambientPa * Math.log(inlet / ambientPa));
}

/** Nicklin's equation the other way: the water an air flow lifts at a given efficiency. */
export function nicklinWaterM3PerS(
	airM3PerS: number,
	riser: Riser,
	efficiency: number,
	ambientPa: number
): number {
	return airM3PerS / nicklinAirM3PerS(1, riser, efficiency, ambientPa);
}

/** The free air (on the rising side of the riser's curve) at which the momentum model gives `waterM3PerS`. */
function momentumAirM3PerS(
	waterM3PerS: number,
	riser: Riser,
	ambientPa: number,
	airAtMaxM3PerS: number
): number {
	let low = 0;
	let high = airAtMaxM3PerS;
	for (let i = 0; i < 100 && high - low > 1e-12; i++) {
		const middle = (low + high) / 2;
		if (riserWaterFlowM3PerS(middle, riser, ambientPa) < waterM3PerS) low = middle;
		else high = middle;
	}
	return high;
}

/**
 * One air-lift: the air it needs for a water flow (or the water an air flow gives), the pressure at the
 * injection, the power the water receives and the isothermal power of the air, the riser's flow limit
 * from the momentum model, and the warnings of Stenning & Martin's rules (Sr ≥ 0.6; air-to-water about
 * 1–2). With no lift the efficiency does not apply and the momentum model gives the flows.
 */
export function airlift(input: AirliftInput): AirliftResult {
	const densityKgPerM3 = waterDensityKgPerM3(input.temperatureC, input.salinityGPerKg);
	const ambientPa = barometricPressureAtm(input.altitudeM) * STANDARD_ATMOSPHERE_PA;
	const riser: Riser = {
		diameterM: input.riserInnerDiameterM,
		submergenceM: input.submergenceM,
		liftM: input.liftM,
		densityKgPerM3
	};
	const { curve, maxWaterFlowLpm, airAtMaxWaterLpm } = riserLimits(riser, ambientPa);
	const efficiency = input.efficiencyPercent / 100;
	const circulating = input.liftM < CIRCULATION_LIFT_M;
	let waterM3PerS: number;
	let airM3PerS: number;
	if (input.waterFlowLpm !== undefined) {
		waterM3PerS = input.waterFlowLpm / LPM_PER_M3_PER_S;
		airM3PerS = circulating
			? momentumAirM3PerS(
					Math.min(waterM3PerS, maxWaterFlowLpm / LPM_PER_M3_PER_S),
					riser,
					ambientPa,
					airAtMaxWaterLpm / LPM_PER_M3_PER_S
				)
			: nicklinAirM3PerS(waterM3PerS, riser, efficiency, ambientPa);
	} else {
		airM3PerS = (input.airFlowLpm ?? 0) / LPM_PER_M3_PER_S;
		waterM3PerS = circulating
			? riserWaterFlowM3PerS(airM3PerS, riser, ambientPa)
			: nicklinWaterM3PerS(airM3PerS, riser, efficiency, ambientPa);
	}
	const waterFlowLpm = waterM3PerS * LPM_PER_M3_PER_S;
	const airFlowLpm = airM3PerS * LPM_PER_M3_PER_S;
	const injectionPressureKPa = (densityKgPerM3 * G * input.submergenceM) / 1000;
	const submergenceRatio = input.submergenceM / (input.submergenceM + input.liftM);
	const airToWaterRatio = waterFlowLpm > 0 ? airFlowLpm / waterFlowLpm : 0;
	return {
		waterFlowLpm,
		airFlowLpm,
		injectionPressureKPa,
		submergenceRatio,
		airToWaterRatio,
		hydraulicWatts: densityKgPerM3 * G * waterM3PerS * input.liftM,
		isothermalAirWatts: isothermalAirWatts(airFlowLpm, injectionPressureKPa, ambientPa / 1000),
		maxWaterFlowLpm,
		airAtMaxWaterLpm,
		curve,
		efficiencyPercent: input.efficiencyPercent,
		densityKgPerM3,
		warnings: airliftWarnings({
			waterFlowLpm,
			airFlowLpm,
			submergenceRatio,
			airToWaterRatio,
			maxWaterFlowLpm,
			circulating
		})
	};
}
