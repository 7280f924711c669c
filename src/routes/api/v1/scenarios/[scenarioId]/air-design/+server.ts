import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { airDesignSchema, parseRequest } from '$lib/calc';
import { MAX_REVISION } from '$lib/forms/storable';
import { requireScenarioAccess } from '$lib/server/guard';
import { invalid, methodNotAllowed, PRIVATE, refusal } from '$lib/server/http/answers';
import { readJsonBody } from '$lib/server/http/body';
import { saveAirDesign, workOut } from '$lib/server/sites/air-design.service';
import type { RequestHandler } from './$types';

const putSchema = z.object({
	expectedRevision: z
		.number({ error: 'Send the revision you edited (expectedRevision)' })
		.int()
		.min(0)
		.max(MAX_REVISION),
	design: airDesignSchema
});

/** GET — the scenario's saved air design (null when none) and its figures in the site's water. */
export const GET: RequestHandler = async (event) => {
	const { scenario, site } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	const design = scenario.airDesign ?? null;
	// The core works any stored design out in any water (a tank gone falls back to fresh water at 20 °C).
	const result = design ? workOut(site, design) : null;
	return json({ revision: scenario.revision, design, result }, { headers: PRIVATE });
};

/**
 * PUT `{ expectedRevision, design }` — saves the design and puts its air pumps in the equipment list (one
 * row, replaced on each save). A stale revision gets 409 and nothing is written.
 */
export const PUT: RequestHandler = async (event) => {
	const access = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const parsed = parseRequest(putSchema, read.body);
	if (!parsed.success) return invalid(parsed.error.issues);
	const saved = await saveAirDesign(access, parsed.data.expectedRevision, parsed.data.design);
	if (!saved.ok)
		return refusal(
			'issues' in saved
				? { issues: saved.issues.map((i) => ({ ...i, path: i.path ? `design.${i.path}` : 'design' })) }
				: saved
		);
	return json({ revision: saved.revision, device: saved.device, result: saved.result }, { status: 200 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PUT');
