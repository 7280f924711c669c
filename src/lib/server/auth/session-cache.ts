import type { Cookies } from '@sveltejs/kit';
import { LRUCache } from 'lru-cache';

/**
 * Session tokens this process has verified in the last minute, by token text.
 *
 * Reading an Auth.js session decrypts the token, derives its key and encrypts a renewed token: about
 * a millisecond of CPU on every request. A token seen and verified a moment ago is the same token, so
 * the ids it carried (user and session) are taken from here instead; after a minute the token is
 * verified (and the session renewed) again. This saves the decryption only: whether the session is
 * still live (not signed out) is read from the database on every request (`auth/sessions.ts`), so an
 * ended session stops working at once. The cache is per process and holds ids only.
 */
export type VerifiedSession = { userId: string; sid: string };
const verified = new LRUCache<string, VerifiedSession>({ max: 10_000, ttl: 60_000 });

// Auth.js names the cookie with a __Secure- prefix on https; a token over 4 kB is split into .0, .1…
const NAMES = ['__Secure-authjs.session-token', 'authjs.session-token'];

/** The session token the request carries, when it is a single cookie. */
export function sessionToken(cookies: Cookies): string | undefined {
	for (const name of NAMES) {
		const value = cookies.get(name);
		if (value) return value;
	}
	return undefined;
}

/**
 * Whether the request carries an Auth.js session cookie at all, whole or split (`.0`, `.1`…). Without
 * one there is no session to read: Auth.js is not asked (its reader costs about a tenth of a
 * millisecond even then), and the request is anonymous.
 */
export function carriesSessionCookie(cookies: Cookies): boolean {
	return cookies
		.getAll()
		.some(({ name }) => NAMES.some((session) => name === session || name.startsWith(`${session}.`)));
}

export const verifiedSession = (token: string | undefined) => (token ? verified.get(token) : undefined);

/** Remembers the token the request came with and the renewed one Auth.js set on the response. */
export function rememberSession(cookies: Cookies, sent: string | undefined, session: VerifiedSession) {
	if (sent) verified.set(sent, session);
	const renewed = sessionToken(cookies);
	if (renewed && renewed !== sent) verified.set(renewed, session);
}

/** Clears the session cookie of a session that has ended, so the browser stops sending it. */
export function dropSessionCookie(cookies: Cookies) {
	for (const name of NAMES)
		if (cookies.get(name)) cookies.delete(name, { path: '/', secure: name.startsWith('__Secure-') });
}
