// The core's design calculation as the designer runs it on every change: a result, or a sentence
// when the figures cannot be worked out, so a page never shows NaN or stops on an exception.
import {
	type AirDesign,
	type AirDesignResult,
	type AirPump,
	choosePumps,
	type DesignConditions,
	designAir,
	designConditions,
	EMPTY_SITE_WATER,
	type SiteWater
} from '$lib/calc';
import { blankAirlift } from './design-draft';

export type DesignOutcome = { result: AirDesignResult; problem: null } | { result: null; problem: string };

const CANNOT = 'These figures cannot be worked out for this design. Check the depths, flows and the pump.';

/** Whether every figure the page shows is a finite number (the core promises it; the page checks). */
function finite(result: AirDesignResult): boolean {
	const figures = [
		result.totalAirLpm,
		result.pressureKPa,
		result.waterLpm,
		result.oxygenSuppliedGramsPerHour,
		...result.airlifts.flatMap((a) => [a.waterFlowLpm, a.airFlowLpm, a.submergenceRatio, a.airToWaterRatio])
	];
	return figures.every(Number.isFinite);
}

/** Runs `designAir`; a throw or a figure that is not finite becomes the sentence above. */
export function runDesign(design: AirDesign, conditions: DesignConditions): DesignOutcome {
	try {
		const result = designAir(design, conditions);
		return finite(result) ? { result, problem: null } : { result: null, problem: CANNOT };
	} catch {
		return { result: null, problem: CANNOT };
	}
}

/**
 * How a blank designer scores each pump: the watts that many of it draw for the first air-lift it shows
 * (in the site's water, or fresh water at 20 °C), null when it cannot deliver. The designer opens on the
 * pump that runs that design on the fewest watts, never on one that cannot run it at all.
 */
export function fewestWatts(water: SiteWater | undefined): (pump: AirPump) => number | null {
	const { key: _key, ...first } = blankAirlift();
	const design = { airlifts: [first], aeration: null, lineLossKPa: 2 } as Omit<AirDesign, 'pump'>;
	const conditions = designConditions(water ?? EMPTY_SITE_WATER, null);
	return (pump) => {
		const outcome = runDesign({ ...design, pump } as AirDesign, conditions);
		if (!outcome.result) return null;
		return choosePumps(pump, outcome.result.totalAirLpm, outcome.result.pressureKPa)?.wattsTotal ?? null;
	};
}
