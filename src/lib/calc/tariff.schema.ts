import { z } from 'zod';
import { daysSchema, monthsSchema, windowSchema, windowsSchema } from './common.schema';
import { demandWindowIssues } from './demand-windows';
import { amount, list, record, text } from './fields';
import { type RuleIssue, periodOverlapIssues, seasonCoverageIssues, tierIssues } from './tariff';
import {
	demandPriceIssues,
	demandTierIssues,
	limitIssues,
	ratchetIssues,
	seasonTierIssues
} from './tier-rules';

function report(issues: RuleIssue[], ctx: z.RefinementCtx): void {
	for (const issue of issues) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
}

const label = text('Label', 80);
const perKwh = (name = 'Per kWh') => amount(name, { min: 0, max: 100 });
const money = (name: string) => amount(name, { min: 0, max: 1_000_000 });
const oneWayOnly = 'Give a fixed charge per month, per day or per year (one of them)';
const absent = z.undefined({ error: oneWayOnly }).optional();

/** A fixed charge per billing period, per day of it, or per year (a twelfth on each billing period). */
const fixedChargeSchema = z.union(
	[
		record('Fixed charge', { label, perMonth: money('Per month'), perDay: absent, perYear: absent }),
		record('Fixed charge', { label, perDay: money('Per day'), perMonth: absent, perYear: absent }),
		record('Fixed charge', { label, perYear: money('Per year'), perMonth: absent, perDay: absent })
	],
	{ error: oneWayOnly }
);

/** Tier bounds per billing period (absent), or per day (multiplied by the billing period's days). */
const tiersPerSchema = z.enum(['period', 'day'], { error: 'Tiers per must be period or day' }).optional();
const abovePrices = (name: string) => list(name, perKwh(), { max: 19 }).optional();

const tierSchema = record('Tier', {
	uptoKwh: amount('Up to kWh', { above: 0, max: 1_000_000_000 }).nullable(),
	perKwh: perKwh()
});

const touPeriodSchema = record('Time-of-use period', {
	label,
	perKwh: perKwh(),
	abovePerKwh: abovePrices('Prices above the tier limits'),
	days: daysSchema.default('all'),
	windows: list('Windows', windowSchema, { min: 1, max: 24 })
});

const seasonSchema = record('Season', {
	months: monthsSchema,
	periods: list('Periods', touPeriodSchema, { max: 20 }).superRefine((periods, ctx) =>
		report(periodOverlapIssues(periods), ctx)
	),
	otherPerKwh: perKwh('Other per kWh'),
	otherAbovePerKwh: abovePrices('Other prices above the tier limits'),
	tierLimitsKwh: list('Tier limits', amount('Tier limit kWh', { above: 0, max: 1_000_000_000 }), { max: 19 })
		.superRefine((limits, ctx) => report(limitIssues(limits), ctx))
		.optional()
}).superRefine((season, ctx) => report(seasonTierIssues(season), ctx));

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
			tiersPer: tiersPerSchema,
			months: monthsSchema.optional()
		}),
		record('Energy charge', {
			label,
			type: z.literal('tou'),
			seasons: list('Seasons', seasonSchema, { min: 1, max: 12 }),
			tiersPer: tiersPerSchema,
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

const perKw = (name = 'Per kW') => amount(name, { min: 0, max: 10_000 });

const demandTierSchema = record('Demand tier', {
	uptoKw: amount('Up to kW', { above: 0, max: 1_000_000 }).nullable(),
	perKw: perKw()
});

/** Billing demand: the larger of this period's peak and a percentage of the highest earlier peak. */
const ratchetSchema = record('Ratchet', {
	percent: amount('Ratchet percent', { min: 0, max: 200 }),
	monthsBack: amount('Months back', { min: 1, max: 24, integer: true }).optional(),
	months: monthsSchema.optional()
}).superRefine((ratchet, ctx) => report(ratchetIssues(ratchet), ctx));

const demandChargeSchema = record('Demand charge', {
	label,
	perKw: perKw().optional(),
	tiers: list('Demand tiers', demandTierSchema, { min: 1, max: 20 })
		.superRefine((tiers, ctx) => report(demandTierIssues(tiers), ctx))
		.optional(),
	ratchet: ratchetSchema.optional(),
	intervalMinutes: z.literal([15, 60], { error: 'Interval minutes must be 15 or 60' }).default(15),
	months: monthsSchema.optional(),
	days: daysSchema.default('all'),
	windows: windowsSchema.optional(),
	/** Hours measured on weekend days instead of `windows` (see `DemandHours` in demand-windows.ts). */
	weekendWindows: list('Weekend windows', windowSchema, { min: 1, max: 24 }).optional()
}).superRefine((charge, ctx) => {
	report(demandPriceIssues(charge), ctx);
	report(demandWindowIssues(charge), ctx);
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
	minimumMonthly: money('Minimum monthly').nullable().optional(),
	/** Floors on the bill, fixed charges included: per day × the billing period's days; per year on 12 periods. */
	minimumPerDay: money('Minimum per day').nullable().optional(),
	minimumPerYear: money('Minimum per year').nullable().optional()
});

export type Tariff = z.output<typeof tariffSchema>;
export type TariffInput = z.input<typeof tariffSchema>;
export type EnergyCharge = Tariff['energyCharges'][number];
export type DemandCharge = Tariff['demandCharges'][number];
export type FixedCharge = Tariff['fixedCharges'][number];
export type TouCharge = Extract<EnergyCharge, { type: 'tou' }>;
export type TouSeason = TouCharge['seasons'][number];
