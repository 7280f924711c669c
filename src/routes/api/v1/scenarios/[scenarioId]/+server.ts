import { error, json, type RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { parseRequest } from '$lib/calc';
import { apiError } from '$lib/server/http/json';
import { readJsonBody } from '$lib/server/http/body';
import { requireScenarioAccess, requireSiteAccess, requireUser } from '$lib/server/guard';
import { changeScenario, findScenario, UNDO_MS, type ScenarioRow } from '$lib/server/sites/scenario.service';
import { scenarioSchema } from '$lib/forms/site.schema';
import { chooserFor } from '$lib/server/tariffs/usable';
import { invalid, methodNotAllowed, PRIVATE } from '$lib/server/http/answers';
import { tariffChoiceIssue } from '$lib/server/sites/tariff-choice';
import type { RequestHandler } from './$types';

const view = (s: ScenarioRow) => ({
	id: s.id,
	siteId: s.siteId,
	name: s.name,
	description: s.description,
	isBaseline: s.isBaseline,
	archived: !!s.archivedAt,
	tariff: s.tariffId ? { tariffId: s.tariffId, tariffVersion: s.tariffVersion } : null,
	revision: s.revision,
	updatedAt: s.updatedAt
});

const ONE_CHANGE =
	'Send one change per request: name and description, archived, baseline, restored or tariff';

/** The changes PATCH takes; the description also takes null (none). */
const changeSchema = z.strictObject({
	name: scenarioSchema.shape.name.optional(),
	description: z.preprocess((v) => (v === null ? '' : v), scenarioSchema.shape.description),
	archived: z.boolean({ error: 'archived is true or false' }).optional(),
	baseline: z
		.literal(true, { error: 'Send baseline: true; to move the baseline, make another scenario it' })
		.optional(),
	restored: z.literal(true, { error: 'Send restored: true to undo a deletion' }).optional(),
	tariff: z
		.object({
			tariffId: z.uuid({ error: 'Pick a tariff from the library' }),
			tariffVersion: z
				.number({ error: 'Pinned version must be a whole number' })
				.int('Pinned version must be a whole number')
				.min(1, 'Pinned version must be a whole number from 1')
				.nullable()
				.optional()
		})
		.nullable()
		.optional()
});

/**
 * A scenario deleted less than UNDO_MS ago, for the one request that may still reach it (the undo);
 * otherwise the usual rule, under which a deleted scenario does not exist.
 */
async function accessForUndo(event: RequestEvent, scenarioId: string) {
	const found = z.guid().safeParse(scenarioId).success ? await findScenario(scenarioId) : null;
	if (!found?.deletedAt) return requireScenarioAccess(event, scenarioId, 'editor');
	if (found.deletedAt.getTime() <= Date.now() - UNDO_MS) error(404, 'Not found');
	return { ...(await requireSiteAccess(event, found.siteId, 'editor')), scenario: found };
}

/** GET /api/v1/scenarios/:id — the scenario, with its tariff override (null: the site's tariff). */
export const GET: RequestHandler = async (event) => {
	const { scenario } = await requireScenarioAccess(event, event.params.scenarioId, 'viewer');
	return json(view(scenario), { headers: PRIVATE });
};

/**
 * PATCH — one change: `{ name?, description? }`, `{ archived: true|false }`, `{ baseline: true }`,
 * `{ tariff: { tariffId, tariffVersion? } | null }`, or `{ restored: true }` within the undo window of a
 * DELETE. Answers the scenario as it now is.
 */
export const PATCH: RequestHandler = async (event) => {
	requireUser(event);
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const raw = read.body as Record<string, unknown> | null;
	const access =
		raw && typeof raw === 'object' && raw.restored === true
			? await accessForUndo(event, event.params.scenarioId)
			: await requireScenarioAccess(event, event.params.scenarioId, 'editor');
	const { site, scenario, user } = access;
	const parsed = parseRequest(changeSchema, raw);
	if (!parsed.success) return invalid(parsed.error.issues);
	const change = parsed.data;
	const has = (key: string) => Object.hasOwn(raw!, key);
	const kinds = [
		has('name') || has('description'),
		...['archived', 'baseline', 'restored', 'tariff'].map(has)
	];
	if (kinds.filter(Boolean).length !== 1) return invalid([{ path: '', message: ONE_CHANGE }]);

	if (change.restored) {
		if (!scenario.deletedAt) return apiError(409, 'not_deleted', 'This scenario is not deleted.');
		await changeScenario(site, scenario, { kind: 'restore' }, user);
	} else if (change.archived !== undefined) {
		await changeScenario(site, scenario, { kind: change.archived ? 'archive' : 'unarchive' }, user);
	} else if (change.baseline) {
		if (scenario.archivedAt)
			return invalid([{ path: 'baseline', message: 'Bring the scenario back from the archive first' }]);
		await changeScenario(site, scenario, { kind: 'baseline' }, user);
	} else if (change.tariff !== undefined) {
		const choice = {
			tariffId: change.tariff?.tariffId ?? null,
			tariffVersion: change.tariff?.tariffVersion ?? null
		};
		const issue = await tariffChoiceIssue(chooserFor(access, scenario), choice, 'tariff.');
		if (issue) return invalid([issue]);
		await changeScenario(site, scenario, { kind: 'tariff', ...choice }, user);
	} else {
		const name = change.name ?? scenario.name;
		const description = has('description') ? change.description : scenario.description;
		await changeScenario(site, scenario, { kind: 'rename', name, description }, user);
	}
	const now = await findScenario(scenario.id);
	return json(view(now!), { status: 200 });
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
