import { error, redirect } from '@sveltejs/kit';
import { requireAttachmentAccess } from '$lib/server/bills/attachments-access';
import {
	ATTACHMENT_EXTENSIONS,
	readAttachment,
	removeAttachment,
	type AttachmentType
} from '$lib/server/bills/attachments';
import { safeFileName } from '$lib/server/exports/download';
import { apiError } from '$lib/server/http/json';
import { logger } from '$lib/server/log';
import { methodNotAllowed } from '$lib/server/http/answers';
import type { RequestHandler } from './$types';

/** `filename` in ASCII for every browser, `filename*` (RFC 6266 / 5987) with the name as uploaded. */
function disposition(kind: 'inline' | 'attachment', fileName: string, type: AttachmentType) {
	const ext = ATTACHMENT_EXTENSIONS[type];
	const stem = fileName.replace(/\.[^.]*$/, '');
	const utf8 = encodeURIComponent(`${stem}.${ext}`).replace(
		/['()*]/g,
		(c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`
	);
	return `${kind}; filename="${safeFileName(stem)}.${ext}"; filename*=UTF-8''${utf8}`;
}

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
	const type = read.attachment.contentType;
	const kind = event.url.searchParams.get('download') === '1' ? 'attachment' : 'inline';
	return new Response(read.object.body, {
		headers: {
			'Content-Type': type,
			'Content-Length': String(read.object.bytes),
			'Content-Disposition': disposition(kind, read.attachment.fileName, type),
			'Cache-Control': 'private, no-store',
			'X-Content-Type-Options': 'nosniff',
			'Content-Security-Policy': 'sandbox'
		}
	});
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
