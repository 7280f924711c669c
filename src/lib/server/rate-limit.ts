import type { RequestEvent } from '@sveltejs/kit';
import { RateLimiter, type RateLimiterPlugin } from 'sveltekit-rate-limiter/server';
import { client } from './db';
import { clientId, keyHash, PerClient } from './rate-limit-client';
import { PostgresStore, sweepNowAndThen } from './rate-limit-store';

/** Limits attempts per address as well as per client, so guessing one account's password from many IPs is slow too. */
class PerAddress implements RateLimiterPlugin<string> {
	constructor(readonly rate: [number, 'm' | '15m' | 'h']) {}
	hash(_event: RequestEvent, email: string) {
		return `addr:${email}`;
	}
}

// The form limits count in PostgreSQL (rate-limit-store.ts), exactly, so every app process shares one
// count; a database outage refuses these forms with the readable 503 rather than letting them through.

/**
 * Password sign-in counts failed attempts only, so people who sign in often are never slowed down.
 * Per client generous enough for a shared school or office network; per address strict: the tenth
 * wrong password for an address locks it (and the client) for 15 minutes, before any further guess
 * is even checked.
 */
const signInFailures = new RateLimiter<string>({
	IP: [120, '15m'],
	plugins: [new PerAddress([9, '15m']), new PerClient<string>([60, '15m'])],
	store: new PostgresStore('sign-in'),
	hashFunction: keyHash
});

/** The sign_in_lock keys of an attempt: its address and its client, hashed (no e-mail or IP in clear). */
const lockKeys = (event: RequestEvent, email: string) => [`addr:${email}`, clientId(event)].map(keyHash);

/** Whether the address or the client is locked, in any app process (one indexed read). */
export async function signInLocked(event: RequestEvent, email: string): Promise<boolean> {
	const rows = await client`
		select 1 from sign_in_lock where key in ${client(lockKeys(event, email))} and locked_until > now()
		limit 1`;
	return rows.length > 0;
}

/** Counts a failed attempt; the one past the limit locks the address and the client for 15 minutes. */
export async function recordSignInFailure(event: RequestEvent, email: string): Promise<void> {
	if (!(await signInFailures.isLimited(event, email))) return;
	sweepNowAndThen();
	await client`
		insert into sign_in_lock (key, locked_until)
		select key, now() + interval '15 minutes' from unnest(${lockKeys(event, email)}::text[]) as key
		on conflict (key) do update set locked_until = excluded.locked_until`;
}

export const signUpLimiter = new RateLimiter({
	IP: [20, 'h'],
	plugins: [new PerClient([10, 'h'])],
	store: new PostgresStore('sign-up'),
	hashFunction: keyHash
});

export const mailLinkLimiter = new RateLimiter<string>({
	IP: [30, 'h'],
	plugins: [new PerAddress([5, '15m'])],
	store: new PostgresStore('mail-link'),
	hashFunction: keyHash
});

export const inviteLimiter = new RateLimiter({
	IP: [60, 'h'],
	store: new PostgresStore('invite'),
	hashFunction: keyHash
});

export const TOO_MANY = 'Too many attempts. Wait a few minutes, then try again.';
