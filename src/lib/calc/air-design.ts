import { aeration, type AerationResult } from './aeration';
import type { AirDesign, AerationDesign } from './air-design.schema';
import { choosePumps, type PumpSelection } from './air-pump';
import { airlift, type AirliftResult, type Warning } from './airlift';
import type { DesignConditions } from './design-conditions';
import { DEFAULT_TARGET_DO_MG_L } from './design-conditions';
import { DIFFUSER_TRANSFER_PERCENT_PER_M, fieldToStandardRatio, oxygenFromAir } from './oxygen-transfer';
import { flowToCubicMetersPerSecond, lengthToMeters, STANDARD_GRAVITY_M_PER_S2 as G } from './units';
import { barometricPressureAtm } from './water';

export type DesignedAirlift = AirliftResult & {
	name: string;
	count: number;
	totalWaterLpm: number;
	totalAirLpm: number;
};

export interface AirDesignResult {
	airlifts: DesignedAirlift[];
	aeration: AerationResult | null;
	totalAirLpm: number;
	waterLpm: number;
	/** Gauge: the deepest outlet's water column plus the line and diffuser loss. */
	pressureKPa: number;
	pump: PumpSelection | null;
	/** Oxygen the design's air puts into the water at the target, g/h (diffusers and air-lifts). */
	oxygenSuppliedGramsPerHour: number;
	targetDoMgL: number;
	warnings: Warning[];
}

const fieldFactors = (aerationDesign: AerationDesign | null) =>
	aerationDesign ?? {
		alpha: 0.9,
		beta: 0.98,
		fouling: 0.9,
		theta: 1.024,
		depthCorrection: 0.4,
		targetDoMgL: DEFAULT_TARGET_DO_MG_L
	};

/**
 * The designer's whole calculation: each air-lift's air (Nicklin) and limit (Stenning & Martin), the
 * aeration's air for the stock's demand (Metcalf & Eddy), their air added, the pressure of the deepest
 * outlet plus losses, how many of the chosen pump deliver it and their watts, and the oxygen the air
 * supplies — air-lifts transfer oxygen too, counted as coarse bubbles at their injection depth (Hearn,
 * Pfeiffer & Malone 2007 measured it; the coarse-bubble figure is this program's assumption).
 */
export function designAir(design: AirDesign, conditions: DesignConditions): AirDesignResult {
	const water = {
		temperatureC: conditions.temperatureC,
		salinityGPerKg: conditions.salinityGPerKg,
		altitudeM: conditions.altitudeM
	};
	const airlifts = design.airlifts.map((a): DesignedAirlift => {
		const result = airlift({
			...water,
			riserInnerDiameterM: lengthToMeters(a.riserInnerDiameter, a.riserInnerDiameterUnit),
			submergenceM: lengthToMeters(a.submergence, a.submergenceUnit),
			liftM: lengthToMeters(a.lift, a.liftUnit),
			efficiencyPercent: a.efficiencyPercent,
			waterFlowLpm: flowToCubicMetersPerSecond(a.waterFlow, a.waterFlowUnit) * 60_000
		});
		return {
			...result,
			name: a.name,
			count: a.count,
			totalWaterLpm: result.waterFlowLpm * a.count,
			totalAirLpm: result.airFlowLpm * a.count
		};
	});
	const factors = fieldFactors(design.aeration);
	const aerationResult = design.aeration
		? aeration({
				...water,
				...factors,
				diffuserDepthM: lengthToMeters(design.aeration.diffuserDepth, design.aeration.diffuserDepthUnit),
				transferPercentPerM:
					design.aeration.transferPercentPerM ?? DIFFUSER_TRANSFER_PERCENT_PER_M[design.aeration.diffuser],
				extraPressureKPa: design.lineLossKPa,
				wireToAirPercent: design.pump.wireToAirPercent,
				demand: { oxygenGramsPerHour: conditions.oxygenDemandGramsPerHour ?? 0 }
			})
		: null;
	const totalAirLpm = airlifts.reduce((sum, a) => sum + a.totalAirLpm, 0) + (aerationResult?.airFlowLpm ?? 0);
	const pressureKPa = Math.max(
		...airlifts.map((a) => a.injectionPressureKPa + design.lineLossKPa),
		aerationResult?.pressureKPa ?? 0
	);
	const pump = totalAirLpm > 0 ? choosePumps(design.pump, totalAirLpm, pressureKPa) : null;
	const pressureAtm = barometricPressureAtm(conditions.altitudeM);
	const airliftOxygen = airlifts.reduce((sum, a) => {
		const depthM = (a.injectionPressureKPa * 1000) / (a.densityKgPerM3 * G);
		const { ratio } = fieldToStandardRatio({ ...water, ...factors, diffuserDepthM: depthM });
		return (
			sum +
			oxygenFromAir(a.totalAirLpm, depthM, DIFFUSER_TRANSFER_PERCENT_PER_M.coarse, ratio, pressureAtm)
				.fieldGramsPerHour
		);
	}, 0);
	const aerationOxygen = aerationResult
		? aerationResult.standardTransferGramsPerHour * Math.max(aerationResult.fieldToStandardRatio, 0)
		: 0;
	const warnings = [
		...airlifts.flatMap((a) => a.warnings.map((w) => ({ ...w, message: `${a.name}: ${w.message}` }))),
		...(aerationResult?.warnings ?? [])
	];
	if (totalAirLpm > 0 && !pump)
		warnings.push({
			code: 'pump-cannot-reach',
			message: `${design.pump.name} cannot push air against ${pressureKPa.toFixed(1)} kPa: choose a stronger pump or shallower outlets.`
		});
	return {
		airlifts,
		aeration: aerationResult,
		totalAirLpm,
		waterLpm: airlifts.reduce((sum, a) => sum + a.totalWaterLpm, 0),
		pressureKPa,
		pump,
		oxygenSuppliedGramsPerHour: airliftOxygen + aerationOxygen,
		targetDoMgL: factors.targetDoMgL,
		warnings
	};
}
