// The designer's figures in the units growers read off their pumps and gauges: free air in L/min and
// cubic feet a minute, pressure in kPa, psi and inches of water. Every factor is derived from the exact
// definitions of NIST SP 811 (2008, Appendix B) that the core holds.
import { METERS_PER_FOOT, STANDARD_GRAVITY_M_PER_S2 } from '$lib/calc';
import { figure } from '$lib/text/numbers';

const METERS_PER_INCH = METERS_PER_FOOT / 12;
/** One cubic foot, 28.316 846 592 L (exact from the international foot). */
export const LITERS_PER_CUBIC_FOOT = METERS_PER_FOOT ** 3 * 1000;
/** Pound-force per square inch, 6.894 757… kPa (avoirdupois pound × standard gravity ÷ inch²). */
export const KPA_PER_PSI = (0.45359237 * STANDARD_GRAVITY_M_PER_S2) / METERS_PER_INCH ** 2 / 1000;
/** Conventional inch of water (1000 kg/m³, standard gravity), 0.249 089 kPa, as the pumping helper uses. */
export const KPA_PER_INCH_OF_WATER = (1000 * STANDARD_GRAVITY_M_PER_S2 * METERS_PER_INCH) / 1000;

/** Litres a minute as cubic feet a minute. */
export const cfmOf = (litersPerMinute: number) => litersPerMinute / LITERS_PER_CUBIC_FOOT;

/** Free air in both units: "29.5 L/min (1.04 cfm)". */
export function airText(litersPerMinute: number): string {
	return `${figure(litersPerMinute, 1)} L/min (${figure(cfmOf(litersPerMinute), 2)} cfm)`;
}

/** A gauge pressure in the three units gauges are marked in: "6.9 kPa · 1 psi · 27.7 inches of water". */
export function pressureParts(kPa: number): { kPa: string; psi: string; inchesOfWater: string } {
	return {
		kPa: `${figure(kPa, 1)} kPa`,
		psi: `${figure(kPa / KPA_PER_PSI, 2)} psi`,
		inchesOfWater: `${figure(kPa / KPA_PER_INCH_OF_WATER, 1)} inches of water`
	};
}

/** Water flow in litres a minute: "20 L/min". */
export const waterText = (litersPerMinute: number) => `${figure(litersPerMinute, 1)} L/min`;

/** Watts: "45 W" (whole watts from 100 up, one decimal below). */
export const wattsText = (watts: number) => `${figure(watts, watts >= 100 ? 0 : 1)} W`;

/** Oxygen in grams an hour: "12.3 g O₂/h". */
export const oxygenText = (gramsPerHour: number) => `${figure(gramsPerHour, 1)} g O₂/h`;

/** A ratio as plain figure: 0.7 → "0.7". */
export const ratioText = (ratio: number, digits = 2) => figure(ratio, digits);
