import { z } from 'zod';
import { DEPTH_UNITS, DIFFUSER_KINDS, transferFactorsShape } from './air-design.schema';
import { amount, choice, record } from './fields';
import { lengthToMeters } from './units';

/**
 * The shallowest diffuser the request takes, m: shallower than a few centimetres its bubbles transfer
 * next to nothing, and the air needed grows without bound.
 */
const MIN_DIFFUSER_DEPTH_M = 0.05;

/** Oxygen demand from the day's feed: fish respiration plus nitrification of the feed's ammonia. */
const feedDemandSchema = record('Demand', {
	feedKgPerDay: amount('Daily feed', { min: 0, max: 1_000_000 }),
	proteinPercent: amount('Feed protein', { min: 0, max: 100 }),
	/** Fish respiration, kg O₂ per kg feed; the core's default when absent. */
	kgO2PerKgFeed: amount('Oxygen per kg of feed', { min: 0, max: 5 }).optional()
});

/** Oxygen demand given directly. */
const directDemandSchema = record('Demand', {
	oxygenGramsPerHour: amount('Oxygen demand', { min: 0, max: 10_000_000 })
});

/**
 * The body of `POST /api/v1/aeration`: the water, the target dissolved oxygen, the diffusers (a kind
 * whose typical transfer the core knows, or a transfer efficiency per metre from a data sheet, which
 * wins when both are given), Metcalf & Eddy's correction factors (defaults in `transferFactorsShape`),
 * and the demand, from feed or in g O₂/h.
 */
export const aerationRequestSchema = record('Request', {
	temperatureC: amount('Water temperature', { min: 0, max: 40 }),
	salinityGPerKg: amount('Salinity', { min: 0, max: 45 }).default(0),
	altitudeM: amount('Altitude', { min: -500, max: 6000 }).default(0),
	targetDoMgL: amount('Target dissolved oxygen', { above: 0, max: 20 }),
	diffuserDepth: amount('Diffuser depth', { above: 0, max: 100 }),
	diffuserDepthUnit: choice('Diffuser depth unit', DEPTH_UNITS),
	diffuser: choice('Diffuser', DIFFUSER_KINDS).optional(),
	transferPercentPerM: amount('Transfer efficiency per metre', { min: 0.5, max: 20 }).optional(),
	...transferFactorsShape,
	// Floors on the factors the correction divides by, so the answer stays finite: below them the figure
	// would describe no aquaculture water (α about 0.8–1.0 there, 0.3–0.5 in raw sewage; β about 0.95–0.99;
	// F 0.9–1.0 for diffusers in service, per Metcalf & Eddy's ranges).
	alpha: transferFactorsShape.alpha
		.removeDefault()
		.min(0.2, { error: 'Alpha (α) must be at least 0.2' })
		.default(0.9),
	beta: transferFactorsShape.beta
		.removeDefault()
		.min(0.5, { error: 'Beta (β) must be at least 0.5' })
		.default(0.98),
	fouling: transferFactorsShape.fouling
		.removeDefault()
		.min(0.5, { error: 'Fouling factor must be at least 0.5' })
		.default(0.9),
	/** Diffuser and tubing loss on top of the water column, kPa. */
	extraPressureKPa: amount('Diffuser and line loss', { min: 0, max: 50 }).default(2),
	wireToAirPercent: amount('Wire-to-air efficiency', { min: 1, max: 100 }).default(25),
	demand: z.union([feedDemandSchema, directDemandSchema], {
		error: (issue) =>
			issue.input === undefined
				? 'Demand is required'
				: 'Give the demand as daily feed and protein, or as grams of oxygen an hour'
	})
}).superRefine((request, ctx) => {
	if (lengthToMeters(request.diffuserDepth, request.diffuserDepthUnit) < MIN_DIFFUSER_DEPTH_M)
		ctx.addIssue({
			code: 'custom',
			path: ['diffuserDepth'],
			message: 'Diffuser depth must be at least 5 cm (2 in)'
		});
	if (!request.diffuser && request.transferPercentPerM === undefined)
		ctx.addIssue({
			code: 'custom',
			path: ['diffuser'],
			message: 'Give the diffuser kind (fine or coarse) or its transfer efficiency per metre'
		});
});

export type AerationRequest = z.output<typeof aerationRequestSchema>;
export type AerationRequestInput = z.input<typeof aerationRequestSchema>;
