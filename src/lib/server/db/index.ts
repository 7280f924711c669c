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

export const db = drizzle(client, { schema });
export type Db = typeof db;
/** The handle a `db.transaction` callback receives, for helpers that run inside the caller's transaction. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export { schema };

process.on('sveltekit:shutdown', async () => {
	await client.end({ timeout: 5 });
});
