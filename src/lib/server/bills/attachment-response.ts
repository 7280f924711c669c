// A stored bill attachment as an HTTP answer: typed as checked at upload, never sniffed, sandboxed.
import { safeFileName } from '../exports/download';
import { ATTACHMENT_EXTENSIONS, type AttachmentType, type readAttachment } from './attachments';

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
 * The attachment's bytes, shown (`inline`) or saved (`attachment`). The sandbox policy keeps anything the
 * file might run out of Runrate's origin; nobody but the caller keeps a copy.
 */
export function attachmentResponse(
	read: NonNullable<Awaited<ReturnType<typeof readAttachment>>>,
	kind: 'inline' | 'attachment'
) {
	const type = read.attachment.contentType;
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
}
