import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { apiError } from '$lib/server/http/json';
import { readJsonBody } from '$lib/server/http/body';
import { libraryPage, libraryQuerySchema, queryObject } from '$lib/server/tariffs/library';
import { submitTariff } from '$lib/server/tariffs/publish';
import type { RequestHandler } from './$types';
import { invalid } from '$lib/server/http/answers';

/** GET /api/v1/tariffs — search and filter the library (public tariffs and the caller's private ones). */
export const GET: RequestHandler = async ({ url, locals }) => {
	const parsed = libraryQuerySchema.safeParse(queryObject(url));
	if (!parsed.success)
		return apiError(
			400,
			'invalid_request',
			'Some query parameters need attention.',
			parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }))
		);
	return json(await libraryPage(locals.user?.id, parsed.data), {
		headers: { 'Cache-Control': 'private, no-store' }
	});
};

const ownerSchema = z.object({
	workspaceId: z.uuid({ error: 'workspaceId must be a workspace id, or null for a public tariff' }).nullable()
});

/** POST /api/v1/tariffs — create a tariff with its first version: `{ workspaceId, meta, version, structure }`. */
export const POST: RequestHandler = async (event) => {
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	const owner = ownerSchema.safeParse(read.body);
	if (!owner.success)
		return apiError(400, 'invalid_request', 'Say whose tariff this is.', [
			{ path: 'workspaceId', message: owner.error.issues[0]!.message }
		]);
	const outcome = await submitTariff(event, { workspaceId: owner.data.workspaceId }, read.body);
	if (outcome.ok)
		return json(
			{ id: outcome.tariffId, version: outcome.number },
			{ status: 201, headers: { Location: `/api/v1/tariffs/${outcome.tariffId}` } }
		);
	if (outcome.status === 400) return invalid(outcome.invalid.issues);
	return apiError(409, 'conflict', outcome.message);
};
