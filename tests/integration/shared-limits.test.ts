import type { RequestEvent } from '@sveltejs/kit';
import { afterAll, describe, expect, it } from 'vitest';
import { client } from '$lib/server/db';
import { recordSignInFailure, signInLocked } from '$lib/server/rate-limit';
import { addHit, addHits, sweepExpired } from '$lib/server/rate-limit-store';
import { BatchedBudgetStore } from '$lib/server/rate-limit-budget';

// The rate-limit counts and sign-in locks live in PostgreSQL (issue 20, item 5): these run the real
// statements against `npm test`'s database. The two-process test (tests/processes) runs them through
// two app processes. Invented addresses.
const tag = `shared-limits-${Date.now()}`;

afterAll(async () => {
	await client.end({ timeout: 5 });
});

const attempt = (address: string, userAgent: string) =>
	({
		getClientAddress: () => address,
		request: new Request('http://127.0.0.1/signin', { headers: { 'user-agent': userAgent } })
	}) as unknown as RequestEvent;

describe('rate-limit counts in PostgreSQL', () => {
	it('adds 40 hits sent at once without losing one (one statement per hit)', async () => {
		const key = `test:${tag}:concurrent`;
		const counts = await Promise.all(Array.from({ length: 40 }, () => addHit(key, 60_000)));
		expect(counts.toSorted((a, b) => a - b)).toEqual(Array.from({ length: 40 }, (_, i) => i + 1));
	});

	it('starts a new window on a hit after the old one ended', async () => {
		const key = `test:${tag}:window`;
		await addHit(key, 60_000);
		await addHit(key, 60_000);
		await client`update rate_limit_hit set expires_at = now() - interval '1 second' where key = ${key}`;
		expect(await addHit(key, 60_000)).toBe(1);
	});

	it('adds a batch of keys in one statement and answers each total and window end', async () => {
		const [a, b] = [`test:${tag}:batch-a`, `test:${tag}:batch-b`];
		await addHit(a, 60_000);
		const rows = await addHits([
			{ key: b, hits: 3, ttl: 60_000 },
			{ key: a, hits: 5, ttl: 60_000 }
		]);
		expect(Object.fromEntries(rows.map((r) => [r.key, r.hits]))).toEqual({ [a]: 6, [b]: 3 });
		for (const row of rows) expect(row.endsAt).toBeGreaterThan(Date.now());
	});

	it('two batched stores (two processes) meet in one row', async () => {
		// Syncs only when a key has 5 unsent hits, never on the timer, so the order is fixed.
		const process = () => new BatchedBudgetStore(tag, { syncAt: 5, syncEveryMs: 60_000 });
		const [first, second] = [process(), process()];
		for (let i = 0; i < 10; i++) await (i % 2 ? second : first).add('client', 60_000);
		// Each has sent its five hits (the fifth waited for its sync); the row holds all ten.
		const [row] = await client`select hits from rate_limit_hit where key = ${`${tag}:client`}`;
		expect(row!.hits).toBe(10);
		// The second synced last and read all ten; the first read 5 and counts on from there until its
		// next sync: the bounded overshoot (fewer than syncAt past the shared total).
		expect(await second.add('client', 60_000)).toBe(11);
		expect(await first.add('client', 60_000)).toBe(6);
	});

	it('sweeps expired counts and ended locks, and keeps live ones', async () => {
		const [old, live] = [`test:${tag}:old`, `test:${tag}:live`];
		await addHit(old, 60_000);
		await addHit(live, 60_000);
		await client`update rate_limit_hit set expires_at = now() - interval '1 minute' where key = ${old}`;
		await client`insert into sign_in_lock values (${`test:${tag}:ended`}, now() - interval '1 minute')`;
		await sweepExpired();
		const left = await client`
			select key from rate_limit_hit where key in (${old}, ${live})
			union all select key from sign_in_lock where key = ${`test:${tag}:ended`}`;
		expect(left.map((r) => r.key)).toEqual([live]);
	});
});

describe('the sign-in lock in PostgreSQL', () => {
	it('locks the address on the tenth failure, wherever the guesses come from, with no address in clear', async () => {
		const email = `locked-${tag}@example.org`;
		// Ten clients, one guess each: only the per-address count can lock.
		for (let i = 1; i <= 10; i++) {
			expect(await signInLocked(attempt(`10.20.0.${i}`, 'lock-test'), email)).toBe(false);
			await recordSignInFailure(attempt(`10.20.0.${i}`, 'lock-test'), email);
		}
		expect(await signInLocked(attempt('10.20.1.1', 'another browser'), email)).toBe(true);
		expect(await signInLocked(attempt('10.20.1.1', 'another browser'), `other-${email}`)).toBe(false);
		const stored = await client`
			select key from sign_in_lock where key like ${'%' + tag + '%'}
			union all select key from rate_limit_hit where key like ${'%' + tag + '%'} and key like 'sign-in:%'`;
		expect(stored).toEqual([]);
	});
});
