import { json } from '@sveltejs/kit';
import { requireAdmin } from '$lib/server/guard';
import { apiError, NO_STORE } from '$lib/server/http/json';
import { isUploadId, MAX_PARTS, PART_BYTES, putPart } from '$lib/server/tariffs/bulk/bulk-upload';
import { readPartBody } from '$lib/server/tariffs/bulk/part-body';
import type { RequestHandler } from './$types';

/** One part of a bulk rate file, stored as it comes (the admin page sends a big file in parts). */
export const PUT: RequestHandler = async (event) => {
	requireAdmin(event);
	const { uploadId } = event.params;
	const part = Number(event.params.part);
	if (!isUploadId(uploadId) || !/^\d{1,4}$/.test(event.params.part) || part >= MAX_PARTS)
		return apiError(404, 'not_found', 'Not found');
	const body = await readPartBody(event.request);
	if (body === 'too-large')
		return apiError(413, 'payload_too_large', `A part is at most ${PART_BYTES / 1024 / 1024} MB.`);
	if (body === 'empty') return apiError(400, 'empty_part', 'The part is empty.');
	if (body === 'broken') return apiError(400, 'broken_upload', 'The part broke off before it all arrived.');
	await putPart(uploadId, part, body);
	return json({ part, bytes: body.byteLength }, { status: 201, headers: NO_STORE });
};
