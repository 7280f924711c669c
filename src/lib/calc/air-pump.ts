import type { AirPump } from './air-design.schema';
import { STANDARD_ATMOSPHERE_PA } from './water';

const AMBIENT_KPA = STANDARD_ATMOSPHERE_PA / 1000;
const M3_PER_S_PER_LPM = 1 / 60_000;

/**
 * The isothermal work rate of compressing air, watts: p₁·Q₁·ln(p₂/p₁), with Q₁ the free-air flow at the
 * intake pressure p₁ and p₂ = p₁ + gauge (Couper, Penney & Fair, Chemical Process Equipment; the
 * denominator of Nicklin's air-lift efficiency). Example: 60 L/min at 10 kPa gauge ≈ 9.54 W.
 */
export function isothermalAirWatts(freeAirLpm: number, gaugeKPa: number, ambientKPa = AMBIENT_KPA): number {
	const ambientPa = ambientKPa * 1000;
	return ambientPa * freeAirLpm * M3_PER_S_PER_LPM * Math.log((ambientKPa + gaugeKPa) / ambientKPa);
}

/**
 * The adiabatic (isentropic) work rate, watts: k/(k−1)·p₁·Q₁·[(p₂/p₁)^((k−1)/k) − 1], k = 1.4 for air
 * (Couper, Penney & Fair). Below about 30 kPa gauge it lies within 3 % above the isothermal figure.
 */
export function adiabaticAirWatts(
	freeAirLpm: number,
	gaugeKPa: number,
	ambientKPa = AMBIENT_KPA,
	k = 1.4
): number {
	const ratio = (ambientKPa + gaugeKPa) / ambientKPa;
	return (k / (k - 1)) * ambientKPa * 1000 * freeAirLpm * M3_PER_S_PER_LPM * (ratio ** ((k - 1) / k) - 1);
}

/**
 * The free air a pump delivers against a gauge pressure, L/min: linear between the points of its
 * curve (curves of small pumps are not straight lines through zero); the first point's flow below its
 * pressure; null past the last point, as a curve must not be extrapolated.
 */
export function pumpFlowLpm(pump: AirPump, gaugeKPa: number): number | null {
	const points = pump.points;
	const first = points[0];
	if (!first || gaugeKPa <= first.pressureKPa) return first ? first.airLpm : null;
	for (let i = 1; i < points.length; i++) {
		const low = points[i - 1]!;
		const high = points[i]!;
		if (gaugeKPa <= high.pressureKPa) {
			const share = (gaugeKPa - low.pressureKPa) / (high.pressureKPa - low.pressureKPa);
			return low.airLpm + share * (high.airLpm - low.airLpm);
		}
	}
	return null;
}

export interface PumpSelection {
	pumpName: string;
	count: number;
	flowEachLpm: number;
	totalFlowLpm: number;
	wattsEach: number;
	wattsTotal: number;
	gaugeKPa: number;
	/** The data sheet's input watts, or the isothermal power over the wire-to-air efficiency. */
	wattsFrom: 'data-sheet' | 'efficiency';
}

/**
 * How many of one pump deliver `airLpm` of free air against `gaugeKPa`, and what they draw: each unit
 * gives its curve's flow at that pressure; its watts are the data sheet's input watts at rated pressure
 * (small diaphragm pumps draw about the same across their range, common practice) or, without them, the
 * isothermal air power ÷ the wire-to-air efficiency. Null when the pump cannot reach the pressure.
 * Example: 120 L/min at 12 kPa from the 60 L/min class (64.5 L/min each there) → 2 pumps.
 */
export function choosePumps(pump: AirPump, airLpm: number, gaugeKPa: number): PumpSelection | null {
	const flowEachLpm = pumpFlowLpm(pump, gaugeKPa);
	if (flowEachLpm === null || flowEachLpm <= 0) return null;
	const count = Math.max(1, Math.ceil(airLpm / flowEachLpm - 1e-9));
	const wattsEach =
		pump.inputWatts ?? isothermalAirWatts(flowEachLpm, gaugeKPa) / (pump.wireToAirPercent / 100);
	return {
		pumpName: pump.name,
		count,
		flowEachLpm,
		totalFlowLpm: flowEachLpm * count,
		wattsEach,
		wattsTotal: wattsEach * count,
		gaugeKPa,
		wattsFrom: pump.inputWatts === null ? 'efficiency' : 'data-sheet'
	};
}
