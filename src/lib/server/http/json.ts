// JSON answers of the machine API: a body encoded once, and the `{ error, message, issues }` error shape.
import { json } from '@sveltejs/kit';

/** Answers that carry one caller's data or a one-off result: never kept by a cache. */
export const NO_STORE = { 'Cache-Control': 'no-store' } as const;

/**
 * A JSON response encoded once. SvelteKit's `json()` encodes the text to count its bytes and the
 * server encodes it again to send it; for a 75 kB calculation result that is a measurable share of
 * the request.
 */
export function jsonBody(data: unknown, init: { status?: number; headers?: Record<string, string> } = {}) {
	const bytes = Buffer.from(JSON.stringify(data));
	return new Response(bytes, {
		status: init.status ?? 200,
		headers: {
			'content-type': 'application/json',
			'content-length': String(bytes.byteLength),
			...init.headers
		}
	});
}

/** The API's error answer: a machine word, a sentence for people, and field issues when there are any. */
export function apiError(
	status: number,
	error: string,
	message: string,
	issues?: { path: string; message: string }[]
) {
	return json(issues ? { error, message, issues } : { error, message }, { status, headers: NO_STORE });
}
