import type { RequestEvent } from '@sveltejs/kit';
import { createHash } from 'node:crypto';
import type { Rate, RateLimiterPlugin } from 'sveltekit-rate-limiter/server';

/** The client a request comes from: its address and its User-Agent, a missing one counting as empty. */
export function clientId(event: RequestEvent): string {
	return `client:${event.getClientAddress()}|${event.request.headers.get('user-agent') ?? ''}`;
}

/**
 * Counts requests per client (IP + User-Agent). Use it instead of the library's built-in `IPUA` rate,
 * which answers "limited" for every request without a User-Agent: one such wrong password locked an
 * address for 15 minutes, and every anonymous API call or sign-up without one got 429. Here a missing
 * User-Agent is just another client, counted like the rest.
 */
export class PerClient<Extra = never> implements RateLimiterPlugin<Extra> {
	constructor(readonly rate: Rate | Rate[]) {}
	hash(event: RequestEvent) {
		return clientId(event);
	}
}

/** Counts a signed-in person's requests, wherever they come from (the guard refuses anyone else first). */
export class PerUser<Extra = never> implements RateLimiterPlugin<Extra> {
	constructor(readonly rate: Rate | Rate[]) {}
	hash(event: RequestEvent) {
		return event.locals.user ? `user:${event.locals.user.id}` : false;
	}
}

/**
 * The limiters' key hash: SHA-256 in hex, as the library's own, but synchronous (node:crypto). The
 * library's WebCrypto digest cost 0.3–0.6 ms of CPU per anonymous API request (two keys, each through a
 * promise and an encoder), measured with `scripts/profile-request.mjs`; the keys it writes are the same.
 */
export const keyHash = (key: string): string => createHash('sha256').update(key).digest('hex');
