import { barometricPressureAtm, oxygenSaturationMgL } from './water';

/**
 * Standard oxygen transfer efficiency per metre of diffuser depth, %: fine bubble about 5–8 %/m,
 * coarse about 2–3 %/m (typical ranges for diffused aeration, Metcalf & Eddy, Wastewater Engineering,
 * 5th ed.; the middle of each range is used).
 */
export const DIFFUSER_TRANSFER_PERCENT_PER_M = { fine: 6, coarse: 2.5 } as const;

/** Oxygen in standard air (20.95 % by volume, 20 °C, 1 atm), g/m³. */
export const OXYGEN_G_PER_M3_STANDARD_AIR = 277.6;

/** Fish respiration per kilogram of feed (Timmons & Ebeling, Recirculating Aquaculture). */
export const FISH_KG_O2_PER_KG_FEED = 0.25;

/** Ammonia-nitrogen per kg of feed protein, and the oxygen nitrifiers use per g of it (Timmons & Ebeling). */
const AMMONIA_N_PER_KG_PROTEIN = 0.092;
const NITRIFICATION_G_O2_PER_G_N = 4.57;

/** Standard conditions of oxygen transfer: clean water at 20 °C and 1 atm (ASCE/EWRI 2-06). */
const STANDARD_SATURATION_MG_L = oxygenSaturationMgL(20);
/** Metres of water in one atmosphere, the mid-depth correction's reference (Metcalf & Eddy). */
const WATER_METRES_PER_ATM = 10.33;

export type OxygenDemand =
	{ feedKgPerDay: number; proteinPercent: number; kgO2PerKgFeed?: number } | { oxygenGramsPerHour: number };

/**
 * Oxygen the stock uses, g O₂/h: fish respiration (kg O₂ per kg feed, default 0.25) plus nitrification
 * of the ammonia the feed makes — ammonia-N = feed × protein fraction × 0.092, 4.57 g O₂ per g of it
 * (Timmons & Ebeling, Recirculating Aquaculture, 2nd ed.) — or a demand given directly.
 * Example: 10 kg feed a day at 35 % protein → 2.5 + 1.47 kg/day = 165.5 g/h.
 */
export function oxygenDemandGramsPerHour(demand: OxygenDemand): number {
	if ('oxygenGramsPerHour' in demand) return demand.oxygenGramsPerHour;
	const fishKg = demand.feedKgPerDay * (demand.kgO2PerKgFeed ?? FISH_KG_O2_PER_KG_FEED);
	const ammoniaKg = demand.feedKgPerDay * (demand.proteinPercent / 100) * AMMONIA_N_PER_KG_PROTEIN;
	return ((fishKg + ammoniaKg * NITRIFICATION_G_O2_PER_G_N) * 1000) / 24;
}

export interface FieldConditions {
	temperatureC: number;
	salinityGPerKg: number;
	altitudeM: number;
	targetDoMgL: number;
	diffuserDepthM: number;
	alpha: number;
	beta: number;
	fouling: number;
	theta: number;
	depthCorrection: number;
}

/**
 * The field-to-standard transfer ratio AOTR/SOTR of Metcalf & Eddy (Wastewater Engineering, 5th ed.):
 * AOTR/SOTR = α·F·(β·C̄_s,T,H − C_L)/C̄_∞,20 · θ^(T−20), where C̄ = C_s·(1 + d_e·D_f/P) is the
 * saturation at mid-depth (D_f the diffuser depth, P the surface pressure in metres of water, d_e the
 * mid-depth factor) and C_s,T,H the saturation at the water's temperature, salt and altitude (Benson &
 * Krause with the Green & Carritt pressure form). Check: clean water, 20 °C, sea level, α = β = F = 1,
 * no depth correction, 2 mg/L → 0.780.
 */
export function fieldToStandardRatio(c: FieldConditions): { ratio: number; saturationMgL: number } {
	const pressureAtm = barometricPressureAtm(c.altitudeM);
	const saturationMgL = oxygenSaturationMgL(c.temperatureC, c.salinityGPerKg, pressureAtm);
	const fieldDepth = 1 + (c.depthCorrection * c.diffuserDepthM) / (WATER_METRES_PER_ATM * pressureAtm);
	const standardDepth = 1 + (c.depthCorrection * c.diffuserDepthM) / WATER_METRES_PER_ATM;
	const driving = c.beta * saturationMgL * fieldDepth - c.targetDoMgL;
	const ratio =
		((c.alpha * c.fouling * driving) / (STANDARD_SATURATION_MG_L * standardDepth)) *
		c.theta ** (c.temperatureC - 20);
	return { ratio, saturationMgL };
}

/**
 * Oxygen an air flow transfers from diffusers at a depth: standard transfer = air (as standard air) ×
 * 277.6 g/m³ × SOTE, SOTE = %/m × depth (at most 100 %); field transfer = standard × AOTR/SOTR.
 * Example: 100 L/min (6 m³/h) through fine diffusers (6 %/m) 1 m deep at sea level → 99.9 g O₂/h standard.
 */
export function oxygenFromAir(
	freeAirLpm: number,
	depthM: number,
	transferPercentPerM: number,
	fieldRatio: number,
	pressureAtm: number
) {
	const standardAirM3PerH = (freeAirLpm * 60 * pressureAtm) / 1000;
	const transfer = Math.min(transferPercentPerM * depthM, 100) / 100;
	const standardGramsPerHour = standardAirM3PerH * OXYGEN_G_PER_M3_STANDARD_AIR * transfer;
	return { standardGramsPerHour, fieldGramsPerHour: standardGramsPerHour * Math.max(fieldRatio, 0) };
}
