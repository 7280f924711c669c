import { fittingsHeadM } from './pipe-fittings';
import { darcyWeisbach, pipeVelocityMPerS, reynoldsNumber } from './pipe-friction';
import type { Air, FrictionMethod, Pump, PumpingRequest } from './pumping.schema';
import {
	DENSITY_KG_PER_M3,
	type Fluid,
	LITERS_PER_US_GALLON,
	METERS_PER_FOOT,
	PASCALS_PER_INCH_OF_WATER,
	PASCALS_PER_PSI,
	STANDARD_GRAVITY_M_PER_S2,
	flowToCubicMetersPerSecond,
	lengthToMeters
} from './units';
import { SALINITY_G_PER_KG } from './water';

export interface PumpPower {
	flowM3PerS: number;
	flowGpm: number;
	velocityMPerS: number;
	staticHeadM: number;
	frictionMethod: FrictionMethod;
	/** The pipe's own friction, straight lengths only. */
	frictionHeadM: number;
	/** The fittings' and valves' minor losses, ΣK·V²/(2g). */
	fittingsHeadM: number;
	reynoldsNumber: number;
	/** Darcy friction factor; null for Hazen–Williams, which has none, and without flow. */
	frictionFactor: number | null;
	/** Static + friction + fittings. */
	totalHeadM: number;
	totalHeadFt: number;
	hydraulicWatts: number;
	inputWatts: number;
}

export interface AirPressure {
	depthM: number;
	kPa: number;
	psi: number;
	inchesOfWater: number;
}

export interface PumpingResponse {
	fluid: Fluid;
	densityKgPerM3: number;
	pump: PumpPower | null;
	air: AirPressure | null;
}

/**
 * Pipe friction head by Hazen–Williams, SI form: h_f = 10.67 · L · Q^1.852 / (C^1.852 · d^4.8704),
 * with L and d in metres and Q in m³/s. Empirical, for water near room temperature in full pipes;
 * fittings and valves (minor losses) are counted apart, by `fittingsHeadM`.
 */
export function hazenWilliamsHeadLossM(
	lengthM: number,
	flowM3PerS: number,
	diameterM: number,
	c: number
): number {
	if (lengthM === 0 || flowM3PerS === 0) return 0;
	return (10.67 * lengthM * flowM3PerS ** 1.852) / (c ** 1.852 * diameterM ** 4.8704);
}

/** Hydraulic power ρ·g·Q·H, watts: the power the water receives. */
export function hydraulicWatts(flowM3PerS: number, headM: number, fluid: Fluid): number {
	return DENSITY_KG_PER_M3[fluid] * STANDARD_GRAVITY_M_PER_S2 * flowM3PerS * headM;
}

/** The pipe's friction by the method the request chose, with the flow's Reynolds number. */
function pipeFriction(pump: Pump, fluid: Fluid, lengthM: number, flowM3PerS: number, diameterM: number) {
	const salinity = SALINITY_G_PER_KG[fluid];
	if (pump.frictionMethod === 'darcy-weisbach') {
		const darcy = darcyWeisbach(
			lengthM,
			flowM3PerS,
			diameterM,
			pump.roughnessMm,
			pump.waterTemperatureC,
			salinity
		);
		return { headM: darcy.headLossM, reynolds: darcy.reynoldsNumber, factor: darcy.frictionFactor };
	}
	const velocity = pipeVelocityMPerS(flowM3PerS, diameterM);
	return {
		headM: hazenWilliamsHeadLossM(lengthM, flowM3PerS, diameterM, pump.hazenWilliamsC),
		reynolds: reynoldsNumber(velocity, diameterM, pump.waterTemperatureC, salinity),
		factor: null
	};
}

/**
 * A water pump's electrical input: total head = static lift + pipe friction (Hazen–Williams, or
 * Darcy–Weisbach with the Colebrook friction factor) + the fittings' minor losses ΣK·V²/(2g); hydraulic
 * power ρ·g·Q·H; input = hydraulic / wire-to-water efficiency (motor and pump together).
 * Example: 10 gpm up 5 ft through 50 ft of 1-inch pipe (C 150) at 25 % draws about 64 W.
 */
export function pumpInputPower(pump: Pump, fluid: Fluid): PumpPower {
	const flowM3PerS = flowToCubicMetersPerSecond(pump.flow, pump.flowUnit);
	const diameterM = lengthToMeters(pump.innerDiameter, pump.innerDiameterUnit);
	const staticHeadM = lengthToMeters(pump.staticLift, pump.staticLiftUnit);
	const lengthM = lengthToMeters(pump.pipeLength, pump.pipeLengthUnit);
	const velocityMPerS = pipeVelocityMPerS(flowM3PerS, diameterM);
	const friction = pipeFriction(pump, fluid, lengthM, flowM3PerS, diameterM);
	const fittings = fittingsHeadM(pump.fittings, velocityMPerS);
	const totalHeadM = staticHeadM + friction.headM + fittings;
	const hydraulic = hydraulicWatts(flowM3PerS, totalHeadM, fluid);
	return {
		flowM3PerS,
		flowGpm: (flowM3PerS * 60_000) / LITERS_PER_US_GALLON,
		velocityMPerS,
		staticHeadM,
		frictionMethod: pump.frictionMethod,
		frictionHeadM: friction.headM,
		fittingsHeadM: fittings,
		reynoldsNumber: friction.reynolds,
		frictionFactor: friction.factor,
		totalHeadM,
		totalHeadFt: totalHeadM / METERS_PER_FOOT,
		hydraulicWatts: hydraulic,
		inputWatts: hydraulic / (pump.efficiencyPercent / 100)
	};
}

/**
 * The gauge pressure an air pump must exceed to push air out at a depth: the water column above the
 * outlet, ρ·g·h (diffuser and tubing losses come on top). Example: 4.6 ft of fresh water ≈ 2.0 psi.
 */
export function airInjectionPressure(air: Air, fluid: Fluid): AirPressure {
	const depthM = lengthToMeters(air.depth, air.depthUnit);
	const pascals = DENSITY_KG_PER_M3[fluid] * STANDARD_GRAVITY_M_PER_S2 * depthM;
	return {
		depthM,
		kPa: pascals / 1000,
		psi: pascals / PASCALS_PER_PSI,
		inchesOfWater: pascals / PASCALS_PER_INCH_OF_WATER
	};
}

/** The pumping helper of POST /api/v1/pumping: a pump's input power and/or an air injection pressure. */
export function pumping(request: PumpingRequest): PumpingResponse {
	return {
		fluid: request.fluid,
		densityKgPerM3: DENSITY_KG_PER_M3[request.fluid],
		pump: request.pump ? pumpInputPower(request.pump, request.fluid) : null,
		air: request.air ? airInjectionPressure(request.air, request.fluid) : null
	};
}
