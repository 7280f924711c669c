// The machine API's site bodies: the site form's schema with the server's checks.
import { z } from 'zod';
import { holidaysSchema, siteWaterSchema, timezoneSchema } from '$lib/calc';
import { siteSchema } from '$lib/forms/site.schema';
import { MAX_REVISION } from '$lib/forms/storable';

/** Marks the country (or the region, when given) that the holiday calendar does not know. */
function checkHolidays(s: { country: string; region?: string | null }, ctx: z.RefinementCtx) {
	if (!holidaysSchema.safeParse({ country: s.country, ...(s.region ? { region: s.region } : {}) }).success)
		ctx.addIssue({
			code: 'custom',
			path: [s.region ? 'region' : 'country'],
			message: 'No public-holiday calendar for this country or region'
		});
}

/** The site's water (altitude, tanks and ponds), optional on POST and PUT: see `SiteFields`. */
const water = siteWaterSchema.optional();

/** POST /api/v1/sites: the site form's fields, a real time zone and a known holiday calendar. */
export const siteCreateSchema = siteSchema
	.extend({ timezone: timezoneSchema, water })
	.superRefine(checkHolidays);

/** PUT /api/v1/sites/:id: as POST, plus the revision edited. */
export const siteUpdateSchema = siteSchema
	.extend({
		timezone: timezoneSchema,
		water,
		expectedRevision: z
			.number({ error: 'Send the revision you edited (expectedRevision)' })
			.int()
			.min(0)
			.max(MAX_REVISION)
	})
	.superRefine((s, ctx) => {
		// Zod runs this even when the country failed its own check; one issue per mistake is enough.
		if (/^[A-Z]{2}$/.test(s.country)) checkHolidays(s, ctx);
	});

/** JSON callers say "none" with null; the form's schema knows it as a missing or empty field. */
export const withoutNulls = (body: unknown) =>
	body && typeof body === 'object' && !Array.isArray(body)
		? Object.fromEntries(Object.entries(body).filter(([, v]) => v !== null))
		: body;
