import { isothermalAirWatts } from './air-pump';
import type { Warning } from './airlift';
import { STANDARD_GRAVITY_M_PER_S2 as G } from './units';
import {
	fieldToStandardRatio,
	OXYGEN_G_PER_M3_STANDARD_AIR,
	oxygenDemandGramsPerHour,
	type FieldConditions,
	type OxygenDemand
} from './oxygen-transfer';
import { barometricPressureAtm, STANDARD_ATMOSPHERE_PA, waterDensityKgPerM3 } from './water';

export interface AerationInput extends FieldConditions {
	transferPercentPerM: number;
	/** Diffuser and line losses on top of the water column, kPa. */
	extraPressureKPa: number;
	wireToAirPercent: number;
	demand: OxygenDemand;
}

export interface AerationResult {
	doSaturationMgL: number;
	fieldToStandardRatio: number;
	oxygenDemandGramsPerHour: number;
	standardTransferGramsPerHour: number;
	/** Free air at the site's pressure. */
	airFlowLpm: number;
	/** Gauge: the water column over the diffuser plus the losses. */
	pressureKPa: number;
	isothermalAirWatts: number;
	inputWatts: number;
	transferPercent: number;
	/** Standard aeration efficiency: standard oxygen transfer per kWh drawn. */
	kgO2PerKwh: number;
	warnings: Warning[];
}

/**
 * Diffused aeration for a demand: the standard transfer needed to hold the target in the tank
 * (demand ÷ AOTR/SOTR), the air that carries it through diffusers of a transfer efficiency per metre
 * of depth, the pressure, the isothermal air power and the input watts at a wire-to-air efficiency.
 */
export function aeration(input: AerationInput): AerationResult {
	const pressureAtm = barometricPressureAtm(input.altitudeM);
	const { ratio, saturationMgL } = fieldToStandardRatio(input);
	const demandGramsPerHour = oxygenDemandGramsPerHour(input.demand);
	const reachable = ratio > 0;
	const standardTransferGramsPerHour = reachable ? demandGramsPerHour / ratio : 0;
	const transferPercent = Math.min(input.transferPercentPerM * input.diffuserDepthM, 100);
	const standardAirM3PerH =
		transferPercent > 0
			? standardTransferGramsPerHour / (OXYGEN_G_PER_M3_STANDARD_AIR * (transferPercent / 100))
			: 0;
	const airFlowLpm = (standardAirM3PerH * 1000) / 60 / pressureAtm;
	const density = waterDensityKgPerM3(input.temperatureC, input.salinityGPerKg);
	const pressureKPa = (density * G * input.diffuserDepthM) / 1000 + input.extraPressureKPa;
	const airWatts = isothermalAirWatts(airFlowLpm, pressureKPa, (pressureAtm * STANDARD_ATMOSPHERE_PA) / 1000);
	const inputWatts = airWatts / (input.wireToAirPercent / 100);
	const warnings: Warning[] = [];
	if (!reachable)
		warnings.push({
			code: 'target-above-saturation',
			message: `Water at this temperature, salt and altitude holds at most about ${saturationMgL.toFixed(1)} mg/L at the diffusers (after the β and depth corrections); a target of ${input.targetDoMgL} mg/L cannot be reached with air. Lower the target.`
		});
	if (demandGramsPerHour === 0)
		warnings.push({
			code: 'no-demand',
			message: 'No oxygen demand: give the daily feed and its protein, or a demand in g O₂ per hour.'
		});
	return {
		doSaturationMgL: saturationMgL,
		fieldToStandardRatio: ratio,
		oxygenDemandGramsPerHour: demandGramsPerHour,
		standardTransferGramsPerHour,
		airFlowLpm,
		pressureKPa,
		isothermalAirWatts: airWatts,
		inputWatts,
		transferPercent,
		kgO2PerKwh: inputWatts > 0 ? standardTransferGramsPerHour / inputWatts : 0,
		warnings
	};
}
