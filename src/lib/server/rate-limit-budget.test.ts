import { describe, expect, it, vi } from 'vitest';

// The store's PostgreSQL statements are tested against a real database (tests/integration/shared-limits);
// here a stand-in table lets two stores play two app processes.
vi.mock('./db', () => ({ client: {} }));
const { BatchedBudgetStore } = await import('./rate-limit-budget');

type Batch = { key: string; hits: number; ttl: number }[];

/** One rate_limit_hit table (fixed windows, the same rule as the SQL) and a clock the test moves. */
function sharedTable() {
	const rows = new Map<string, { hits: number; endsAt: number }>();
	const clock = { now: 1_000_000 };
	let down = false;
	const calls = { count: 0 };
	const sync = async (batch: Batch) => {
		calls.count++;
		await Promise.resolve();
		if (down) throw Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' });
		return batch.map(({ key, hits, ttl }) => {
			const row = rows.get(key);
			const next =
				row && row.endsAt > clock.now
					? { hits: row.hits + hits, endsAt: row.endsAt }
					: { hits, endsAt: clock.now + ttl };
			rows.set(key, next);
			return { key, ...next };
		});
	};
	const process = (syncAt = 10) =>
		new BatchedBudgetStore('api-test', { sync, syncAt, syncEveryMs: 60_000, now: () => clock.now });
	return {
		rows,
		clock,
		calls,
		process,
		setDown: (value: boolean) => (down = value)
	};
}

const MINUTE = 60_000;

describe('the batched request budget (local counting, shared totals)', () => {
	it('counts exactly within one process, syncing once per ten hits', async () => {
		const table = sharedTable();
		const store = table.process(10);
		const counts = [];
		for (let i = 0; i < 95; i++) counts.push(await store.add('client', MINUTE));
		expect(counts).toEqual(Array.from({ length: 95 }, (_, i) => i + 1));
		expect(table.calls.count).toBe(9);
		expect(table.rows.get('api-test:client')!.hits).toBe(90);
	});

	it('holds a budget across two processes, overshooting by less than syncAt per process', async () => {
		const table = sharedTable();
		const [a, b] = [table.process(10), table.process(10)];
		let admitted = 0;
		for (let i = 0; i < 300; i++) if ((await (i % 2 ? b : a).add('client', MINUTE)) <= 60) admitted++;
		expect(admitted).toBeGreaterThanOrEqual(60);
		expect(admitted).toBeLessThanOrEqual(60 + 2 * 9);
		// Each process alone would have admitted 60 of its 150: 120 in all.
	});

	it('starts a new window once the old one ends', async () => {
		const table = sharedTable();
		const store = table.process(10);
		for (let i = 0; i < 25; i++) await store.add('client', MINUTE);
		table.clock.now += MINUTE;
		expect(await store.add('client', MINUTE)).toBe(1);
	});

	it('keeps counting in the process when the database is down, without waiting on it per request', async () => {
		const table = sharedTable();
		const store = table.process(10);
		table.setDown(true);
		const counts = [];
		for (let i = 0; i < 40; i++) counts.push(await store.add('client', MINUTE));
		expect(counts.at(-1)).toBe(40);
		// One failed attempt; the next requests count locally for five seconds.
		expect(table.calls.count).toBe(1);
		table.setDown(false);
		table.clock.now += 5_000;
		expect(await store.add('client', MINUTE)).toBe(41);
		expect(table.rows.get('api-test:client')!.hits).toBe(41);
	});

	it('keeps namespaces apart: two limiters never share a row', async () => {
		const table = sharedTable();
		const sync = async (batch: Batch) => batch.map((b) => ({ ...b, endsAt: table.clock.now + MINUTE }));
		const store = new BatchedBudgetStore('api-member', { sync, syncAt: 1 });
		const seen: string[] = [];
		await new BatchedBudgetStore('which-tariff', {
			sync: async (batch) => {
				seen.push(...batch.map((b) => b.key));
				return sync(batch);
			},
			syncAt: 1
		}).add('0abc', MINUTE);
		await store.add('0abc', MINUTE);
		expect(seen).toEqual(['which-tariff:0abc']);
	});
});
