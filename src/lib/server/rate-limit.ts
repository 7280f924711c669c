import type { RequestEvent } from '@sveltejs/kit';
import { RateLimiter, type RateLimiterPlugin } from 'sveltekit-rate-limiter/server';

/** Limits attempts per address as well as per client, so guessing one account's password from many IPs is slow too. */
class PerAddress implements RateLimiterPlugin<string> {
	constructor(readonly rate: [number, 'm' | '15m' | 'h']) {}
	hash(_event: RequestEvent, email: string) {
		return `addr:${email}`;
	}
}

// In-memory stores: one app process. Past one process these move to a shared store (see DEVELOPERS.md).
export const signInLimiter = new RateLimiter<string>({
	// Per client generous enough for a shared school or office network; per address strict.
	IP: [120, '15m'],
	IPUA: [60, '15m'],
	plugins: [new PerAddress([10, '15m'])]
});

export const signUpLimiter = new RateLimiter({ IP: [20, 'h'], IPUA: [10, 'h'] });

export const mailLinkLimiter = new RateLimiter<string>({
	IP: [30, 'h'],
	plugins: [new PerAddress([5, '15m'])]
});

export const inviteLimiter = new RateLimiter({ IP: [60, 'h'] });

export const TOO_MANY = 'Too many attempts. Wait a few minutes, then try again.';
