/**
 * The API's air requests, in the units people type, turned into the core's SI inputs: lengths in
 * metres, flows in litres per minute, salinity from the kind of water unless given.
 */
import type { AerationInput } from './aeration';
import type { AerationRequest } from './aeration.schema';
import type { AirliftInput } from './airlift';
import type { AirliftRequest } from './airlift.schema';
import { DIFFUSER_TRANSFER_PERCENT_PER_M } from './oxygen-transfer';
import {
	type FlowUnit,
	flowToCubicMetersPerSecond,
	lengthToMeters,
	PASCALS_PER_INCH_OF_WATER,
	PASCALS_PER_PSI
} from './units';
import { SALINITY_G_PER_KG } from './water';

/** A flow in any of the pumping helper's units, in litres per minute. */
export function flowToLpm(flow: number, unit: FlowUnit): number {
	return flowToCubicMetersPerSecond(flow, unit) * 60_000;
}

/** Units an air pump's data sheet gives pressure in: kilopascals, psi, inches of water. */
export const PRESSURE_UNITS = ['kPa', 'psi', 'inH2O'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

const PASCALS: Record<PressureUnit, number> = {
	kPa: 1000,
	psi: PASCALS_PER_PSI,
	inH2O: PASCALS_PER_INCH_OF_WATER
};

/** A gauge pressure in any of PRESSURE_UNITS, in kPa. Example: 2 psi → 13.79 kPa; 40 inH₂O → 9.96 kPa. */
export function pressureToKPa(pressure: number, unit: PressureUnit): number {
	return (pressure * PASCALS[unit]) / 1000;
}

/**
 * An air-lift request as the core's input. Example: 20 lpm, lift 30 cm, submergence 70 cm, 1 in riser
 * → waterFlowLpm 20, liftM 0.3, submergenceM 0.7, riserInnerDiameterM 0.0254.
 */
export function airliftInputFrom(request: AirliftRequest): AirliftInput {
	const flow =
		request.waterFlow !== undefined
			? { waterFlowLpm: flowToLpm(request.waterFlow, request.waterFlowUnit ?? 'lpm') }
			: { airFlowLpm: flowToLpm(request.airFlow ?? 0, request.airFlowUnit ?? 'lpm') };
	return {
		riserInnerDiameterM: lengthToMeters(request.riserInnerDiameter, request.riserInnerDiameterUnit),
		submergenceM: lengthToMeters(request.submergence, request.submergenceUnit),
		liftM: lengthToMeters(request.lift, request.liftUnit),
		temperatureC: request.temperatureC,
		salinityGPerKg: request.salinityGPerKg ?? SALINITY_G_PER_KG[request.fluid],
		altitudeM: request.altitudeM,
		efficiencyPercent: request.efficiencyPercent,
		...flow
	};
}

/**
 * An aeration request as the core's input: the diffuser depth in metres, and the transfer per metre
 * given or else the diffuser kind's typical value.
 */
export function aerationInputFrom(request: AerationRequest): AerationInput {
	return {
		temperatureC: request.temperatureC,
		salinityGPerKg: request.salinityGPerKg,
		altitudeM: request.altitudeM,
		targetDoMgL: request.targetDoMgL,
		diffuserDepthM: lengthToMeters(request.diffuserDepth, request.diffuserDepthUnit),
		transferPercentPerM:
			request.transferPercentPerM ?? DIFFUSER_TRANSFER_PERCENT_PER_M[request.diffuser ?? 'fine'],
		alpha: request.alpha,
		beta: request.beta,
		fouling: request.fouling,
		theta: request.theta,
		depthCorrection: request.depthCorrection,
		extraPressureKPa: request.extraPressureKPa,
		wireToAirPercent: request.wireToAirPercent,
		demand: request.demand
	};
}
