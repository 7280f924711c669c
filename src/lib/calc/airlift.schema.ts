import { z } from 'zod';
import { checkAirliftLengths, DEPTH_UNITS, RISER_DIAMETER_UNITS } from './air-design.schema';
import { amount, choice, record } from './fields';
import { FLOW_UNITS } from './units';

/**
 * The body of `POST /api/v1/airlift`: one riser, each length and flow with its own unit, and exactly
 * one of the water flow wanted (the answer is the air it needs) or the air flow at hand (the answer is
 * the water it lifts). The bounds keep every accepted body inside what the core answers in finite
 * numbers; the air-lift's own limits (submergence ratio, riser capacity) come back as warnings.
 */
export const airliftRequestSchema = record('Request', {
	fluid: choice('Fluid', ['fresh', 'sea']).default('fresh'),
	/** Overrides the fluid's typical salinity (fresh 0, sea 35 g/kg) when given. */
	salinityGPerKg: amount('Salinity', { min: 0, max: 45 }).optional(),
	temperatureC: amount('Water temperature', { min: 0, max: 40 }),
	altitudeM: amount('Altitude', { min: -500, max: 6000 }).default(0),
	riserInnerDiameter: amount('Riser inner diameter', { above: 0, max: 1000 }),
	riserInnerDiameterUnit: choice('Riser inner diameter unit', RISER_DIAMETER_UNITS),
	submergence: amount('Submergence', { above: 0, max: 100 }),
	submergenceUnit: choice('Submergence unit', DEPTH_UNITS),
	lift: amount('Lift', { min: 0, max: 100 }),
	liftUnit: choice('Lift unit', DEPTH_UNITS),
	waterFlow: amount('Water flow', { above: 0, max: 1_000_000 }).optional(),
	waterFlowUnit: choice('Water flow unit', FLOW_UNITS).optional(),
	airFlow: amount('Air flow', { above: 0, max: 1_000_000 }).optional(),
	airFlowUnit: choice('Air flow unit', FLOW_UNITS).optional(),
	efficiencyPercent: amount('Air-lift efficiency', { min: 10, max: 60 }).default(30)
}).superRefine((request, ctx) => {
	checkAirliftLengths(request, ctx);
	const water = request.waterFlow !== undefined;
	const air = request.airFlow !== undefined;
	// One message whichever way the pair is wrong: the person fixes one thing.
	if (water === air)
		ctx.addIssue({
			code: 'custom',
			path: ['waterFlow'],
			message: water
				? 'Give either the water flow or the air flow, not both'
				: 'Give the water flow you want lifted or the air flow you have'
		});
	else if (water && !request.waterFlowUnit)
		ctx.addIssue({ code: 'custom', path: ['waterFlowUnit'], message: 'Water flow unit is required' });
	else if (air && !request.airFlowUnit)
		ctx.addIssue({ code: 'custom', path: ['airFlowUnit'], message: 'Air flow unit is required' });
});

export type AirliftRequest = z.output<typeof airliftRequestSchema>;
export type AirliftRequestInput = z.input<typeof airliftRequestSchema>;
