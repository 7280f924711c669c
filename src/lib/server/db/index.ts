import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';
import { building } from '$app/environment';
import { env } from '$env/dynamic/private';
import * as schema from './schema';

// Fail fast at start-up; the build imports this module to analyse routes and needs no database.
if (!env.DATABASE_URL && !building)
	throw new Error('DATABASE_URL is not set: the app cannot start without its database.');

// A short connect timeout so a stopped database turns into a quick 503, and an idle timeout so
// `node build` can exit on SIGTERM (postgres.js keeps idle sockets open otherwise).
export const client = postgres(env.DATABASE_URL ?? 'postgres://build-time-placeholder', {
	max: Number(env.DATABASE_POOL_SIZE ?? 10),
	connect_timeout: 2,
	idle_timeout: 20,
	onnotice: () => {}
});

/**
 * The client drizzle talks through: every statement with parameters is a named prepared statement.
 * drizzle asks postgres.js for an unnamed one unless a query is built with `.prepare()`, and postgres.js
 * then sends it in two round trips (parse and describe, then bind and execute) and PostgreSQL parses and
 * plans it every time. Named, each connection prepares a statement once and then binds and executes it
 * in one round trip: the sites dashboard went from 12.6 to 7.3 ms of app CPU a view (README,
 * "Where a dashboard view's time goes"). postgres.js keeps a connection's statements until the
 * connection ends (its `max_lifetime`, 30–60 min). A pooler in transaction mode in front of PostgreSQL
 * cannot keep named statements: set DATABASE_PREPARE=false there.
 */
const prepared =
	env.DATABASE_PREPARE === 'false'
		? client
		: new Proxy(client, {
				get(target, key, receiver) {
					if (key !== 'unsafe') return Reflect.get(target, key, receiver);
					return (query: string, args?: unknown[], options?: object) =>
						// Looked up at each call, so a test that counts statements at `client.unsafe` still sees them.
						target.unsafe(query, args as never, { ...options, prepare: true });
				}
			});

export const db = drizzle(prepared, { schema });
export type Db = typeof db;
/** The handle a `db.transaction` callback receives, for helpers that run inside the caller's transaction. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export { schema };

process.on('sveltekit:shutdown', async () => {
	await client.end({ timeout: 5 });
});
