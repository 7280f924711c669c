import { z } from 'zod';
import { amount, choice, list, record } from './fields';
import { FITTING_KINDS } from './pipe-fittings';
import { ROUGHNESS_MM } from './pipe-friction';
import { FLOW_UNITS, flowToCubicMetersPerSecond, lengthToMeters } from './units';

const FLUIDS = ['fresh', 'sea'] as const;

/** How pipe friction is worked out; Hazen–Williams stays the default so older requests answer the same. */
export const FRICTION_METHODS = ['hazen-williams', 'darcy-weisbach'] as const;
export type FrictionMethod = (typeof FRICTION_METHODS)[number];

/** One kind of fitting or valve on the pipe and how many of it. */
export const fittingSchema = record('Fitting', {
	kind: choice('Fitting kind', FITTING_KINDS),
	count: amount('Number of fittings', { min: 1, max: 1000, integer: true })
});

/**
 * The fastest water the helper works out, m/s. Pipes run at about 0.5–3 m/s (common practice); far past
 * that the figures mean nothing and, with a diameter near zero, would overflow to Infinity.
 */
export const MAX_WATER_SPEED_M_PER_S = 100;
/** The roughest pipe for its size, as ε/D: the Moody (1944) diagram ends at 0.05. */
export const MAX_RELATIVE_ROUGHNESS = 0.05;

/** A water pump's duty point and pipe, each quantity with its own unit. */
const pumpShape = record('Pump', {
	flow: amount('Flow', { min: 0, max: 10_000_000 }),
	flowUnit: choice('Flow unit', FLOW_UNITS),
	staticLift: amount('Static lift', { min: 0, max: 10_000 }),
	staticLiftUnit: choice('Static lift unit', ['ft', 'm']),
	pipeLength: amount('Pipe length', { min: 0, max: 1_000_000 }),
	pipeLengthUnit: choice('Pipe length unit', ['ft', 'm']),
	innerDiameter: amount('Inner diameter', { above: 0, max: 10_000 }),
	innerDiameterUnit: choice('Inner diameter unit', ['in', 'mm']),
	/** Hazen–Williams roughness; 150 suits smooth plastic pipe (common practice, no source). */
	hazenWilliamsC: amount('Hazen–Williams C', { min: 1, max: 200 }).default(150),
	/** At least 0.01 %: a smaller figure means nothing and, near zero, would overflow the watts. */
	efficiencyPercent: amount('Wire-to-water efficiency', { min: 0.01, max: 100 }),
	frictionMethod: choice('Friction method', FRICTION_METHODS).default('hazen-williams'),
	/** Darcy–Weisbach only: the wall's absolute roughness; smooth plastic by default (Moody 1944). */
	roughnessMm: amount('Pipe roughness', { min: 0, max: 10 }).default(ROUGHNESS_MM.plastic),
	/** Darcy–Weisbach only: sets the water's viscosity and density (0–40 °C, the range of their equations). */
	waterTemperatureC: amount('Water temperature', { min: 0, max: 40 }).default(20),
	fittings: list('Fittings', fittingSchema, { max: 50 }).default([])
});

/** The pump, with the checks that need two of its fields together (each said at the box to change). */
export const pumpSchema = pumpShape.superRefine((pump, ctx) => {
	const diameterM = lengthToMeters(pump.innerDiameter, pump.innerDiameterUnit);
	const speed = flowToCubicMetersPerSecond(pump.flow, pump.flowUnit) / ((Math.PI * diameterM ** 2) / 4);
	if (!(speed <= MAX_WATER_SPEED_M_PER_S)) {
		ctx.addIssue({
			code: 'custom',
			path: ['innerDiameter'],
			message: `At this flow the water would run through this pipe faster than ${MAX_WATER_SPEED_M_PER_S} m/s; check the flow, the inner diameter and their units`
		});
	}
	if (
		pump.frictionMethod === 'darcy-weisbach' &&
		pump.roughnessMm / 1000 > MAX_RELATIVE_ROUGHNESS * diameterM
	) {
		ctx.addIssue({
			code: 'custom',
			path: ['roughnessMm'],
			message: 'Pipe roughness must be less than a twentieth of the inner diameter'
		});
	}
});

/** Where air is injected: the depth of the diffuser or air-lift foot below the water surface. */
export const airSchema = record('Air', {
	depth: amount('Depth', { min: 0, max: 1000 }),
	depthUnit: choice('Depth unit', ['ft', 'm', 'in', 'cm'])
});

export const pumpingRequestSchema = record('Request', {
	fluid: choice('Fluid', FLUIDS).default('fresh'),
	pump: pumpSchema.optional(),
	air: airSchema.optional()
}).superRefine((request, ctx) => {
	if (!request.pump && !request.air) {
		ctx.addIssue({ code: 'custom', message: 'Give a pump, an air depth, or both' });
	}
});

export type Pump = z.output<typeof pumpSchema>;
export type Fitting = z.output<typeof fittingSchema>;
export type Air = z.output<typeof airSchema>;
export type PumpingRequest = z.output<typeof pumpingRequestSchema>;
export type PumpingRequestInput = z.input<typeof pumpingRequestSchema>;
