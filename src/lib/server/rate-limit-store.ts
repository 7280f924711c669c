// Rate-limit counts in PostgreSQL (table rate_limit_hit), so every app process counts against one total.
import type { RateLimiterStore } from 'sveltekit-rate-limiter/server/stores';
import { client } from './db';
import { logger } from './log';

/**
 * One fixed window per key: a hit on an expired row starts a new window of `ttl` ms from now, any other
 * hit adds to the row. One statement does both, so two processes adding at once never lose a hit.
 * The keys are the limiter's own SHA-256 hashes (never an address or an e-mail in clear), behind the
 * limiter's namespace so two limiters never share a row.
 */
export async function addHit(key: string, ttl: number): Promise<number> {
	sweepNowAndThen();
	const [row] = await client<{ hits: number }[]>`
		insert into rate_limit_hit (key, hits, expires_at)
		values (${key}, 1, now() + ${ttl}::int * interval '1 millisecond')
		on conflict (key) do update set
			hits = case when rate_limit_hit.expires_at <= now() then 1 else rate_limit_hit.hits + 1 end,
			expires_at = case when rate_limit_hit.expires_at <= now()
				then excluded.expires_at else rate_limit_hit.expires_at end
		returning hits`;
	return row!.hits;
}

/** Several keys' hits at once (the batched budgets): the same window rule, one statement for the batch. */
export async function addHits(
	batch: { key: string; hits: number; ttl: number }[]
): Promise<{ key: string; hits: number; endsAt: number }[]> {
	sweepNowAndThen();
	// Always in key order, so two processes adding overlapping batches lock rows in the same order.
	const sorted = [...batch].sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
	const rows = await client<{ key: string; hits: number; ends_at: number }[]>`
		insert into rate_limit_hit (key, hits, expires_at)
		select k, h, now() + t * interval '1 millisecond'
		from unnest(${sorted.map((b) => b.key)}::text[], ${sorted.map((b) => b.hits)}::int[],
			${sorted.map((b) => b.ttl)}::int[]) as batch(k, h, t)
		on conflict (key) do update set
			hits = case when rate_limit_hit.expires_at <= now()
				then excluded.hits else rate_limit_hit.hits + excluded.hits end,
			expires_at = case when rate_limit_hit.expires_at <= now()
				then excluded.expires_at else rate_limit_hit.expires_at end
		returning key, hits, (extract(epoch from expires_at) * 1000)::float8 as ends_at`;
	return rows.map((r) => ({ key: r.key, hits: r.hits, endsAt: r.ends_at }));
}

/** Forgets every count of one limiter (the library's `clear`). */
export async function clearHits(namespace: string): Promise<void> {
	await client`delete from rate_limit_hit where starts_with(key, ${`${namespace}:`})`;
}

const SWEEP_EVERY_MS = 60_000;
const SWEEP_ROWS = 1000;
let lastSweep = 0;

/**
 * Expired counts and locks mean nothing (a new hit starts a new window anyway) but would pile up: at
 * most once a minute per process, a bounded delete of up to 1,000 expired rows of each table, in the
 * background. Left-over rows only cost space; the next sweep takes them.
 */
export function sweepNowAndThen(now = Date.now()): void {
	if (now - lastSweep < SWEEP_EVERY_MS) return;
	lastSweep = now;
	sweepExpired().catch((error) => logger.warn({ err: error }, 'sweeping expired rate-limit rows failed'));
}

/** Deletes up to SWEEP_ROWS expired counts and as many ended locks. */
export async function sweepExpired(): Promise<void> {
	await client`
		with gone as (
			delete from rate_limit_hit where key in
				(select key from rate_limit_hit where expires_at <= now() limit ${SWEEP_ROWS})
			returning 1
		)
		delete from sign_in_lock where key in
			(select key from sign_in_lock where locked_until <= now() limit ${SWEEP_ROWS})`;
}

/**
 * The library's store for the low-volume limiters (sign-in failures, sign-up, mail links, invitations):
 * exact, one statement per hit. When the database is down `add` throws, so the request is refused with
 * the readable 503 (hooks.server.ts): these limits fail closed.
 */
export class PostgresStore implements RateLimiterStore {
	constructor(readonly namespace: string) {}
	add(hash: string, ttl: number): Promise<number> {
		return addHit(`${this.namespace}:${hash}`, ttl);
	}
	clear(): Promise<void> {
		return clearHits(this.namespace);
	}
}
