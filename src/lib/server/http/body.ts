// Reading a request's JSON body within a size limit.
import type { RequestEvent } from '@sveltejs/kit';
import { apiError } from './json';

/** The largest JSON body any endpoint reads: 1 MB. */
export const MAX_BODY_BYTES = 1024 * 1024;

/**
 * Reads a JSON body of at most `maxBytes` (1 MB unless an endpoint says otherwise) without trusting
 * Content-Length: the stream is counted as it arrives and abandoned past the limit.
 */
export async function readJsonBody(
	event: RequestEvent,
	maxBytes = MAX_BODY_BYTES
): Promise<{ ok: true; body: unknown } | { ok: false; response: Response }> {
	const tooLarge = () => apiError(413, 'payload_too_large', `The body is over ${maxBytes / 1024 / 1024} MB.`);
	const declared = Number(event.request.headers.get('content-length') ?? 0);
	if (declared > maxBytes) return { ok: false, response: tooLarge() };
	const reader = event.request.body?.getReader();
	if (!reader) return { ok: false, response: apiError(400, 'invalid_json', 'Send a JSON body.') };
	const chunks: Uint8Array[] = [];
	let size = 0;
	for (;;) {
		const { done, value } = await reader.read();
		if (done) break;
		size += value.byteLength;
		if (size > maxBytes) {
			// Not cancelled: cancelling SvelteKit's body stream destroys the request, and the client, still
			// sending, gets a reset connection instead of this answer. The hooks read and drop the rest.
			reader.releaseLock();
			return { ok: false, response: tooLarge() };
		}
		chunks.push(value);
	}
	const text = new TextDecoder().decode(Buffer.concat(chunks));
	try {
		return { ok: true, body: JSON.parse(text) };
	} catch {
		return { ok: false, response: apiError(400, 'invalid_json', 'The body is not valid JSON.') };
	}
}
