// What the air and water designer holds while a person types: the core's design shape with each number
// as the box's draft (a number, nothing, or the text typed), so the core's own schema names every
// problem at its field, and a saved design opens again exactly as it was stored.
import {
	type AirDesign,
	DEPTH_UNITS,
	type DiffuserKind,
	type FlowUnit,
	parseRequest,
	airDesignSchema,
	type RequestIssue,
	RISER_DIAMETER_UNITS
} from '$lib/calc';
import type { NumberDraft } from '$lib/components/fields/number-text';
import type { PumpOption } from './pump-options';

export type DepthUnit = (typeof DEPTH_UNITS)[number];
export type RiserUnit = (typeof RISER_DIAMETER_UNITS)[number];

/** One row of air-lifts as typed; `key` keeps the row's boxes when rows are added or removed. */
export type AirliftDraft = {
	key: string;
	name: string;
	count: NumberDraft;
	riserInnerDiameter: NumberDraft;
	riserInnerDiameterUnit: RiserUnit;
	submergence: NumberDraft;
	submergenceUnit: DepthUnit;
	lift: NumberDraft;
	liftUnit: DepthUnit;
	waterFlow: NumberDraft;
	waterFlowUnit: FlowUnit;
	efficiencyPercent: NumberDraft;
};

/** The aeration part as typed; the Advanced factors start at the core's defaults. */
export type AerationDraft = {
	tankId: string | null;
	targetDoMgL: NumberDraft;
	diffuser: DiffuserKind;
	diffuserDepth: NumberDraft;
	diffuserDepthUnit: DepthUnit;
	alpha: NumberDraft;
	beta: NumberDraft;
	fouling: NumberDraft;
	theta: NumberDraft;
	depthCorrection: NumberDraft;
	/** Empty: the diffuser kind's usual transfer per metre (the core's table). */
	transferPercentPerM?: NumberDraft;
};

export type DesignDraft = {
	airlifts: AirliftDraft[];
	/** Aeration is optional: off keeps what was typed, and the design goes without it. */
	aerationOn: boolean;
	aeration: AerationDraft;
	lineLossKPa: NumberDraft;
	/** The chosen pump option's value (`pump-options.ts`), "" before one is chosen. */
	pump: string;
};

let rowCount = 0;
const newKey = () => `airlift-${++rowCount}`;

/**
 * The first air-lift a blank designer shows: the worked example of issue 18 (25 mm riser, 0.7 m
 * submergence, 0.3 m lift, 20 L/min, 30 %), a small aquaponics riser (common practice).
 */
export function blankAirlift(): AirliftDraft {
	return {
		key: newKey(),
		name: 'Air-lift',
		count: 1,
		riserInnerDiameter: 25,
		riserInnerDiameterUnit: 'mm',
		submergence: 0.7,
		submergenceUnit: 'm',
		lift: 0.3,
		liftUnit: 'm',
		waterFlow: 20,
		waterFlowUnit: 'lpm',
		efficiencyPercent: 30
	};
}

/** A further row starts as a copy of the last one (risers in one system are usually alike), renamed. */
export function nextAirlift(rows: readonly AirliftDraft[]): AirliftDraft {
	const last = rows.at(-1);
	const row = last ? { ...last, key: newKey() } : blankAirlift();
	return { ...row, name: `Air-lift ${rows.length + 1}` };
}

/** Aeration with the core's defaults: target 5 mg/L, fine bubbles 1 m deep, α 0.9, β 0.98, F 0.9. */
export function blankAeration(tankId: string | null = null): AerationDraft {
	return {
		tankId,
		targetDoMgL: 5,
		diffuser: 'fine',
		diffuserDepth: 1,
		diffuserDepthUnit: 'm',
		alpha: 0.9,
		beta: 0.98,
		fouling: 0.9,
		theta: 1.024,
		depthCorrection: 0.4
	};
}

/** A blank designer: one air-lift, aeration off, 2 kPa of line loss and the pump chosen by the caller. */
export function blankDraft(pump: string, tankId: string | null = null): DesignDraft {
	return {
		airlifts: [blankAirlift()],
		aerationOn: false,
		aeration: blankAeration(tankId),
		lineLossKPa: 2,
		pump
	};
}

/** A saved design as the designer shows it; its pump is "the saved one" until the person picks another. */
export function draftOf(design: AirDesign, pump: string): DesignDraft {
	const aeration = design.aeration ?? blankAeration();
	return {
		airlifts: design.airlifts.map((row) => ({ ...row, key: newKey() })),
		aerationOn: design.aeration !== null,
		aeration: { ...blankAeration(), ...aeration },
		lineLossKPa: design.lineLossKPa,
		pump
	};
}

/**
 * The design as the core's schema reads it (drafts as they are, so "12a" is named at its box), with
 * the chosen pump's table. Text boxes are trimmed by the schema; empty boxes fall to its defaults.
 */
export function designInput(draft: DesignDraft, pump: PumpOption): Record<string, unknown> {
	return {
		airlifts: draft.airlifts.map(({ key: _key, ...row }) => row),
		aeration: draft.aerationOn ? draft.aeration : null,
		lineLossKPa: draft.lineLossKPa,
		pump: pump.pump,
		...(pump.source ? { pumpSource: pump.source } : {})
	};
}

/** The design checked by the core's schema: the design, or each problem once at its dotted path. */
export function checkDesign(
	draft: DesignDraft,
	pump: PumpOption | null
): { design: AirDesign; issues: [] } | { design: null; issues: RequestIssue[] } {
	if (!pump) return { design: null, issues: [{ path: 'pump', message: 'Choose an air pump' }] };
	const parsed = parseRequest(airDesignSchema, designInput(draft, pump));
	return parsed.success ? { design: parsed.data, issues: [] } : { design: null, issues: parsed.error.issues };
}
