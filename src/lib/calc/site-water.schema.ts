import { z } from 'zod';
import { amount, choice, list, record, text } from './fields';

export const WATER_KINDS = ['fresh', 'sea'] as const;

/** Twelve monthly water temperatures, January first. */
const monthlyTemperatures = z
	.array(amount('Monthly water temperature', { min: 0, max: 40 }), {
		error: 'Monthly water temperatures must be a list of twelve numbers'
	})
	.length(12, { error: 'Give a water temperature for each of the twelve months' });

/**
 * A tank or pond at a site: its water and the fish in it. Stored in metric (litres, metres, °C, kg);
 * the forms convert. `id` is chosen by the client so a scenario's aeration design can name the tank.
 */
export const tankSchema = record('Tank', {
	id: z
		.string({ error: 'Tank id is required' })
		.regex(/^[A-Za-z0-9_-]{1,40}$/, { error: 'Tank id must be 1–40 letters, digits, - or _' }),
	name: text('Tank name', 80),
	volumeLiters: amount('Volume', { above: 0, max: 1_000_000_000 }),
	depthM: amount('Depth', { above: 0, max: 100 }),
	water: choice('Water', WATER_KINDS).default('fresh'),
	/** Salt, g/kg; when absent: 0 for fresh water, 35 for sea water. */
	salinityGPerKg: amount('Salinity', { min: 0, max: 45 }).optional(),
	temperatureC: amount('Water temperature', { min: 0, max: 40 }),
	/** When the water's temperature follows the seasons; otherwise `temperatureC` all year. */
	monthlyTemperatureC: monthlyTemperatures.nullable().default(null),
	fishKg: amount('Fish', { min: 0, max: 10_000_000 }).default(0),
	feedKgPerDay: amount('Daily feed', { min: 0, max: 1_000_000 }).default(0),
	proteinPercent: amount('Feed protein', { min: 0, max: 100 }).default(35)
});

/** A site's water: its altitude (for the air's pressure and oxygen's solubility) and its tanks. */
export const siteWaterSchema = record('Water', {
	altitudeM: amount('Altitude', { min: -500, max: 6000 }).default(0),
	tanks: list('Tanks', tankSchema, { max: 50, tooMany: 'A site holds at most 50 tanks or ponds' })
}).superRefine((water, ctx) => {
	const seen = new Set<string>();
	water.tanks.forEach((tank, i) => {
		if (seen.has(tank.id))
			ctx.addIssue({ code: 'custom', path: ['tanks', i, 'id'], message: 'Another tank has this id' });
		seen.add(tank.id);
	});
});

export const EMPTY_SITE_WATER: SiteWater = { altitudeM: 0, tanks: [] };

export type Tank = z.output<typeof tankSchema>;
export type TankInput = z.input<typeof tankSchema>;
export type SiteWater = z.output<typeof siteWaterSchema>;
export type SiteWaterInput = z.input<typeof siteWaterSchema>;
