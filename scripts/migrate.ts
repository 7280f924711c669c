// Applies the committed drizzle-kit migrations in drizzle/ (never `push` outside local experiments).
import { drizzle } from 'drizzle-orm/postgres-js';
import { migrate } from 'drizzle-orm/postgres-js/migrator';
import postgres from 'postgres';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');

const client = postgres(url, { max: 1, onnotice: () => {} });
const started = performance.now();
await migrate(drizzle(client), { migrationsFolder: 'drizzle' });
await client.end();
console.log(`[migrate] up to date in ${Math.round(performance.now() - started)} ms`);
