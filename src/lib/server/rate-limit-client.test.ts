import type { RequestEvent } from '@sveltejs/kit';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { describe, expect, it } from 'vitest';
import { clientId, keyHash, PerClient } from './rate-limit-client';

const request = (userAgent?: string) =>
	({
		getClientAddress: () => '203.0.113.7',
		request: new Request('http://127.0.0.1/', { headers: userAgent ? { 'user-agent': userAgent } : {} })
	}) as unknown as RequestEvent;

describe('rate limits per client (IP + User-Agent)', () => {
	it('counts a request without a User-Agent as the empty one, not as already limited', async () => {
		const limiter = new RateLimiter({ plugins: [new PerClient([2, 'm'])] });
		expect(await limiter.isLimited(request())).toBe(false);
		expect(await limiter.isLimited(request())).toBe(false);
		expect(await limiter.isLimited(request())).toBe(true);
		// Another client (a browser on the same address) keeps its own count.
		expect(await limiter.isLimited(request('Mozilla/5.0 (test)'))).toBe(false);
	});

	it('keys a missing and an empty User-Agent alike, apart from a real one', () => {
		expect(clientId(request())).toBe(clientId(request('')));
		expect(clientId(request())).not.toBe(clientId(request('curl/8')));
	});

	it("the library's built-in IPUA rate (which limits every request without a User-Agent) is used nowhere", () => {
		const files = (dir: string): string[] =>
			readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
				entry.isDirectory()
					? files(join(dir, entry.name))
					: /\.(ts|svelte|js)$/.test(entry.name) && !entry.name.endsWith('.test.ts')
						? [join(dir, entry.name)]
						: []
			);
		const offenders = files('src').filter((file) => /\bIPUA\s*:/.test(readFileSync(file, 'utf8')));
		expect(offenders).toEqual([]);
	});

	it("hashes keys as the library's own WebCrypto SHA-256 does, so stored counts keep their keys", async () => {
		const key = clientId(request('Mozilla/5.0 (test)'));
		const digest = await crypto.subtle.digest('SHA-256', new TextEncoder().encode(key));
		const hex = [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
		expect(keyHash(key)).toBe(hex);
		// The SHA-256 of "abc" (FIPS 180-2, appendix B.1).
		expect(keyHash('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
	});
});
