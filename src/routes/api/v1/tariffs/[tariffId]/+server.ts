import { json } from '@sveltejs/kit';
import { readJsonBody } from '$lib/server/http/body';
import { requireTariffRead } from '$lib/server/guard';
import { exportVersion } from '$lib/server/tariffs/submission';
import { submitTariff } from '$lib/server/tariffs/publish';
import type { RequestHandler } from './$types';
import { invalid } from '$lib/server/http/answers';

/** GET /api/v1/tariffs/:id — the tariff with every version, newest last, plus its revision for PUT. */
export const GET: RequestHandler = async (event) => {
	const { tariff, versions } = await requireTariffRead(event, event.params.tariffId);
	return json(
		{
			id: tariff.id,
			scope: tariff.workspaceId ? 'private' : 'public',
			workspaceId: tariff.workspaceId,
			revision: tariff.revision,
			versions: versions.map((v) => exportVersion(tariff, v))
		},
		{ headers: { 'Cache-Control': 'private, no-store' } }
	);
};

/**
 * PUT /api/v1/tariffs/:id — publish a new version: `{ expectedRevision, meta, version, structure }`.
 * A stale `expectedRevision` (someone published meanwhile) gets 409 and nothing is written.
 */
export const PUT: RequestHandler = async (event) => {
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const outcome = await submitTariff(event, { tariffId: event.params.tariffId }, read.body);
	if (outcome.ok) return json({ id: outcome.tariffId, version: outcome.number }, { status: 201 });
	if (outcome.status === 400) return invalid(outcome.invalid.issues);
	return json(
		{ error: 'conflict', message: outcome.message, currentRevision: outcome.currentRevision },
		{ status: 409 }
	);
};
