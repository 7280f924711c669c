import type { Handle } from '@sveltejs/kit';

/** The `error` word of the API's `{ error, message }` answers, by status. */
const ERROR_WORDS: Record<number, string> = {
	400: 'invalid_request',
	401: 'unauthorized',
	403: 'forbidden',
	404: 'not_found',
	405: 'method_not_allowed',
	409: 'conflict',
	413: 'payload_too_large',
	415: 'unsupported_media_type',
	422: 'unprocessable',
	429: 'rate_limited',
	503: 'unavailable'
};

const MESSAGES: Record<number, string> = {
	400: 'The request could not be read.',
	401: 'Sign in first.',
	403: 'You may not do this.',
	404: 'Not found',
	413: 'The body is too large.',
	415: 'This kind of body is not accepted here.',
	429: 'Too many requests. Wait a minute and try again.',
	503: 'The service is not answering. Try again in a moment.'
};

const errorWord = (status: number) => ERROR_WORDS[status] ?? (status >= 500 ? 'server_error' : 'error');

/** The message of a JSON error body, if it is one; the whole body when it already is an API error. */
async function jsonErrorOf(response: Response): Promise<{ api: boolean; message?: string }> {
	try {
		const body: unknown = await response.clone().json();
		if (!body || typeof body !== 'object') return { api: false };
		const { error, message } = body as { error?: unknown; message?: unknown };
		return {
			api: typeof error === 'string' && typeof message === 'string',
			message: typeof message === 'string' ? message : undefined
		};
	} catch {
		return { api: false };
	}
}

/** The plain-words message for a status SvelteKit answered itself (a 405 names the methods it allows). */
function defaultMessage(status: number, allow: string | null): string {
	if (status === 405 && allow) {
		const methods = allow.split(/,\s*/).filter(Boolean);
		const words = methods.length > 1 ? `${methods.slice(0, -1).join(', ')} or ${methods.at(-1)}` : methods[0];
		return `Use ${words}.`;
	}
	return (
		MESSAGES[status] ?? (status >= 500 ? 'Something went wrong on our side.' : 'The request was refused.')
	);
}

/**
 * Every answer of the machine API at or above 400 is JSON `{ error, message }` (the shape of
 * `apiError()`), whatever the caller's Accept header. SvelteKit renders an `error()` thrown by an
 * endpoint or the guard as an HTML page unless the caller asks for JSON, and answers an unknown method
 * or route in plain text; an API client parsing the body would choke on either. The answer keeps the
 * headers it had (Allow, Retry-After); the security headers are set by the hook around this one.
 */
export const apiJsonErrors: Handle = async ({ event, resolve }) => {
	if (!event.url.pathname.startsWith('/api/')) return resolve(event);
	// Read as a JSON client, SvelteKit keeps the guard's own message ("This needs the editor role…").
	try {
		event.request.headers.set('accept', 'application/json');
	} catch {
		// Immutable headers: the HTML or text answer is replaced below with the status's own message.
	}
	const response = await resolve(event);
	if (response.status < 400) return response;
	const type = response.headers.get('content-type') ?? '';
	const found = type.includes('application/json') ? await jsonErrorOf(response) : { api: false };
	if (found.api) return response;
	const body = JSON.stringify({
		error: errorWord(response.status),
		message: found.message ?? defaultMessage(response.status, response.headers.get('allow'))
	});
	const headers = new Headers(response.headers);
	headers.set('content-type', 'application/json');
	headers.set('content-length', String(Buffer.byteLength(body)));
	if (!headers.has('cache-control')) headers.set('cache-control', 'no-store');
	return new Response(body, { status: response.status, headers });
};
