/**
 * Physical constants and unit conversions. Exact definitions come from NIST SP 811 (2008 edition,
 * Appendix B) and the CGPM's standard acceleration of gravity (3rd CGPM, 1901); everything else here is
 * derived from them so that the factors agree with each other to the last digit.
 */

/** Standard acceleration of gravity, m/s² (CGPM 1901, exact). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/** International foot and inch (exact). */
export const METERS_PER_FOOT = 0.3048;
export const METERS_PER_INCH = 0.0254;

/** US liquid gallon, 231 cubic inches (exact). */
export const LITERS_PER_US_GALLON = 3.785411784;

/** Avoirdupois pound (exact) and the pound-force derived from it with standard gravity. */
export const KILOGRAMS_PER_POUND = 0.45359237;
export const NEWTONS_PER_POUND_FORCE = KILOGRAMS_PER_POUND * STANDARD_GRAVITY_M_PER_S2;

/** Pound-force per square inch: 6 894.757… Pa. */
export const PASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / METERS_PER_INCH ** 2;

/** Mechanical horsepower, 550 ft·lbf/s: 745.699 87… W. */
export const WATTS_PER_HORSEPOWER = 550 * METERS_PER_FOOT * NEWTONS_PER_POUND_FORCE;

/**
 * Water densities, kg/m³. Fresh water uses the conventional 1000 kg/m³ that also defines the
 * "conventional inch of water" below; sea water uses a typical 1025 kg/m³ (from memory).
 */
export const DENSITY_KG_PER_M3 = { fresh: 1000, sea: 1025 } as const;
export type Fluid = keyof typeof DENSITY_KG_PER_M3;

/** Conventional inch of water: the pressure of 25.4 mm of 1000 kg/m³ water under standard gravity. */
export const PASCALS_PER_INCH_OF_WATER =
	DENSITY_KG_PER_M3.fresh * STANDARD_GRAVITY_M_PER_S2 * METERS_PER_INCH;

export const FLOW_UNITS = ['gpm', 'gph', 'lpm', 'm3h'] as const;
export type FlowUnit = (typeof FLOW_UNITS)[number];

const CUBIC_METERS_PER_SECOND: Record<FlowUnit, number> = {
	gpm: LITERS_PER_US_GALLON / 1000 / 60,
	gph: LITERS_PER_US_GALLON / 1000 / 3600,
	lpm: 1 / 1000 / 60,
	m3h: 1 / 3600
};

/** A flow in US gallons per minute or hour, litres per minute or cubic metres per hour, as m³/s. */
export function flowToCubicMetersPerSecond(flow: number, unit: FlowUnit): number {
	return flow * CUBIC_METERS_PER_SECOND[unit];
}

export const LENGTH_UNITS = ['ft', 'm', 'in', 'mm', 'cm'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

const METERS: Record<LengthUnit, number> = {
	ft: METERS_PER_FOOT,
	m: 1,
	in: METERS_PER_INCH,
	mm: 0.001,
	cm: 0.01
};

/** A length in feet, metres, inches, millimetres or centimetres, as metres. */
export function lengthToMeters(length: number, unit: LengthUnit): number {
	return length * METERS[unit];
}
