import { error, redirect } from '@sveltejs/kit';
import { requireAttachmentAccess } from '$lib/server/bills/attachments-access';
import { readAttachment, removeAttachment } from '$lib/server/bills/attachments';
import { attachmentResponse } from '$lib/server/bills/attachment-response';
import { apiError } from '$lib/server/http/json';
import { logger } from '$lib/server/log';
import { methodNotAllowed } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/**
 * GET — the checked proxy: only someone who may read the site gets the bytes, typed as they were
 * checked at upload and never sniffed. `?download=1` saves instead of showing. The sandbox policy
 * keeps anything the file might run out of Runrate's origin.
 */
export const GET: RequestHandler = async (event) => {
	const { attachment } = await requireAttachmentAccess(event, event.params, 'viewer');
	const read = await readAttachment(attachment.id);
	if (!read) {
		logger.error({ attachmentId: attachment.id }, 'a bill attachment has a row but no stored object');
		error(404, 'Not found');
	}
	const kind = event.url.searchParams.get('download') === '1' ? 'attachment' : 'inline';
	return attachmentResponse(read, kind);
};

/** DELETE — removes the attachment (row and stored object): 204. */
export const DELETE: RequestHandler = async (event) => {
	const { site, user, attachment } = await requireAttachmentAccess(event, event.params, 'editor');
	await removeAttachment(site, attachment.id, user);
	return new Response(null, { status: 204 });
};

/** POST — the delete button of the bill page without JavaScript: removes it and goes back (303). */
export const POST: RequestHandler = async (event) => {
	const { site, user, attachment } = await requireAttachmentAccess(event, event.params, 'editor');
	const form = await event.request.formData().catch(() => new FormData());
	if (form.get('intent') !== 'delete')
		return apiError(400, 'invalid_request', 'Send intent=delete to remove this attachment.');
	await removeAttachment(site, attachment.id, user);
	redirect(303, `/sites/${event.params.siteId}/bills/${event.params.billId}#attachments`);
};

export const fallback: RequestHandler = () => methodNotAllowed('GET', 'DELETE', 'POST');
