import type { RequestEvent } from '@sveltejs/kit';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { describe, expect, it, vi } from 'vitest';
import { isDatabaseUnavailable } from './db/errors';

// A database that refuses every connection, as postgres.js reports it.
const refused = () =>
	Promise.reject(Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' }));
vi.mock('./db', () => ({ client: refused }));
const { PostgresStore } = await import('./rate-limit-store');

const request = {
	getClientAddress: () => '203.0.113.9',
	request: new Request('http://127.0.0.1/signup')
} as unknown as RequestEvent;

describe('the exact store (sign-in, sign-up, e-mail links, invitations)', () => {
	it('fails closed with the database down: the check throws the outage, which answers the readable 503', async () => {
		const limiter = new RateLimiter({ IP: [20, 'h'], store: new PostgresStore('sign-up') });
		const outcome = await limiter.isLimited(request).then(
			() => null,
			(error: unknown) => error
		);
		expect(isDatabaseUnavailable(outcome)).toBe(true);
	});
});
