import type { RequestEvent } from '@sveltejs/kit';
import { RateLimiter, type RateLimiterPlugin } from 'sveltekit-rate-limiter/server';
import { clientId, PerClient } from './rate-limit-client';

/** Limits attempts per address as well as per client, so guessing one account's password from many IPs is slow too. */
class PerAddress implements RateLimiterPlugin<string> {
	constructor(readonly rate: [number, 'm' | '15m' | 'h']) {}
	hash(_event: RequestEvent, email: string) {
		return `addr:${email}`;
	}
}

// In-memory stores: one app process. Past one process these move to a shared store (see DEVELOPERS.md).

/**
 * Password sign-in counts failed attempts only, so people who sign in often are never slowed down.
 * Per client generous enough for a shared school or office network; per address strict: the tenth
 * wrong password for an address locks it (and the client) for 15 minutes, before any further guess
 * is even checked.
 */
const signInFailures = new RateLimiter<string>({
	IP: [120, '15m'],
	plugins: [new PerAddress([9, '15m']), new PerClient<string>([60, '15m'])]
});
const LOCK_MS = 15 * 60 * 1000;
const lockedUntil = new Map<string, number>();
const clientKey = clientId;

export function signInLocked(event: RequestEvent, email: string): boolean {
	const now = Date.now();
	return [`addr:${email}`, clientKey(event)].some((key) => {
		const until = lockedUntil.get(key);
		if (until !== undefined && until <= now) lockedUntil.delete(key);
		return until !== undefined && until > now;
	});
}

export async function recordSignInFailure(event: RequestEvent, email: string): Promise<void> {
	if (!(await signInFailures.isLimited(event, email))) return;
	const until = Date.now() + LOCK_MS;
	lockedUntil.set(`addr:${email}`, until);
	lockedUntil.set(clientKey(event), until);
}

export const signUpLimiter = new RateLimiter({ IP: [20, 'h'], plugins: [new PerClient([10, 'h'])] });

export const mailLinkLimiter = new RateLimiter<string>({
	IP: [30, 'h'],
	plugins: [new PerAddress([5, '15m'])]
});

export const inviteLimiter = new RateLimiter({ IP: [60, 'h'] });

export const TOO_MANY = 'Too many attempts. Wait a few minutes, then try again.';
