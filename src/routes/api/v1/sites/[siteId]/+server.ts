import { json } from '@sveltejs/kit';
import { parseRequest } from '$lib/calc';
import { readJsonBody } from '$lib/server/http/body';
import { requireSiteAccess } from '$lib/server/guard';
import { changeSite } from '$lib/server/sites/site.service';
import { siteUpdateSchema, withoutNulls } from '$lib/server/sites/site-body';
import { invalid, methodNotAllowed, PRIVATE, refusal } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/** GET /api/v1/sites/:id — the site with its water (altitude, tanks), and the revision to send back when updating it. */
export const GET: RequestHandler = async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	return json(site, { headers: PRIVATE });
};

/**
 * PUT /api/v1/sites/:id `{ expectedRevision, …site, water? }` — replaces the site's fields (a field left
 * out is cleared, as in the form), except `water`: sent, it replaces the altitude and every tank (this and
 * POST are how a site's water from an export comes back in); left out or null, the stored water stays.
 * A stale `expectedRevision` gets 409 and nothing is written.
 */
export const PUT: RequestHandler = async (event) => {
	const access = await requireSiteAccess(event, event.params.siteId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(siteUpdateSchema, withoutNulls(read.body));
	if (!parsed.success) return invalid(parsed.error.issues);
	const { expectedRevision, ...input } = parsed.data;
	const saved = await changeSite(access, expectedRevision, input);
	if (!saved.ok) return refusal(saved);
	return json({ revision: saved.revision }, { status: 200 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT');
