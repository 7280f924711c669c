import { z } from 'zod';
import { amount, list, record } from './fields';

/**
 * One rate of the open rate database (URDB, published by NREL) as its JSON gives it, the fields
 * Runrate reads checked: rates and bounds are finite and not negative, the 12 × 24 schedules have twelve
 * rows of twenty-four period indexes, and every index points into its rate structure. Fields Runrate
 * does not read pass through untouched, so the import can name them in its notes.
 */
const rateTier = record('Tier', {
	rate: amount('Rate', { min: 0, max: 100 }).optional(),
	adj: amount('Adjustment', { min: -100, max: 100 }).optional(),
	max: amount('Tier bound', { above: 0, max: 1_000_000_000 }).optional(),
	unit: z.string().max(40).optional()
}).loose();

const structure = (label: string) =>
	list(label, list('Tiers', rateTier, { min: 1, max: 20 }), { min: 1, max: 24 });

const hourRow = z
	.array(
		z
			.number({ error: 'Each hour must hold a period number' })
			.int({ error: 'Each hour must hold a whole period number' })
			.min(0, { error: 'Period numbers start at 0' }),
		{
			error: 'Each month must be a list of 24 period numbers'
		}
	)
	.length(24, { error: 'Each month must have 24 hours' });

const hourGrid = z
	.array(hourRow, { error: 'A schedule must be a list of 12 months' })
	.length(12, { error: 'A schedule must have 12 months' });

export const urdbRateSchema = record('Rate', {
	label: z.string().max(200).optional(),
	name: z.string().max(500).optional(),
	utility: z.string().max(500).optional(),
	sector: z.string().max(100).optional(),
	source: z.string().max(2000).optional(),
	uri: z.string().max(2000).optional(),
	startdate: z.number().int().optional(),
	enddate: z.number().int().optional(),
	energyratestructure: structure('Energy rate structure').optional(),
	energyweekdayschedule: hourGrid.optional(),
	energyweekendschedule: hourGrid.optional(),
	fixedmonthlycharge: amount('Fixed monthly charge', { min: 0, max: 1_000_000 }).optional(),
	fixedchargefirstmeter: amount('Fixed charge', { min: 0, max: 1_000_000 }).optional(),
	fixedchargeunits: z.string().max(40).optional(),
	minmonthlycharge: amount('Minimum monthly charge', { min: 0, max: 1_000_000 }).optional(),
	mincharge: amount('Minimum charge', { min: 0, max: 100_000_000 }).optional(),
	minchargeunits: z.string().max(40).optional(),
	annualmincharge: amount('Annual minimum charge', { min: 0, max: 100_000_000 }).optional(),
	demandratestructure: structure('Demand rate structure').optional(),
	demandweekdayschedule: hourGrid.optional(),
	demandweekendschedule: hourGrid.optional(),
	flatdemandstructure: structure('Flat demand structure').optional(),
	flatdemandmonths: z
		.array(z.number().int().min(0), { error: 'Flat demand months must be 12 period numbers' })
		.length(12, { error: 'Flat demand months must have 12 entries' })
		.optional(),
	demandunits: z.string().max(40).optional(),
	demandwindow: amount('Demand window', { above: 0, max: 1440 }).optional(),
	demandratchetpercentage: z
		.array(amount('Ratchet percentage', { min: 0, max: 100 }))
		.length(12, { error: 'Ratchet percentages must have 12 entries' })
		.optional(),
	lookbackPercent: amount('Lookback percent', { min: 0, max: 100 }).optional(),
	lookbackRange: amount('Lookback range', { min: 0, max: 24, integer: true }).optional(),
	lookbackMonths: z
		.array(z.union([z.boolean(), z.number().int().min(0).max(12)]))
		.max(12)
		.optional()
})
	.loose()
	.superRefine((rate, ctx) => {
		for (const [kind, structureKey, keys] of [
			['energy', 'energyratestructure', ['energyweekdayschedule', 'energyweekendschedule']],
			['demand', 'demandratestructure', ['demandweekdayschedule', 'demandweekendschedule']]
		] as const) {
			const periods = rate[structureKey]?.length ?? 0;
			for (const key of keys) {
				const grid = rate[key];
				if (rate[structureKey] && !grid)
					ctx.addIssue({
						code: 'custom',
						path: [key],
						message: `A ${kind} rate structure needs its weekday and weekend schedules`
					});
				grid?.forEach((row, month) => {
					const hour = row.findIndex((index) => index >= periods);
					if (hour >= 0)
						ctx.addIssue({
							code: 'custom',
							path: [key, month, hour],
							message: `Period ${row[hour]} is not in the ${kind} rate structure (it has ${periods})`
						});
				});
			}
		}
		const flat = rate.flatdemandstructure?.length ?? 0;
		const month = rate.flatdemandmonths?.findIndex((index) => index >= flat) ?? -1;
		if (month >= 0)
			ctx.addIssue({
				code: 'custom',
				path: ['flatdemandmonths', month],
				message: `Period ${rate.flatdemandmonths?.[month]} is not in the flat demand structure (it has ${flat})`
			});
	});

export type UrdbRate = z.output<typeof urdbRateSchema>;
