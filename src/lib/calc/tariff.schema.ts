import { z } from 'zod';
import { daysSchema, monthsSchema, windowSchema, windowsSchema } from './common.schema';
import { amount, list, record, text } from './fields';
import {
	type RuleIssue,
	hourlyWindowIssues,
	periodOverlapIssues,
	seasonCoverageIssues,
	tierIssues
} from './tariff';

function report(issues: RuleIssue[], ctx: z.RefinementCtx): void {
	for (const issue of issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
}

const label = text('Label', 80);
const perKwh = (name = 'Per kWh') => amount(name, { min: 0, max: 100 });
const money = (name: string) => amount(name, { min: 0, max: 1_000_000 });
const oneWayOnly = 'Give a fixed charge per month or per day (not both)';
const absent = z.undefined({ error: oneWayOnly }).optional();

const fixedChargeSchema = z.union(
	[
		record('Fixed charge', { label, perMonth: money('Per month'), perDay: absent }),
		record('Fixed charge', { label, perDay: money('Per day'), perMonth: absent })
	],
	{ error: oneWayOnly }
);

const tierSchema = record('Tier', {
	uptoKwh: amount('Up to kWh', { above: 0, max: 1_000_000_000 }).nullable(),
	perKwh: perKwh()
});

const touPeriodSchema = record('Time-of-use period', {
	label,
	perKwh: perKwh(),
	days: daysSchema.default('all'),
	windows: list('Windows', windowSchema, { min: 1, max: 24 })
});

const seasonSchema = record('Season', {
	months: monthsSchema,
	periods: list('Periods', touPeriodSchema, { max: 20 }).superRefine((periods, ctx) =>
		report(periodOverlapIssues(periods), ctx)
	),
	otherPerKwh: perKwh('Other per kWh')
});

const energyChargeSchema = z.discriminatedUnion(
	'type',
	[
		record('Energy charge', {
			label,
			type: z.literal('flat'),
			perKwh: perKwh(),
			months: monthsSchema.optional()
		}),
		record('Energy charge', {
			label,
			type: z.literal('tiered'),
			tiers: list('Tiers', tierSchema, { min: 1, max: 20 }).superRefine((tiers, ctx) =>
				report(tierIssues(tiers), ctx)
			),
			months: monthsSchema.optional()
		}),
		record('Energy charge', {
			label,
			type: z.literal('tou'),
			seasons: list('Seasons', seasonSchema, { min: 1, max: 12 }),
			months: monthsSchema.optional()
		}).superRefine((charge, ctx) =>
			report(
				seasonCoverageIssues(charge.seasons, charge.months).map((issue) => ({
					...issue,
					path: ['seasons', ...issue.path]
				})),
				ctx
			)
		)
	],
	{ error: 'Energy charge type must be one of: flat, tiered, tou' }
);

const demandChargeSchema = record('Demand charge', {
	label,
	perKw: amount('Per kW', { min: 0, max: 10_000 }),
	intervalMinutes: z.literal([15, 60], { error: 'Interval minutes must be 15 or 60' }).default(15),
	months: monthsSchema.optional(),
	days: daysSchema.default('all'),
	windows: windowsSchema.optional()
}).superRefine((charge, ctx) => {
	if (charge.intervalMinutes !== 60) return;
	report(
		hourlyWindowIssues(charge.windows).map((issue) => ({ ...issue, path: ['windows', ...issue.path] })),
		ctx
	);
});

/** A rate schedule: fixed, energy (flat, tiered, time-of-use), demand, riders, taxes, minimum bill. */
export const tariffSchema = record('Tariff', {
	currency: z
		.string({ error: 'Currency must be a three-letter code such as USD' })
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{3}$/, { error: 'Currency must be a three-letter code such as USD' }),
	holidaysAsWeekends: z.boolean({ error: 'Holidays as weekends must be true or false' }).default(true),
	fixedCharges: list('Fixed charges', fixedChargeSchema, { max: 50 }).default([]),
	energyCharges: list('Energy charges', energyChargeSchema, { max: 50 }).default([]),
	demandCharges: list('Demand charges', demandChargeSchema, { max: 50 }).default([]),
	riders: list('Riders', record('Rider', { label, perKwh: amount('Per kWh', { min: -100, max: 100 }) }), {
		max: 50
	}).default([]),
	taxes: list('Taxes', record('Tax', { label, percent: amount('Percent', { min: 0, max: 100 }) }), {
		max: 20
	}).default([]),
	minimumMonthly: money('Minimum monthly').nullable().optional()
});

export type Tariff = z.output<typeof tariffSchema>;
export type TariffInput = z.input<typeof tariffSchema>;
export type EnergyCharge = Tariff['energyCharges'][number];
export type DemandCharge = Tariff['demandCharges'][number];
export type FixedCharge = Tariff['fixedCharges'][number];
