import { z } from 'zod';
import { amount, choice, list, record, text } from './fields';
import { FLOW_UNITS, lengthToMeters } from './units';

/** Units a depth, submergence or lift may be typed in. */
export const DEPTH_UNITS = ['m', 'ft', 'cm', 'in'] as const;
export const RISER_DIAMETER_UNITS = ['mm', 'in'] as const;
export const DIFFUSER_KINDS = ['fine', 'coarse'] as const;

/**
 * What the air models can answer, in metres, whatever unit was typed: risers narrower than a few
 * millimetres are ruled by surface tension, which neither Nicklin's efficiency nor Stenning & Martin's
 * momentum balance includes (Reinemann et al. 1990 studied such small tubes apart); an injection or a
 * diffuser a hair's breadth under the surface pushes no air (ln(p_in/p_a) → 0).
 */
const RISER_M = { min: 0.003, max: 1 };
const MIN_SUBMERGENCE_M = 0.01;
const MIN_DIFFUSER_DEPTH_M = 0.05;

type Lengths = {
	riserInnerDiameter: number;
	riserInnerDiameterUnit: (typeof RISER_DIAMETER_UNITS)[number];
	submergence: number;
	submergenceUnit: (typeof DEPTH_UNITS)[number];
};

/** The riser and submergence bounds in metres, for the design and for `POST /api/v1/airlift` alike. */
export function checkAirliftLengths(airlift: Lengths, ctx: z.RefinementCtx) {
	const riserM = lengthToMeters(airlift.riserInnerDiameter, airlift.riserInnerDiameterUnit);
	if (riserM < RISER_M.min || riserM > RISER_M.max)
		ctx.addIssue({
			code: 'custom',
			path: ['riserInnerDiameter'],
			message: 'Riser inner diameter must be from 3 mm to 1,000 mm (0.12 in to 39 in)'
		});
	if (lengthToMeters(airlift.submergence, airlift.submergenceUnit) < MIN_SUBMERGENCE_M)
		ctx.addIssue({
			code: 'custom',
			path: ['submergence'],
			message: 'Submergence must be at least 1 cm (0.4 in): the air must go in below the surface'
		});
}

/** The diffuser depth's floor in metres, for the design and for `POST /api/v1/aeration` alike. */
export function checkDiffuserDepth(
	aeration: { diffuserDepth: number; diffuserDepthUnit: (typeof DEPTH_UNITS)[number] },
	ctx: z.RefinementCtx
) {
	if (lengthToMeters(aeration.diffuserDepth, aeration.diffuserDepthUnit) < MIN_DIFFUSER_DEPTH_M)
		ctx.addIssue({
			code: 'custom',
			path: ['diffuserDepth'],
			message: 'Diffuser depth must be at least 5 cm (2 in)'
		});
}

/** One kind of air-lift in a design: `count` identical risers, each lifting `waterFlow`. */
export const airliftSchema = record('Air-lift', {
	name: text('Air-lift name', 80).default('Air-lift'),
	count: amount('Number of air-lifts', { integer: true, min: 1, max: 100 }).default(1),
	riserInnerDiameter: amount('Riser inner diameter', { above: 0, max: 1000 }),
	riserInnerDiameterUnit: choice('Riser inner diameter unit', RISER_DIAMETER_UNITS),
	submergence: amount('Submergence', { above: 0, max: 100 }),
	submergenceUnit: choice('Submergence unit', DEPTH_UNITS),
	lift: amount('Lift', { min: 0, max: 100 }),
	liftUnit: choice('Lift unit', DEPTH_UNITS),
	waterFlow: amount('Water flow', { above: 0, max: 1_000_000 }),
	waterFlowUnit: choice('Water flow unit', FLOW_UNITS),
	efficiencyPercent: amount('Air-lift efficiency', { min: 10, max: 60 }).default(30)
}).superRefine(checkAirliftLengths);

/**
 * The correction factors between clean-water standard transfer and the tank (Metcalf & Eddy). The
 * floors keep the answer finite and still describe water: α about 0.8–1.0 in aquaculture water (0.3–0.5
 * in raw sewage), β about 0.95–0.99, F 0.9–1.0 for diffusers in service.
 */
export const transferFactorsShape = {
	/** Field ÷ clean-water transfer coefficient; clean aquaculture water about 0.8–1.0. */
	alpha: amount('Alpha (α)', { min: 0.2, max: 1.5 }).default(0.9),
	/** Field ÷ clean-water saturation for what salt does not already account for; about 0.95–0.99. */
	beta: amount('Beta (β)', { min: 0.5, max: 1.2 }).default(0.98),
	/** Diffuser fouling, 0.9–1.0. */
	fouling: amount('Fouling factor', { min: 0.5, max: 1 }).default(0.9),
	theta: amount('Temperature factor (θ)', { min: 1, max: 1.1 }).default(1.024),
	/** Mid-depth factor d_e for the saturation at depth, 0.25–0.45; 0 ignores depth. */
	depthCorrection: amount('Mid-depth factor', { min: 0, max: 1 }).default(0.4)
};

/** Aeration of one tank (or all the site's stock when `tankId` is null) by diffusers. */
export const aerationDesignSchema = record('Aeration', {
	tankId: z.string().max(40).nullable().default(null),
	targetDoMgL: amount('Target dissolved oxygen', { above: 0, max: 20 }).default(5),
	diffuser: choice('Diffuser', DIFFUSER_KINDS).default('fine'),
	/** Standard oxygen transfer efficiency per metre of depth; when absent, the diffuser kind's default. */
	transferPercentPerM: amount('Transfer efficiency per metre', { min: 0.5, max: 20 }).optional(),
	diffuserDepth: amount('Diffuser depth', { above: 0, max: 100 }),
	diffuserDepthUnit: choice('Diffuser depth unit', DEPTH_UNITS),
	...transferFactorsShape
}).superRefine(checkDiffuserDepth);

/** One point of an air pump's curve: the free air it delivers against a gauge pressure. */
export const pumpPointSchema = record('Curve point', {
	pressureKPa: amount('Pressure', { min: 0, max: 300 }),
	airLpm: amount('Air flow', { min: 0, max: 100_000 })
});

/** An air pump from its data sheet: flow against pressure, and its input watts or a wire-to-air efficiency. */
export const airPumpSchema = record('Air pump', {
	name: text('Pump name', 120),
	points: list('Flow against pressure', pumpPointSchema, { min: 2, max: 20 }),
	/** Input watts at its rated pressure, from the data sheet; null: use `wireToAirPercent`. */
	inputWatts: amount('Input watts', { above: 0, max: 100_000 }).nullable().default(null),
	wireToAirPercent: amount('Wire-to-air efficiency', { above: 0, max: 100 }).default(25)
}).superRefine((pump, ctx) => {
	pump.points.forEach((point, i) => {
		const before = pump.points[i - 1];
		if (before && point.pressureKPa <= before.pressureKPa)
			ctx.addIssue({
				code: 'custom',
				path: ['points', i, 'pressureKPa'],
				message: 'Each pressure must be higher than the one before'
			});
	});
});

/** Where a design's pump came from, so the designer can show the same choice again. */
const pumpSourceSchema = record('Pump source', {
	kind: choice('Pump source', ['typical', 'workspace']),
	id: z.string().max(80)
});

/**
 * A scenario's air side: air-lifts and aeration fed by one model of air pump. Kept with the scenario
 * so the designer can reopen it; `count` pumps of that model go into the equipment list.
 */
export const airDesignSchema = record('Air design', {
	airlifts: list('Air-lifts', airliftSchema, { max: 20 }),
	aeration: aerationDesignSchema.nullable().default(null),
	/** Diffuser, injector and tubing losses on top of the deepest outlet's water column, kPa. */
	lineLossKPa: amount('Line and diffuser loss', { min: 0, max: 50 }).default(2),
	pump: airPumpSchema,
	pumpSource: pumpSourceSchema.optional()
}).superRefine((design, ctx) => {
	if (design.airlifts.length === 0 && !design.aeration)
		ctx.addIssue({ code: 'custom', path: ['airlifts'], message: 'Add an air-lift or aeration to design' });
});

export type Airlift = z.output<typeof airliftSchema>;
export type AerationDesign = z.output<typeof aerationDesignSchema>;
export type AirPump = z.output<typeof airPumpSchema>;
export type AirPumpInput = z.input<typeof airPumpSchema>;
export type PumpPoint = z.output<typeof pumpPointSchema>;
export type AirDesign = z.output<typeof airDesignSchema>;
export type AirDesignInput = z.input<typeof airDesignSchema>;
export type DiffuserKind = (typeof DIFFUSER_KINDS)[number];
