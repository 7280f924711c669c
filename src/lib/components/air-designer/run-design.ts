// The core's design calculation as the designer runs it on every change: a result, or a sentence
// when the figures cannot be worked out, so a page never shows NaN or stops on an exception.
import { type AirDesign, type AirDesignResult, type DesignConditions, designAir } from '$lib/calc';

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
