import { z } from 'zod';
import { checkDiffuserDepth, DEPTH_UNITS, DIFFUSER_KINDS, transferFactorsShape } from './air-design.schema';
import { amount, choice, record } from './fields';

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
	checkDiffuserDepth(request, ctx);
	if (!request.diffuser && request.transferPercentPerM === undefined)
		ctx.addIssue({
			code: 'custom',
			path: ['diffuser'],
			message: 'Give the diffuser kind (fine or coarse) or its transfer efficiency per metre'
		});
});

export type AerationRequest = z.output<typeof aerationRequestSchema>;
export type AerationRequestInput = z.input<typeof aerationRequestSchema>;
