/**
 * The closed-form rules of the "Water and air" sheet as spreadsheet formulas, each from the same
 * equation as the core (`$lib/calc` water.ts, airlift.ts, air-pump.ts) with its source. Arguments are
 * A1 references (or numbers); every formula is plain arithmetic, LN and EXP, which Excel and
 * LibreOffice Calc both know.
 */

/** Standard gravity, m/s² (exact by definition; CGPM 1901). */
const G = '9.80665';

/** Barometric pressure, atm, at an altitude in metres: US Standard Atmosphere (1976) troposphere. */
export const barometricAtm = (altitudeM: string) => `(1-2.25577E-5*${altitudeM})^5.25588`;

/**
 * Water density, kg/m³, by Millero & Poisson (1981) (UNESCO EOS-80 at one atmosphere), from the
 * temperature (°C) and salinity (g/kg) cells.
 */
export function densityKgPerM3(t: string, s: string): string {
	const pure = `999.842594+6.793952E-2*${t}-9.09529E-3*${t}^2+1.001685E-4*${t}^3-1.120083E-6*${t}^4+6.536332E-9*${t}^5`;
	const a = `(8.24493E-1-4.0899E-3*${t}+7.6438E-5*${t}^2-8.2467E-7*${t}^3+5.3875E-9*${t}^4)`;
	const b = `(-5.72466E-3+1.0227E-4*${t}-1.6546E-6*${t}^2)`;
	return `${pure}+${a}*${s}+${b}*${s}^1.5+4.8314E-4*${s}^2`;
}

/** Water vapour pressure, atm, by Benson & Krause (1984): ln P = 11.8571 − 3840.70/T − 216961/T². */
export const vapourAtm = (t: string) => `EXP(11.8571-3840.7/(${t}+273.15)-216961/(${t}+273.15)^2)`;

/**
 * Dissolved-oxygen saturation, mg/L: Benson & Krause (1984), the equation of APHA Standard Methods
 * 4500-O, with the salinity term and the Green & Carritt pressure correction, from the temperature
 * (°C), salinity (g/kg), pressure (atm) and vapour pressure (atm) cells.
 */
export function saturationMgL(t: string, s: string, p: string, vapour: string): string {
	const k = `(${t}+273.15)`;
	const atOneAtm = `EXP(-139.34411+1.575701E5/${k}-6.642308E7/${k}^2+1.2438E10/${k}^3-8.621949E11/${k}^4-${s}*(0.017674-10.754/${k}+2140.7/${k}^2))`;
	const theta = `(0.000975-1.426E-5*${t}+6.436E-8*${t}^2)`;
	return `${atOneAtm}*${p}*(1-${vapour}/${p})*(1-${theta}*${p})/((1-${vapour})*(1-${theta}))`;
}

/** Gauge pressure at the foot of a column of water, kPa: ρ·g·H. */
export const columnKPa = (density: string, depthM: string) => `${density}*${G}*${depthM}/1000`;

/**
 * Free air an air-lift needs, L/min, by Nicklin's (1963) efficiency η = ρ·g·Q_w·h / (p_a·Q_a·ln(p_in/p_a)),
 * solved for Q_a, with p_in = p_a + ρ·g·H_s; water flow in L/min, lift and submergence in m,
 * efficiency in %, ambient pressure in Pa.
 */
export function nicklinAirLpm(
	density: string,
	waterLpm: string,
	liftM: string,
	submergenceM: string,
	efficiencyPercent: string,
	ambientPa: string
): string {
	return `${density}*${G}*${waterLpm}*${liftM}/((${efficiencyPercent}/100)*${ambientPa}*LN((${ambientPa}+${density}*${G}*${submergenceM})/${ambientPa}))`;
}

/** Isothermal air power, W: p₁·Q₁·ln(p₂/p₁), Q₁ free air in L/min (÷ 60,000 to m³/s), p₁ in Pa, gauge in kPa. */
export const isothermalWatts = (ambientPa: string, freeAirLpm: string, gaugeKPa: string) =>
	`${ambientPa}*(${freeAirLpm}/60000)*LN((${ambientPa}+${gaugeKPa}*1000)/${ambientPa})`;
