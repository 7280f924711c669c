import type { RequestEvent } from '@sveltejs/kit';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { describe, expect, it } from 'vitest';
import { clientId, PerClient } from './rate-limit-client';

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
});
