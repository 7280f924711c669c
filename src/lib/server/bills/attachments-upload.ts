import type { RequestEvent } from '@sveltejs/kit';
import type { Actor } from '../workspaces/audit';
import { addAttachment, type AttachmentSummary } from './attachments';
import { MAX_ATTACHMENT_BYTES, refuseBySize, type UploadRefusal } from './attachments-check';

export type UploadOutcome =
	| { ok: true; attachment: AttachmentSummary }
	| { ok: false; status: 400 | 413; reason: UploadRefusal['reason'] | 'missing'; message: string };

// A multipart body carries the file plus its part headers and boundaries: a few hundred bytes.
const MULTIPART_ALLOWANCE = 64 * 1024;

const tooLarge = (message: string): UploadOutcome => ({
	ok: false,
	status: 413,
	reason: 'too-large',
	message
});
const LIMIT_WORDS =
	'The file is over the 10 MB an attachment may have. A photo at a lower resolution will do.';

/**
 * Reads the multipart field `file` of an upload (the API's and the bill page's) and attaches it to the
 * bill: 413 past 10 MB (refused from Content-Length before the body is read when it says so), 400 with
 * the reason for anything else checkUpload refuses.
 */
export async function receiveUpload(
	event: RequestEvent,
	target: { site: { id: string; workspaceId: string }; bill: { id: string }; user: Actor }
): Promise<UploadOutcome> {
	const declared = Number(event.request.headers.get('content-length') ?? 0);
	if (declared > MAX_ATTACHMENT_BYTES + MULTIPART_ALLOWANCE) return tooLarge(LIMIT_WORDS);
	let form: FormData;
	try {
		form = await event.request.formData();
	} catch (error) {
		// SvelteKit stops a body past BODY_SIZE_LIMIT that did not declare its length.
		if ((error as { status?: number }).status === 413) return tooLarge(LIMIT_WORDS);
		form = new FormData();
	}
	const file = form.get('file');
	if (!(file instanceof File))
		return {
			ok: false,
			status: 400,
			reason: 'missing',
			message: 'Choose the bill’s PDF or photo (send it as multipart/form-data, field "file").'
		};
	const bySize = refuseBySize(file.size, file.name);
	if (bySize?.reason === 'too-large') return tooLarge(bySize.message);
	const result = await addAttachment(
		target.site,
		target.bill.id,
		{ bytes: new Uint8Array(await file.arrayBuffer()), name: file.name },
		target.user
	);
	if ('message' in result) return { ok: false, status: result.reason === 'too-large' ? 413 : 400, ...result };
	return { ok: true, attachment: result.attachment };
}
