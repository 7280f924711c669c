import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { holidaysSchema, parseRequest, timezoneSchema } from '$lib/calc';
import { readJsonBody } from '$lib/server/http/body';
import { requireSiteAccess } from '$lib/server/guard';
import { findSite, StaleWrite, updateSite } from '$lib/server/sites/site.service';
import { siteSchema } from '$lib/forms/site.schema';
import { chooserFor } from '$lib/server/tariffs/usable';
import { conflict, invalid, methodNotAllowed, PRIVATE } from '$lib/server/http/answers';
import { tariffChoiceIssue } from '$lib/server/sites/tariff-choice';
import type { RequestHandler } from './$types';
import { MAX_REVISION } from '$lib/forms/storable';

/** The site form's schema with the server's checks (as POST /api/v1/sites), plus the revision edited. */
const siteUpdateSchema = siteSchema
	.extend({
		timezone: timezoneSchema,
		expectedRevision: z
			.number({ error: 'Send the revision you edited (expectedRevision)' })
			.int()
			.min(0)
			.max(MAX_REVISION)
	})
	.superRefine((s, ctx) => {
		// Zod runs this even when the country failed its own check; one issue per mistake is enough.
		if (!/^[A-Z]{2}$/.test(s.country)) return;
		if (!holidaysSchema.safeParse({ country: s.country, ...(s.region ? { region: s.region } : {}) }).success)
			ctx.addIssue({
				code: 'custom',
				path: [s.region ? 'region' : 'country'],
				message: 'No public-holiday calendar for this country or region'
			});
	});

// JSON callers say "none" with null; the form's schema knows it as a missing or empty field.
const withoutNulls = (body: unknown) =>
	body && typeof body === 'object' && !Array.isArray(body)
		? Object.fromEntries(Object.entries(body).filter(([, v]) => v !== null))
		: body;

/** GET /api/v1/sites/:id — the site, with the revision to send back when updating it. */
export const GET: RequestHandler = async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return json(site, { headers: PRIVATE });
};

/**
 * PUT /api/v1/sites/:id `{ expectedRevision, …site }` — replaces the site's fields (a field left out is
 * cleared, as in the form). A stale `expectedRevision` gets 409 and nothing is written.
 */
export const PUT: RequestHandler = async (event) => {
	const access = await requireSiteAccess(event, event.params.siteId, 'editor');
	const { site, user } = access;
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(siteUpdateSchema, withoutNulls(read.body));
	if (!parsed.success) return invalid(parsed.error.issues);
	const { expectedRevision, ...input } = parsed.data;
	const tariffIssue = await tariffChoiceIssue(chooserFor(access), input);
	if (tariffIssue) return invalid([tariffIssue]);
	// Checked here as well as in the write, so the new revision is always the one after the caller's.
	if (expectedRevision !== site.revision) return conflict(site.revision);
	try {
		await updateSite(site, expectedRevision, input, user);
	} catch (e) {
		if (e instanceof StaleWrite) return conflict((await findSite(site.id))?.revision ?? e.currentRevision);
		throw e;
	}
	return json({ revision: site.revision + 1 }, { status: 200 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT');
