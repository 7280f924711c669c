import { z } from 'zod';
import {
	amount,
	equipmentSchema,
	holidaysSchema,
	list,
	storableText,
	timezoneSchema,
	UNSTORABLE
} from '$lib/calc';
import { countryCode } from '$lib/forms/place.schema';

/*
 * The home page's quick estimate, carried by a sign-up: it waits on the pending sign-up's link row
 * (`user_token.estimate`) through the e-mail confirmation and becomes the new account's first site
 * (accounts/first-site.ts). Checked with the core's schemas before it is stored and again when it is
 * read back, and capped in size, so a crafted sign-up cannot park a large or unpriceable body there.
 */

/** At most this many devices, as on the home page. */
export const MAX_KEPT_DEVICES = 8;
/** The stored estimate's JSON stays under this many characters (eight devices need about 2,000). */
export const MAX_KEPT_CHARS = 8_000;

const siteName = z
	.string({ error: 'Name the site' })
	.trim()
	.min(1, 'Name the site')
	.max(120, 'Use at most 120 characters')
	.refine(storableText, UNSTORABLE);

/** A flat price per kWh in US dollars, or a tariff of the public library by its id. */
const keptRateSchema = z.discriminatedUnion('kind', [
	z.object({
		kind: z.literal('flat'),
		perKwh: amount('The price per kWh', { min: 0, max: 1_000 }),
		perMonth: amount('The customer charge', { min: 0, max: 1_000_000 })
	}),
	z.object({ kind: z.literal('library'), tariffId: z.uuid({ error: 'Pick a tariff from the library' }) })
]);

/** The estimate as a pending sign-up stores it. */
export const keptEstimateSchema = z
	.object({
		siteName,
		country: countryCode,
		timezone: timezoneSchema,
		devices: list('Devices', equipmentSchema, { min: 1, max: MAX_KEPT_DEVICES }),
		rate: keptRateSchema
	})
	.superRefine((estimate, ctx) => {
		if (!holidaysSchema.safeParse({ country: estimate.country }).success)
			ctx.addIssue({
				code: 'custom',
				path: ['country'],
				message: 'No public-holiday calendar for this country: check the two letters (US, CA, DE…)'
			});
		if (JSON.stringify(estimate).length > MAX_KEPT_CHARS)
			ctx.addIssue({ code: 'custom', path: ['devices'], message: 'This estimate is too large to keep' });
	});

export type KeptEstimate = z.output<typeof keptEstimateSchema>;

/** A stored estimate read back: null when there is none or it no longer passes the checks. */
export function readKeptEstimate(stored: unknown): KeptEstimate | null {
	if (stored === null || stored === undefined) return null;
	const parsed = keptEstimateSchema.safeParse(stored);
	return parsed.success ? parsed.data : null;
}
