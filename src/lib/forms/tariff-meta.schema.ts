import { z } from 'zod';
import { countryCode } from './place.schema';
import { storableText, UNSTORABLE } from './storable';

// What the library knows about a tariff besides its charges (those follow the core's tariffSchema),
// and the provenance every published version carries. Shared by the editor, the API and the imports.

export const CUSTOMER_CLASSES = [
	'residential',
	'small-commercial',
	'commercial',
	'agricultural',
	'industrial',
	'other'
] as const;
export type CustomerClass = (typeof CUSTOMER_CLASSES)[number];

export const CUSTOMER_CLASS_WORDS: Record<CustomerClass, string> = {
	residential: 'Residential',
	'small-commercial': 'Small commercial',
	commercial: 'Commercial',
	agricultural: 'Agricultural',
	industrial: 'Industrial',
	other: 'Other'
};

const isoDate = (label: string) =>
	z
		.string({ error: `${label} is required` })
		.regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date like 2027-01-31`)
		.refine(
			(s) =>
				!Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
			{
				message: `${label} is not a real calendar date`
			}
		)
		// The calendar has no year 0 (PostgreSQL refuses it), though JavaScript's dates accept it.
		.refine((s) => !s.startsWith('0000'), `${label} is not a real calendar date`);

const shortText = (label: string, max = 120) =>
	z
		.string({ error: `${label} is required` })
		.trim()
		.min(1, `${label} is required`)
		.max(max, `${label} must be at most ${max} characters`)
		.refine(storableText, UNSTORABLE);

const optionalText = (label: string, max = 120) =>
	z
		.string()
		.trim()
		.max(max, `${label} must be at most ${max} characters`)
		.refine(storableText, UNSTORABLE)
		.transform((s) => (s === '' ? null : s))
		.nullable()
		.optional()
		.transform((s) => s ?? null);

/** The tariff itself: who bills it, where, to whom. */
export const tariffMetaSchema = z.object({
	utility: shortText('Utility'),
	name: shortText('Tariff name'),
	code: optionalText('Tariff code', 40),
	country: countryCode,
	region: optionalText('State or province', 10).transform((s) => (s ? s.toUpperCase() : null)),
	area: optionalText('Area', 200),
	customerClass: z.enum(CUSTOMER_CLASSES, { error: 'Pick a customer class' }),
	currency: z
		.string({ error: 'Currency is required' })
		.trim()
		.toUpperCase()
		.regex(/^[A-Z]{3}$/, 'Currency must be a three-letter code such as USD'),
	/** An IANA name; the server checks it against the time-zone database (the core's timezoneSchema). */
	timezone: shortText('Time zone', 64),
	/** Public holidays by country/region or an explicit list; the server checks it with the core's holidaysSchema. */
	holidays: z
		.union([
			z.object({ country: z.string(), region: z.string().optional() }),
			z.object({ dates: z.array(z.string()).max(1000, 'At most 1000 holiday dates') })
		])
		.nullable()
		.default(null),
	description: optionalText('Description', 2000)
});
export type TariffMeta = z.output<typeof tariffMetaSchema>;

/** Where a version's figures came from and when they apply. A published version never changes. */
export const versionMetaSchema = z
	.object({
		effectiveFrom: isoDate('Effective from'),
		effectiveTo: isoDate('Effective to')
			.nullable()
			.optional()
			.transform((s) => s ?? null),
		source: shortText('Source', 500),
		checkedOn: isoDate('Checked on'),
		changeNote: z
			.string()
			.trim()
			.max(2000, 'Change note must be at most 2000 characters')
			.refine(storableText, UNSTORABLE)
			.default('')
	})
	.refine((v) => !v.effectiveTo || v.effectiveTo >= v.effectiveFrom, {
		path: ['effectiveTo'],
		message: 'Effective to must be on or after effective from'
	});
export type VersionMeta = z.output<typeof versionMetaSchema>;
