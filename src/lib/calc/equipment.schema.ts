import { z } from 'zod';
import { nominalWindowMinutes } from './clock';
import { daysSchema, monthsSchema, windowSchema, windowsSchema } from './common.schema';
import { amount, choice, list, record, text } from './fields';

export const EQUIPMENT_CATEGORIES = [
	'water-pump',
	'air-pump',
	'aerator',
	'lighting',
	'heater',
	'chiller',
	'uv',
	'fan',
	'controls',
	'other'
] as const;

const bothForms = 'Give power as watts, or as amps and volts (not both)';
const absent = z.undefined({ error: bothForms }).optional();

/** Power per unit: watts, or amps × volts (× power factor, × √3 for three phase). */
export const powerSchema = z.union(
	[
		record('Power', { watts: amount('Watts', { min: 0, max: 10_000_000 }), amps: absent }),
		record('Power', {
			amps: amount('Amps', { min: 0, max: 100_000 }),
			volts: amount('Volts', { min: 1, max: 100_000 }),
			powerFactor: amount('Power factor', { above: 0, max: 1 }).default(1),
			phases: z.literal([1, 3], { error: 'Phases must be 1 or 3' }).default(1),
			watts: absent
		})
	],
	{ error: (issue) => (issue.input === undefined ? 'Power is required' : bothForms) }
);

const days = daysSchema.default('all');
const minutesPerDay = (label: string) => amount(label, { min: 0, max: 1440 });

const cycleSchema = record('Schedule', {
	type: z.literal('cycle'),
	onMinutes: minutesPerDay('On minutes'),
	offMinutes: minutesPerDay('Off minutes'),
	windows: windowsSchema.optional(),
	days
}).superRefine((cycle, ctx) => {
	if (cycle.onMinutes + cycle.offMinutes === 0) {
		ctx.addIssue({ code: 'custom', path: ['offMinutes'], message: 'On and off minutes cannot both be zero' });
	}
});

const runsSchema = record('Schedule', {
	type: z.literal('runs'),
	runsPerDay: amount('Runs per day', { min: 0, max: 1440 }),
	minutesPerRun: minutesPerDay('Minutes per run'),
	windows: windowsSchema.optional(),
	days
}).superRefine((runs, ctx) => {
	const runMinutes = runs.runsPerDay * runs.minutesPerRun;
	const windowMinutes = nominalWindowMinutes(runs.windows);
	if (runMinutes > windowMinutes) {
		ctx.addIssue({
			code: 'custom',
			message: `${runs.runsPerDay} runs of ${runs.minutesPerRun} minutes (${runMinutes} minutes) do not fit in the ${windowMinutes} minutes of the windows`
		});
	}
});

/** When a device runs: always, hours a day, time windows, on/off cycling or triggered runs. */
export const scheduleSchema = z.discriminatedUnion(
	'type',
	[
		record('Schedule', { type: z.literal('always') }),
		record('Schedule', {
			type: z.literal('hours'),
			hoursPerDay: amount('Hours per day', { min: 0, max: 24 }),
			days
		}),
		record('Schedule', {
			type: z.literal('windows'),
			windows: list('Windows', windowSchema, { min: 1, max: 24 }),
			days
		}),
		cycleSchema,
		runsSchema
	],
	{
		error: (issue) =>
			issue.input === undefined
				? 'Schedule is required'
				: 'Schedule type must be one of: always, hours, windows, cycle, runs'
	}
);

const money = (label: string) => amount(label, { min: 0, max: 1_000_000_000 }).default(0);

export const equipmentSchema = record('Equipment', {
	name: text('Name', 120),
	category: choice('Category', EQUIPMENT_CATEGORIES).default('other'),
	quantity: amount('Quantity', { integer: true, min: 1, max: 10_000 }).default(1),
	power: powerSchema,
	standbyWatts: amount('Standby watts', { min: 0, max: 10_000_000 }).default(0),
	dutyPercent: amount('Duty percent', { min: 0, max: 100 }).default(100),
	months: monthsSchema.optional(),
	schedule: scheduleSchema,
	purchaseCost: money('Purchase cost'),
	installCost: money('Install cost'),
	lifeYears: amount('Life in years', { integer: true, min: 1, max: 100 }).nullable().default(null),
	maintenancePerYear: money('Maintenance per year')
});

export type Power = z.output<typeof powerSchema>;
export type Schedule = z.output<typeof scheduleSchema>;
export type Equipment = z.output<typeof equipmentSchema>;
export type EquipmentInput = z.input<typeof equipmentSchema>;
