import { z } from 'zod';
import { countryCode } from './place.schema';
import { storableText, UNSTORABLE } from './storable';

const optionalText = (label: string, max: number) =>
	z
		.string()
		.trim()
		.max(max, `${label} must be at most ${max} characters`)
		.refine(storableText, UNSTORABLE)
		.optional()
		.transform((s) => (s ? s : null));

const optionalInt = (label: string, min: number, max: number) =>
	z
		.union([z.literal(''), z.coerce.number({ error: `${label} must be a number` })])
		.optional()
		.transform((v) => (v === '' || v === undefined ? null : v))
		.refine(
			(v) => v === null || (Number.isInteger(v) && v >= min && v <= max),
			`${label} must be a whole number from ${min} to ${max}`
		);

/** A site as its form and the API take it. The time zone and holiday region are checked on the server too. */
export const siteSchema = z.object({
	name: z
		.string({ error: 'Name the site' })
		.trim()
		.min(1, 'Name the site')
		.max(120, 'Use at most 120 characters')
		.refine(storableText, UNSTORABLE),
	address: optionalText('Address or area', 300),
	timezone: z.string({ error: 'Time zone is required' }).trim().min(1, 'Time zone is required').max(64),
	country: countryCode,
	region: optionalText('State or province', 10).transform((s) => (s ? s.toUpperCase() : null)),
	supplyVolts: optionalInt('Supply voltage', 1, 100_000),
	supplyPhases: optionalInt('Phases', 1, 3).refine(
		(v) => v === null || v === 1 || v === 3,
		'Phases must be 1 or 3'
	),
	tariffId: z
		.string()
		.optional()
		.transform((s) => (s ? s : null))
		.pipe(z.uuid({ error: 'Pick a tariff from the library' }).nullable()),
	tariffVersion: optionalInt('Pinned version', 1, 10_000),
	currency: z
		.string({ error: 'Currency is required' })
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{3}$/, 'Currency must be a three-letter code such as USD'),
	notes: optionalText('Notes', 4000)
});
export type SiteInput = z.output<typeof siteSchema>;

export const scenarioSchema = z.object({
	name: z
		.string({ error: 'Name the scenario' })
		.trim()
		.min(1, 'Name the scenario')
		.max(120, 'Use at most 120 characters')
		.refine(storableText, UNSTORABLE),
	description: optionalText('Description', 2000)
});
