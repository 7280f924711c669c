import { json, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import { NoVersionInForce, parseRequest, type DatedTariff } from '$lib/calc';
import { resolveTariffId } from './tariffs/by-id';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { PerClient } from './rate-limit-client';
import { env } from '$env/dynamic/private';
import { logger } from './log';

export const MAX_BODY_BYTES = 1024 * 1024;

const NO_STORE = { 'Cache-Control': 'no-store' };

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

export function apiError(
	status: number,
	error: string,
	message: string,
	issues?: { path: string; message: string }[]
) {
	return json(issues ? { error, message, issues } : { error, message }, { status, headers: NO_STORE });
}

/**
 * Reads a JSON body of at most 1 MB without trusting Content-Length: the stream is counted as it
 * arrives and abandoned past the limit.
 */
export async function readJsonBody(
	event: RequestEvent
): Promise<{ ok: true; body: unknown } | { ok: false; response: Response }> {
	const declared = Number(event.request.headers.get('content-length') ?? 0);
	if (declared > MAX_BODY_BYTES)
		return { ok: false, response: apiError(413, 'payload_too_large', 'The body is over 1 MB.') };
	const reader = event.request.body?.getReader();
	if (!reader) return { ok: false, response: apiError(400, 'invalid_json', 'Send a JSON body.') };
	const chunks: Uint8Array[] = [];
	let size = 0;
	for (;;) {
		const { done, value } = await reader.read();
		if (done) break;
		size += value.byteLength;
		if (size > MAX_BODY_BYTES) {
			// Not cancelled: cancelling SvelteKit's body stream destroys the request, and the client, still
			// sending, gets a reset connection instead of this answer. The hooks read and drop the rest.
			reader.releaseLock();
			return { ok: false, response: apiError(413, 'payload_too_large', 'The body is over 1 MB.') };
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

// Anonymous callers (the public quick estimate, outside tools) share a per-client budget; signed-in
// users get a larger one.
const anonymousLimiter = new RateLimiter({ IP: [120, 'm'], plugins: [new PerClient([60, 'm'])] });
// MEMBER_REQUESTS_PER_MINUTE lifts the members' budget for a load test on loopback (npm run load).
const memberLimiter = new RateLimiter({ IP: [Number(env.MEMBER_REQUESTS_PER_MINUTE ?? 600), 'm'] });

/**
 * The shape every calculation endpoint shares: rate limit, bounded JSON body, zod validation with
 * field paths (400), then the pure core. The core never sees unvalidated input.
 */
export async function calculationEndpoint<S extends z.ZodType, R>(
	event: RequestEvent,
	schema: S,
	run: (input: z.output<S>, versions: DatedTariff[] | null) => R
) {
	const limiter = event.locals.user ? memberLimiter : anonymousLimiter;
	if (await limiter.isLimited(event))
		return json(
			{ error: 'rate_limited', message: 'Too many requests. Wait a minute and try again.' },
			{ status: 429, headers: { 'Retry-After': '60' } }
		);
	const read = await readJsonBody(event);
	if (!read.ok) return read.response;
	let body = read.body;
	let versions: DatedTariff[] | null = null;
	if (body && typeof body === 'object' && !Array.isArray(body) && 'tariffId' in body && !('tariff' in body))
		({ body, versions } = await resolveTariffId(event, body as Record<string, unknown>));
	const parsed = parseRequest(schema, body);
	if (!parsed.success)
		return json(
			{ ...parsed.error, message: 'Some fields need attention.' },
			{ status: 400, headers: NO_STORE }
		);
	try {
		return jsonBody(run(parsed.data, versions), { headers: NO_STORE });
	} catch (error) {
		if (error instanceof NoVersionInForce)
			return apiError(400, 'invalid_request', error.message, [{ path: 'period', message: error.message }]);
		// Validation should make this unreachable; if it is reached, answer in the API's own terms and log it.
		logger.error({ err: error, path: event.url.pathname }, 'calculation failed on validated input');
		return apiError(422, 'calculation_failed', 'This request passed validation but could not be calculated.');
	}
}
