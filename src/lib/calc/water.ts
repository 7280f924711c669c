/**
 * Properties of the water and of the air above it: density, viscosity, dissolved-oxygen saturation and
 * the barometric pressure at a site's altitude. Temperatures in °C, salinity in g/kg (fresh water 0,
 * typical sea water 35).
 */

/** Typical salinity of each kind of water the forms offer, g/kg (sea water: the reference 35, common practice). */
export const SALINITY_G_PER_KG = { fresh: 0, sea: 35 } as const;

/** Standard atmosphere, Pa (exact by definition). */
export const STANDARD_ATMOSPHERE_PA = 101_325;

/**
 * Density at one atmosphere, kg/m³, by the one-atmosphere equation of state of sea water of Millero &
 * Poisson (1981, Deep-Sea Research 28A:625), adopted by UNESCO as EOS-80; at S = 0 it is Bigg's (1967)
 * standard mean ocean water polynomial. ρ = ρ_w + A·S + B·S^1.5 + C·S². Valid 0–40 °C, 0.5–43 g/kg.
 * Example: 20 °C fresh water 998.206 kg/m³; 25 °C at 35 g/kg 1023.343 kg/m³.
 */
export function waterDensityKgPerM3(temperatureC: number, salinityGPerKg = 0): number {
	const t = temperatureC;
	const s = salinityGPerKg;
	const pure =
		999.842594 +
		6.793952e-2 * t -
		9.09529e-3 * t ** 2 +
		1.001685e-4 * t ** 3 -
		1.120083e-6 * t ** 4 +
		6.536332e-9 * t ** 5;
	const a = 8.24493e-1 - 4.0899e-3 * t + 7.6438e-5 * t ** 2 - 8.2467e-7 * t ** 3 + 5.3875e-9 * t ** 4;
	const b = -5.72466e-3 + 1.0227e-4 * t - 1.6546e-6 * t ** 2;
	const c = 4.8314e-4;
	return pure + a * s + b * s ** 1.5 + c * s ** 2;
}

/**
 * Dynamic viscosity, Pa·s. Fresh water by Vogel's equation μ = 2.414e-5 · 10^(247.8 / (T − 140)), T in
 * kelvin (1.0016 mPa·s at 20 °C); salt raises it by the factor 1 + A·S + B·S² of Sharqawy, Lienhard &
 * Zubair (2010, Desalination and Water Treatment 16:354, Eq. 22, S in kg/kg).
 * Example: 20 °C at 35 g/kg about 1.077 mPa·s.
 */
export function waterViscosityPaS(temperatureC: number, salinityGPerKg = 0): number {
	const t = temperatureC;
	const pure = 2.414e-5 * 10 ** (247.8 / (t + 273.15 - 140));
	const s = salinityGPerKg / 1000;
	const a = 1.541 + 1.998e-2 * t - 9.52e-5 * t ** 2;
	const b = 7.974 - 7.561e-2 * t + 4.724e-4 * t ** 2;
	return pure * (1 + a * s + b * s ** 2);
}

/**
 * Barometric pressure at an altitude, atm, by the US Standard Atmosphere (1976) troposphere:
 * P = (1 − 2.25577e-5 · z)^5.25588, z in metres above sea level. Example: 1,000 m → 0.8870 atm.
 */
export function barometricPressureAtm(altitudeM: number): number {
	return (1 - 2.25577e-5 * altitudeM) ** 5.25588;
}

/**
 * Water vapour pressure over water, atm, by Benson & Krause (1984, Limnol. Oceanogr. 29:620):
 * ln P_wv = 11.8571 − 3840.70/T − 216961/T², T in kelvin. Example: 20 °C → 0.0231 atm.
 */
export function waterVapourPressureAtm(temperatureC: number): number {
	const kelvin = temperatureC + 273.15;
	return Math.exp(11.8571 - 3840.7 / kelvin - 216_961 / kelvin ** 2);
}

/**
 * Dissolved-oxygen saturation, mg/L, of water in contact with moist air, by Benson & Krause (1984), the
 * equation of APHA Standard Methods 4500-O:
 * ln C* = −139.34411 + 1.575701e5/T − 6.642308e7/T² + 1.243800e10/T³ − 8.621949e11/T⁴
 *         − S·(0.017674 − 10.754/T + 2140.7/T²),
 * corrected to a barometric pressure P (atm) by the Green & Carritt form of the same method:
 * C_p = C*·P·(1 − P_wv/P)·(1 − θ₀·P) / ((1 − P_wv)·(1 − θ₀)), θ₀ = 0.000975 − 1.426e-5·t + 6.436e-8·t².
 * Example: fresh water at 20 °C and 1 atm holds 9.092 mg/L.
 */
export function oxygenSaturationMgL(temperatureC: number, salinityGPerKg = 0, pressureAtm = 1): number {
	const kelvin = temperatureC + 273.15;
	const lnC =
		-139.34411 +
		1.575701e5 / kelvin -
		6.642308e7 / kelvin ** 2 +
		1.2438e10 / kelvin ** 3 -
		8.621949e11 / kelvin ** 4 -
		salinityGPerKg * (0.017674 - 10.754 / kelvin + 2140.7 / kelvin ** 2);
	const atOneAtm = Math.exp(lnC);
	if (pressureAtm === 1) return atOneAtm;
	const vapour = waterVapourPressureAtm(temperatureC);
	const t = temperatureC;
	const theta = 0.000975 - 1.426e-5 * t + 6.436e-8 * t ** 2;
	return (
		(atOneAtm * pressureAtm * (1 - vapour / pressureAtm) * (1 - theta * pressureAtm)) /
		((1 - vapour) * (1 - theta))
	);
}
