import PgBoss from 'pg-boss';
import { building } from '$app/environment';
import { env } from '$env/dynamic/private';
import { logger } from './log';

// A PostgreSQL-backed job queue (pg-boss): work that must not hold up a request, and is retried when it fails.
let boss: PgBoss | null = null;
let starting: Promise<PgBoss> | null = null;
const handlers = new Map<string, (data: never) => Promise<void>>();

export const RETRY = { retryLimit: 5, retryDelay: 5, retryBackoff: true } as const;

async function start(): Promise<PgBoss> {
	const instance = new PgBoss({ connectionString: env.DATABASE_URL, max: 3 });
	instance.on('error', (error) => logger.error({ err: error }, 'job queue error'));
	await instance.start();
	for (const [name, handler] of handlers) {
		await instance.createQueue(name);
		await instance.work<object>(name, { pollingIntervalSeconds: 1 }, async (jobs) => {
			for (const job of jobs) await handler(job.data as never);
		});
	}
	boss = instance;
	return instance;
}

function queue(): Promise<PgBoss> {
	if (boss) return Promise.resolve(boss);
	starting ??= start().catch((error) => {
		starting = null;
		throw error;
	});
	return starting;
}

/** Registers a job kind; the worker runs in the app process. Call at module load, before the queue starts. */
export function defineJob<T extends object>(name: string, handler: (data: T) => Promise<void>) {
	handlers.set(name, handler as (data: never) => Promise<void>);
	return {
		send: async (data: T) => (await queue()).send(name, data, RETRY)
	};
}

/** Starts the workers with the server (hooks.server.ts init), so queued jobs run even with no new request. */
export async function startJobs() {
	if (building || !env.DATABASE_URL) return;
	await queue();
}

process.on('sveltekit:shutdown', async () => {
	await boss?.stop({ graceful: true, timeout: 5000 });
});
