import { type FlowUnit, type Fluid, type FrictionMethod } from '$lib/calc';
import { figure } from '$lib/text/numbers';
import type { FittingRow } from './friction-draft';

/**
 * The pumping helper's form as typed and the request it posts to /api/v1/pumping (the answer is read by
 * pumping-result.ts, its issues placed by pumping-issues.ts). Boxes hold text; a number goes out as a number, text that is not one goes out as typed so the
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
	frictionMethod: FrictionMethod;
	/** Darcy–Weisbach only. */
	roughnessMm: string;
	/** Darcy–Weisbach only. */
	waterTemperatureC: string;
	fittings: FittingRow[];
	depth: string;
	depthUnit: DepthUnit;
}

/** The boxes that hold numbers. */
export type NumberField = Exclude<
	keyof PumpingDraft,
	`${string}Unit` | 'fluid' | 'frictionMethod' | 'fittings'
>;
/** Where a message is shown: a number box (its unit's messages with it), a choice, or the fittings list. */
export type PanelField = NumberField | 'fluid' | 'frictionMethod' | 'fittings';

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
		frictionMethod: 'hazen-williams',
		roughnessMm: '0.0015',
		waterTemperatureC: '20',
		fittings: [],
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

type FittingBody = { kind: string; count?: number | string };

export interface PumpingBody {
	fluid: Fluid;
	pump?: Record<string, number | string | FittingBody[]>;
	air?: Record<string, number | string>;
}

/** The boxes the chosen friction method reads; the other method's boxes stay out of the request. */
function frictionFields(draft: PumpingDraft) {
	return draft.frictionMethod === 'darcy-weisbach'
		? (['roughnessMm', 'waterTemperatureC'] as const)
		: (['hazenWilliamsC'] as const);
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
		const pump: Record<string, number | string | FittingBody[]> = {};
		for (const field of [...PUMP_FIELDS, ...frictionFields(draft)]) {
			const value = numberDraft(draft[field]);
			if (value !== undefined) pump[field] = value;
		}
		body.pump = {
			...pump,
			flowUnit: draft.flowUnit,
			staticLiftUnit: draft.staticLiftUnit,
			pipeLengthUnit: draft.pipeLengthUnit,
			innerDiameterUnit: draft.innerDiameterUnit,
			frictionMethod: draft.frictionMethod
		};
		// An empty count goes out without one, so the API says at that row that it is needed.
		if (draft.fittings.length) {
			body.pump.fittings = draft.fittings.map(({ kind, count }) => {
				const value = numberDraft(count);
				return value === undefined ? { kind } : { kind, count: value };
			});
		}
	}
	const depth = numberDraft(draft.depth);
	if (depth !== undefined) body.air = { depth, depthUnit: draft.depthUnit };
	return body.pump || body.air ? body : null;
}
