import { METERS_PER_FOOT, type PumpingResponse, type RequestIssue } from '$lib/calc';
import { figure } from '$lib/text/numbers';
import type { LiftUnit, PumpingDraft } from './pumping-panel';

/**
 * The pumping helper's answer: what the endpoint said, and the words and figures the result shows
 * (lengths in the person's unit, the water speed, the watts offered to a device and the note when they
 * look wrong).
 */

export type PumpingAnswer =
	| { kind: 'result'; result: PumpingResponse }
	| { kind: 'issues'; issues: RequestIssue[] }
	| { kind: 'failure'; message: string };

/** What the endpoint answered: the result, the fields to fix (400), or a sentence to show. */
export async function readAnswer(response: Response): Promise<PumpingAnswer> {
	const body: unknown = await response.json().catch(() => null);
	const record = body && typeof body === 'object' ? (body as Record<string, unknown>) : {};
	if (response.ok && body) return { kind: 'result', result: body as PumpingResponse };
	if (response.status === 400 && Array.isArray(record.issues) && record.issues.length > 0)
		return { kind: 'issues', issues: record.issues as RequestIssue[] };
	const message = typeof record.message === 'string' ? record.message : null;
	return { kind: 'failure', message: message ?? `The helper could not answer (status ${response.status}).` };
}

/** The watts the button offers and hands over: whole watts, or tenths below 10 W. */
export function usableWatts(inputWatts: number): number {
	const step = Math.abs(inputWatts) < 10 ? 10 : 1;
	return Math.round(inputWatts * step) / step;
}

/** A head or depth in metres, in the unit the person chose for the lift. */
export function metersIn(meters: number, unit: LiftUnit): number {
	return unit === 'ft' ? meters / METERS_PER_FOOT : meters;
}

/** A water speed in the unit system of the inputs: ft/s after US units only, m/s after metric only, both when mixed. */
export function speedText(velocityMPerS: number, draft: PumpingDraft): string {
	const units = [draft.flowUnit, draft.staticLiftUnit, draft.pipeLengthUnit, draft.innerDiameterUnit];
	const us = units.filter((unit) => ['gpm', 'gph', 'ft', 'in'].includes(unit)).length;
	const feet = `${figure(velocityMPerS / METERS_PER_FOOT, 2)} ft/s`;
	const meters = `${figure(velocityMPerS, 2)} m/s`;
	if (us === units.length) return feet;
	if (us === 0) return meters;
	return `${meters} (${feet})`;
}

/** How many times the largest device in the list a result may be before the helper questions it. */
export const FAR_BEYOND_FACTOR = 3;

/**
 * A note when the watts worked out are far beyond every device in the list (more than three times the
 * largest): most often a unit or an efficiency typed wrong. Null when plausible or the list has no watts.
 */
export function plausibilityNote(watts: number, listWatts: readonly (number | undefined)[]): string | null {
	const known = listWatts.filter((w): w is number => typeof w === 'number' && Number.isFinite(w) && w > 0);
	if (!known.length) return null;
	const largest = Math.max(...known);
	if (watts <= largest * FAR_BEYOND_FACTOR) return null;
	return `That is about ${figure(watts / largest, 0)} times the largest device in this list (${figure(largest, 0)} W). Check the flow and its unit, the head and the efficiency before using it.`;
}

/**
 * The words of the button that puts the watts into a device: it names the device the person chose,
 * and there is no button (null) until they choose one, so no row is written by default.
 */
export function useButtonText(watts: number, target: { name: string } | null): string | null {
	return target ? `Use ${figure(watts, 1)} W for ${target.name}` : null;
}
