// Over 60 lines: GET, PATCH (with the one door a deleted scenario keeps, for its undo), DELETE and the
// fallback of one resource.
import { error, json, type RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { apiError } from '$lib/server/http/json';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess, requireSiteAccess, requireUser } from '$lib/server/guard';
import {
	asksToRestore,
	changeScenario,
	findScenario,
	patchScenario,
	undoWindowOpen,
	scenarioJson,
	UNDO_MS
} from '$lib/server/sites/scenario.service';
import { conflict, invalid, methodNotAllowed, PRIVATE } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/**
 * A scenario deleted less than UNDO_MS ago, for the one request that may still reach it (the undo);
 * otherwise the usual rule, under which a deleted scenario does not exist.
 */
async function accessForUndo(event: RequestEvent, scenarioId: string) {
	const found = z.guid().safeParse(scenarioId).success ? await findScenario(scenarioId) : null;
	if (!found?.deletedAt) return requireScenarioAccess(event, scenarioId, 'editor');
	if (!undoWindowOpen(found.deletedAt)) error(404, 'Not found');
	return { ...(await requireSiteAccess(event, found.siteId, 'editor')), scenario: found };
}

/**
 * GET /api/v1/scenarios/:id — the scenario: its status ('installed': already paid for; 'proposed': bought
 * now), one-off costs, and tariff override (null: the site's tariff).
 */
export const GET: RequestHandler = async (event) => {
	const { scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	return json(scenarioJson(scenario), { headers: PRIVATE });
};

/**
 * PATCH — one change: the details `{ name?, description?, status?, oneOffCosts? }`, `{ archived:
 * true|false }`, `{ baseline: true }`, `{ tariff: { tariffId, tariffVersion? } | null }`, or `{ restored:
 * true }` within the undo window of a DELETE. The details and the tariff take `expectedRevision`: when
 * someone saved since, 409 with the current revision. Answers the scenario as it now is.
 */
export const PATCH: RequestHandler = async (event) => {
	requireUser(event);
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const access = asksToRestore(read.body)
		? await accessForUndo(event, event.params.scenarioId)
		: await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const refused = await patchScenario(access, read.body);
	if (refused && 'notDeleted' in refused)
		return apiError(409, 'not_deleted', 'This scenario is not deleted.');
	if (refused && 'conflict' in refused) return conflict(refused.conflict);
	if (refused) return invalid(refused.issues);
	const now = await findScenario(access.scenario.id);
	return json(scenarioJson(now!), { status: 200 });
};

/**
 * DELETE — a soft delete: the scenario leaves the API at once, and `PATCH { restored: true }` brings it
 * back until `undoUntil`.
 */
export const DELETE: RequestHandler = async (event) => {
	const { site, scenario, user } = await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	// Taken before the write, so the promise is never later than the window the write opens.
	const undoUntil = new Date(Date.now() + UNDO_MS).toISOString();
	await changeScenario(site, scenario, { kind: 'delete' }, user);
	return json({ undoUntil }, { status: 200 });
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'PATCH', 'DELETE');
