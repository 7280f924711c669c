import { index, integer, jsonb, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';
import { belongsTo } from './columns';
import { scenarios } from './site';

/*
 * State every app process must see alike (rate-limit counts, sign-in locks) and results worth keeping
 * between requests (a scenario's priced periods). Nothing here is the only copy of what a person entered.
 */

/** One rate-limit window's count for a key (a client, an address, a person); gone once it expires. */
export const rateLimitHits = pgTable(
	'rate_limit_hit',
	{
		key: text('key').primaryKey(),
		hits: integer('hits').notNull(),
		expiresAt: timestamp('expires_at', { mode: 'date', withTimezone: true }).notNull()
	},
	(r) => [index('rate_limit_hit_expires_idx').on(r.expiresAt)]
);

/** A sign-in lock: an e-mail address or a client refused until `lockedUntil`. */
export const signInLocks = pgTable(
	'sign_in_lock',
	{
		key: text('key').primaryKey(),
		lockedUntil: timestamp('locked_until', { mode: 'date', withTimezone: true }).notNull()
	},
	(l) => [index('sign_in_lock_until_idx').on(l.lockedUntil)]
);

/**
 * A scenario's priced result for one slot (a period, and a pinned tariff version if any), with the key
 * of everything it was priced from (`inputKey`: the scenario's revision, the tariff versions, the time
 * zone, the holidays and the calculation rules' version; `dependsOn` is that key in words). A stored row
 * whose key no longer matches is stale and is priced again on the next read. `summary` is the small part
 * lists (the sites dashboard, the site page) read, so they never load the whole result.
 */
export const pricedResults = pgTable(
	'priced_result',
	{
		scenarioId: belongsTo('scenario_id', () => scenarios.id),
		slot: text('slot').notNull(),
		inputKey: text('input_key').notNull(),
		rulesVersion: integer('rules_version').notNull(),
		dependsOn: jsonb('depends_on').$type<Record<string, unknown>>().notNull(),
		result: jsonb('result').$type<unknown>().notNull(),
		/** What lists read without the whole result: each period's label, cost and kWh, the totals, the note. */
		summary: jsonb('summary').$type<unknown>().notNull(),
		computedAt: timestamp('computed_at', { mode: 'date', withTimezone: true }).notNull().defaultNow()
	},
	(p) => [primaryKey({ columns: [p.scenarioId, p.slot] })]
);
