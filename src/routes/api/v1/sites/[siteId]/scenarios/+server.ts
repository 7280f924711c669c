import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { readJsonBody } from '$lib/server/http/body';
import { requireSiteAccess } from '$lib/server/guard';
import { createScenario, listScenarios } from '$lib/server/sites/scenario.service';
import { scenarioSchema } from '$lib/forms/site.schema';
import { statusSchema } from '$lib/server/sites/scenario-details.schema';
import type { RequestHandler } from './$types';
import { invalid } from '$lib/server/http/answers';

/** GET — the site's live and archived scenarios (deleted ones are gone from the API at once). */
export const GET: RequestHandler = async (event) => {
	const { site } = await requireSiteAccess(event, event.params.siteId, 'viewer');
	const scenarios = (await listScenarios(site.id)).filter((s) => !s.deletedAt);
	return json(
		{
			scenarios: scenarios.map((s) => ({
				id: s.id,
				name: s.name,
				description: s.description,
				isBaseline: s.isBaseline,
				status: s.status,
				oneOffCosts: s.oneOffCosts,
				archived: !!s.archivedAt,
				revision: s.revision
			}))
		},
		{ headers: { 'Cache-Control': 'private, no-store' } }
	);
};

/**
 * POST `{ name, description?, status?, fromScenarioId? }` — a blank scenario or a duplicate; `status` is
 * 'proposed' (bought now) unless it says 'installed' (already paid for).
 */
export const POST: RequestHandler = async (event) => {
	const { site, user } = await requireSiteAccess(event, event.params.siteId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = scenarioSchema
		.extend({ fromScenarioId: z.uuid().optional(), status: statusSchema.optional() })
		.safeParse(read.body);
	if (!parsed.success)
		return invalid(parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })));
	const from = parsed.data.fromScenarioId;
	if (from && !(await listScenarios(site.id)).some((s) => s.id === from))
		return invalid([{ path: 'fromScenarioId', message: 'Not a scenario of this site' }]);
	const id = await createScenario(
		site,
		{ name: parsed.data.name, description: parsed.data.description, status: parsed.data.status },
		from ?? null,
		user
	);
	return json({ id }, { status: 201 });
};
