import { MAX_USAGE_BYTES } from './read-usage';

/**
 * The bytes of a usage upload: the multipart field `file` (the page's form and API callers), or for
 * the API the file itself as the body with Content-Type application/xml, text/xml or text/csv.
 */

export type Upload =
	{ ok: true; bytes: Uint8Array } | { ok: false; status: 400 | 413 | 415; message: string };

// A multipart body carries the file plus its part headers and boundaries: a few hundred bytes.
const MULTIPART_ALLOWANCE = 64 * 1024;
const RAW_TYPES = ['application/xml', 'text/xml', 'text/csv'];

const TOO_LARGE: Upload = {
	ok: false,
	status: 413,
	message: 'The file is over 10 MB. Download a shorter stretch of time, a year or less, and import it.'
};
export const CHOOSE_FILE = 'Choose a Green Button XML file or a timestamp,kWh CSV sheet.';

/**
 * A raw body counted as it arrives, whatever Content-Length claimed. Past the limit the rest is read
 * and dropped rather than cut off, so the 413 reaches the caller instead of a reset connection; the
 * server's own BODY_SIZE_LIMIT bounds how much that can be.
 */
async function readRaw(request: Request): Promise<Upload> {
	const reader = request.body?.getReader();
	if (!reader) return { ok: false, status: 400, message: CHOOSE_FILE };
	const chunks: Uint8Array[] = [];
	let size = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) break;
			size += value.byteLength;
			if (size <= MAX_USAGE_BYTES) chunks.push(value);
		}
	} catch (error) {
		if ((error as { status?: number }).status === 413) return TOO_LARGE;
		return { ok: false, status: 400, message: 'The upload broke off before the whole file arrived.' };
	}
	if (size > MAX_USAGE_BYTES) return TOO_LARGE;
	return { ok: true, bytes: new Uint8Array(Buffer.concat(chunks)) };
}

export async function readUsageUpload(request: Request, { rawBody }: { rawBody: boolean }): Promise<Upload> {
	const declared = Number(request.headers.get('content-length') ?? 0);
	if (declared > MAX_USAGE_BYTES + MULTIPART_ALLOWANCE) return TOO_LARGE;
	const type = (request.headers.get('content-type') ?? '').split(';')[0]!.trim().toLowerCase();
	if (rawBody && RAW_TYPES.includes(type)) return readRaw(request);
	if (type !== 'multipart/form-data')
		return {
			ok: false,
			status: 415,
			message:
				'Send multipart/form-data with the file in the field "file", or the file itself as application/xml, text/xml or text/csv.'
		};
	let form: FormData;
	try {
		form = await request.formData();
	} catch (error) {
		// SvelteKit stops a body past BODY_SIZE_LIMIT that did not declare its length.
		if ((error as { status?: number }).status === 413) return TOO_LARGE;
		return { ok: false, status: 400, message: CHOOSE_FILE };
	}
	const file = form.get('file');
	if (!(file instanceof File) || (file.size === 0 && file.name === ''))
		return { ok: false, status: 400, message: CHOOSE_FILE };
	if (file.size > MAX_USAGE_BYTES) return TOO_LARGE;
	return { ok: true, bytes: new Uint8Array(await file.arrayBuffer()) };
}
