// The store behind the API's request budgets: shared between app processes through PostgreSQL without a
// database round trip on every request.
import type { RateLimiterStore } from 'sveltekit-rate-limiter/server/stores';
import { addHits, clearHits } from './rate-limit-store';
import { logger } from './log';

type Entry = {
	/** The key's total in the shared row as last read back (this process's sent hits included). */
	shared: number;
	/** Hits counted here and not sent yet. */
	pending: number;
	/** Hits in a batch on its way to the database. */
	sending: number;
	ttl: number;
	/** When the key's window ends (the database's answer once there is one). */
	endsAt: number;
};

export type BudgetStoreOptions = {
	/** How soon hits counted here are sent in the background (ms). */
	syncEveryMs?: number;
	/** A key with this many unsent hits makes its request wait for a sync: the bound on the overshoot. */
	syncAt?: number;
	/** Sends a batch and reads back each key's total (PostgreSQL; a stand-in in unit tests). */
	sync?: typeof addHits;
	now?: () => number;
};

/** After a failed sync, requests stop waiting on the database for this long (local counting only). */
const RETRY_AFTER_MS = 5_000;

/**
 * Local aggregation with periodic sync: each process counts a key's hits in memory and, at most
 * `syncEveryMs` later, adds them to the key's row in rate_limit_hit in one statement for all keys,
 * reading back the shared totals. A request is judged on the last total read plus this process's hits
 * since, so within one process the count is exact and most requests cost no database round trip.
 *
 * The overshoot is bounded: a key never holds `syncAt` or more unsent hits (the request that reaches
 * it waits for a sync, which also brings the other processes' hits in), so once a budget is spent
 * each process admits fewer than `syncAt` more requests for that key in its window: at most
 * N × (syncAt − 1) past the limit with N processes, whatever the request rate.
 *
 * With the database down the budgets fall back to counting in each process (a failed sync keeps its
 * hits here; nobody waits on the database for RETRY_AFTER_MS), and the next sync sends them.
 */
export class BatchedBudgetStore implements RateLimiterStore {
	private readonly entries = new Map<string, Entry>();
	private readonly syncEveryMs: number;
	private readonly syncAt: number;
	private readonly send: typeof addHits;
	private readonly now: () => number;
	private timer: ReturnType<typeof setTimeout> | null = null;
	private syncing: Promise<void> | null = null;
	private downUntil = 0;
	/** Database round trips made, for the measurements in the README. */
	syncs = 0;

	constructor(
		readonly namespace: string,
		options: BudgetStoreOptions = {}
	) {
		this.syncEveryMs = options.syncEveryMs ?? 500;
		this.syncAt = options.syncAt ?? 16;
		this.send = options.sync ?? addHits;
		this.now = options.now ?? Date.now;
	}

	async add(hash: string, ttl: number): Promise<number> {
		const key = `${this.namespace}:${hash}`;
		let entry = this.entries.get(key);
		if (!entry || entry.endsAt <= this.now()) {
			entry = { shared: 0, pending: 0, sending: 0, ttl, endsAt: this.now() + ttl };
			this.entries.set(key, entry);
		}
		entry.pending++;
		while (this.waitsForSync(key, entry)) await this.syncOnce();
		this.syncSoon();
		return entry.shared + entry.sending + entry.pending;
	}

	/** Whether this key's unsent hits reached `syncAt` (while its window lasts and the database answers). */
	private waitsForSync(key: string, entry: Entry) {
		return (
			this.entries.get(key) === entry &&
			entry.pending + entry.sending >= this.syncAt &&
			this.now() >= this.downUntil
		);
	}

	async clear(): Promise<void> {
		this.entries.clear();
		await clearHits(this.namespace);
	}

	private syncSoon() {
		if (this.timer) return;
		this.timer = setTimeout(() => {
			this.timer = null;
			void this.syncOnce();
		}, this.syncEveryMs);
		this.timer.unref?.();
	}

	/** The sync under way, or a new one for every key with unsent hits. */
	private syncOnce(): Promise<void> {
		this.syncing ??= this.sync().finally(() => {
			this.syncing = null;
			for (const entry of this.entries.values()) if (entry.pending > 0) return this.syncSoon();
		});
		return this.syncing;
	}

	private async sync(): Promise<void> {
		const now = this.now();
		const sent = new Map<string, Entry>();
		for (const [key, entry] of this.entries) {
			if (entry.pending > 0) {
				entry.sending = entry.pending;
				entry.pending = 0;
				sent.set(key, entry);
			} else if (entry.endsAt <= now && entry.sending === 0) this.entries.delete(key);
		}
		if (!sent.size) return;
		const batch = [...sent].map(([key, entry]) => ({ key, hits: entry.sending, ttl: entry.ttl }));
		try {
			this.syncs++;
			for (const row of await this.send(batch)) {
				const entry = sent.get(row.key)!;
				entry.shared = row.hits;
				entry.endsAt = row.endsAt;
				entry.sending = 0;
			}
			// A key the answer left out (never expected) counts its hits as shared rather than resending them.
			for (const entry of sent.values()) {
				entry.shared += entry.sending;
				entry.sending = 0;
			}
			this.downUntil = 0;
		} catch (error) {
			for (const entry of sent.values()) {
				entry.pending += entry.sending;
				entry.sending = 0;
			}
			if (this.downUntil === 0)
				logger.warn({ err: error }, 'rate-limit sync failed: budgets count in this process for now');
			this.downUntil = this.now() + RETRY_AFTER_MS;
		}
	}
}
