import {
	type FlowUnit,
	type Fluid,
	METERS_PER_FOOT,
	type PumpingResponse,
	type RequestIssue
} from '$lib/calc';
import { figure } from '$lib/text/numbers';

/**
 * The pumping helper's form as typed, the request it posts to /api/v1/pumping, and the answer read
 * back. Boxes hold text; a number goes out as a number, text that is not one goes out as typed so the
 * API names the problem at its field ("Flow must be a number"). Nothing here can produce NaN.
 */

export type LiftUnit = 'ft' | 'm';
export type DiameterUnit = 'in' | 'mm';
export type DepthUnit = 'ft' | 'm' | 'in' | 'cm';

export interface PumpingDraft {
	fluid: Fluid;
	flow: string;
	flowUnit: FlowUnit;
	staticLift: string;
	staticLiftUnit: LiftUnit;
	pipeLength: string;
	pipeLengthUnit: LiftUnit;
	innerDiameter: string;
	innerDiameterUnit: DiameterUnit;
	hazenWilliamsC: string;
	efficiencyPercent: string;
	depth: string;
	depthUnit: DepthUnit;
}

/** The boxes that hold numbers. */
export type NumberField = Exclude<keyof PumpingDraft, `${string}Unit` | 'fluid'>;
/** Where a message is shown: a number box (its unit's messages with it), or the fluid choice. */
export type PanelField = NumberField | 'fluid';

/** The pump's boxes; C may stay empty (the API then takes 150). */
export const PUMP_FIELDS = [
	'flow',
	'staticLift',
	'pipeLength',
	'innerDiameter',
	'efficiencyPercent'
] as const;

export function blankDraft(): PumpingDraft {
	return {
		fluid: 'fresh',
		flow: '',
		flowUnit: 'gpm',
		staticLift: '',
		staticLiftUnit: 'ft',
		pipeLength: '',
		pipeLengthUnit: 'ft',
		innerDiameter: '',
		innerDiameterUnit: 'in',
		hazenWilliamsC: '150',
		efficiencyPercent: '',
		depth: '',
		depthUnit: 'ft'
	};
}

const DECIMAL = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

/** A box's value for the request: "2.5" → 2.5, "" → undefined, "2,5" or "1e999" → the text. */
export function numberDraft(text: string): number | string | undefined {
	const trimmed = text.trim();
	if (trimmed === '') return undefined;
	const parsed = DECIMAL.test(trimmed) ? Number(trimmed) : NaN;
	// "-0" becomes 0: JSON has no negative zero, and the box means none.
	if (parsed === 0) return 0;
	return Number.isFinite(parsed) ? parsed : trimmed;
}

/** The pump's boxes still empty; the pump is asked about only once none is. */
export function missingPumpFields(draft: PumpingDraft): Array<(typeof PUMP_FIELDS)[number]> {
	return PUMP_FIELDS.filter((field) => draft[field].trim() === '');
}

export interface PumpingBody {
	fluid: Fluid;
	pump?: Record<string, number | string>;
	air?: Record<string, number | string>;
}

/**
 * A wire-to-water efficiency typed as a fraction (0.3 for 30 %): the box is in percent, so 0.3 would
 * mean 0.3 % and a hundred times the watts. Below 1 % the helper refuses it and offers the percent the
 * person most likely meant; real pumps are far above 1 % (typical small pumps 20–50 %).
 */
export function efficiencyProblem(draft: PumpingDraft): { message: string; meantPercent: string } | null {
	const typed = numberDraft(draft.efficiencyPercent);
	if (typeof typed !== 'number' || typed <= 0 || typed >= 1) return null;
	const meant = figure(typed * 100, 2).replaceAll(',', '');
	return {
		message: `Wire-to-water efficiency is in percent: ${figure(typed, 4)} would be ${figure(typed, 4)} %, far below any pump. Did you mean ${meant} %?`,
		meantPercent: meant
	};
}

/** The body to post, or null while neither the pump nor the air part is filled in enough to ask. */
export function pumpingRequest(draft: PumpingDraft): PumpingBody | null {
	const body: PumpingBody = { fluid: draft.fluid };
	// An efficiency typed as a fraction is refused at its box before anything is asked.
	if (missingPumpFields(draft).length === 0 && !efficiencyProblem(draft)) {
		const pump: Record<string, number | string> = {};
		for (const field of [...PUMP_FIELDS, 'hazenWilliamsC'] as const) {
			const value = numberDraft(draft[field]);
			if (value !== undefined) pump[field] = value;
		}
		body.pump = {
			...pump,
			flowUnit: draft.flowUnit,
			staticLiftUnit: draft.staticLiftUnit,
			pipeLengthUnit: draft.pipeLengthUnit,
			innerDiameterUnit: draft.innerDiameterUnit
		};
	}
	const depth = numberDraft(draft.depth);
	if (depth !== undefined) body.air = { depth, depthUnit: draft.depthUnit };
	return body.pump || body.air ? body : null;
}

const FIELD_OF: Record<string, PanelField> = {
	fluid: 'fluid',
	'air.depth': 'depth',
	'air.depthUnit': 'depth',
	...Object.fromEntries(
		(['flow', 'staticLift', 'pipeLength', 'innerDiameter'] as const).flatMap((field) => [
			[`pump.${field}`, field],
			[`pump.${field}Unit`, field]
		])
	),
	'pump.hazenWilliamsC': 'hazenWilliamsC',
	'pump.efficiencyPercent': 'efficiencyPercent'
};

/** The API's issues at the boxes they concern; any other (a whole part, the request) in `other`. */
export function fieldIssues(issues: readonly RequestIssue[]): {
	byField: Partial<Record<PanelField, string[]>>;
	other: string[];
} {
	const byField: Partial<Record<PanelField, string[]>> = {};
	const other: string[] = [];
	for (const issue of issues) {
		const field = FIELD_OF[issue.path];
		if (field) (byField[field] ??= []).push(issue.message);
		else other.push(issue.message);
	}
	return { byField, other };
}

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
