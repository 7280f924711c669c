import PgBoss from 'pg-boss';
import { building } from '$app/environment';
import { env } from '$env/dynamic/private';
import { logger } from './log';

// A PostgreSQL-backed job queue (pg-boss): work that must not hold up a request, and is retried when it fails.
let boss: PgBoss | null = null;
let starting: Promise<PgBoss> | null = null;
const handlers = new Map<string, (data: never, jobId: string) => Promise<unknown>>();
const schedules = new Map<string, string>();

export const RETRY = { retryLimit: 5, retryDelay: 5, retryBackoff: true } as const;

async function start(): Promise<PgBoss> {
	// Queued e-mails hold sign-in links and invitation tokens: a finished job moves to the archive after
	// an hour and leaves it an hour later, instead of pg-boss's 12 hours and 7 days.
	const instance = new PgBoss({
		connectionString: env.DATABASE_URL,
		max: 3,
		archiveCompletedAfterSeconds: 3600,
		deleteAfterSeconds: 3600
	});
	instance.on('error', (error) => logger.error({ err: error }, 'job queue error'));
	await instance.start();
	for (const [name, handler] of handlers) {
		await instance.createQueue(name);
		const cron = schedules.get(name);
		if (cron) await instance.schedule(name, cron, {}, RETRY);
		await instance.work<object>(name, { pollingIntervalSeconds: 1 }, async (jobs) => {
			// One job's answer becomes its output (pg-boss keeps it when a batch holds one job).
			let output: unknown;
			for (const job of jobs) {
				try {
					output = await handler(job.data as never, job.id);
				} catch (error) {
					logger.error(
						{ err: error, job: name, jobId: job.id },
						'job failed; the queue retries it until its retry limit'
					);
					throw error;
				}
			}
			return jobs.length === 1 ? output : undefined;
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

/**
 * Registers a job kind; the worker runs in the app process. Call at module load, before the queue starts.
 * The handler gets the job's data and id, and what it returns is the job's output; `options` replace the retries (e.g. a long job's expiry).
 */
export function defineJob<T extends object>(
	name: string,
	handler: (data: T, jobId: string) => Promise<unknown>,
	options: PgBoss.SendOptions = RETRY
) {
	handlers.set(name, handler as (data: never, jobId: string) => Promise<unknown>);
	return {
		send: async (data: T) => (await queue()).send(name, data, options)
	};
}

/**
 * Registers a job that the queue sends on a cron schedule (UTC), and works like any other. pg-boss keeps one
 * schedule per name and sends at most one job a minute for it, so with several app processes (the cluster)
 * each tick still runs once, in whichever process fetches it. A retry can run it again: keep it idempotent.
 * `send()` runs it now, outside the schedule.
 */
export function defineSchedule(name: string, cron: string, handler: () => Promise<void>) {
	schedules.set(name, cron);
	return defineJob<object>(name, handler);
}

/** Starts the workers with the server (hooks.server.ts init), so queued jobs run even with no new request. */
export async function startJobs() {
	if (building || !env.DATABASE_URL) return;
	await queue();
}

/** Lets running jobs finish (up to 5 s) and closes the queue's connections: on shutdown, and after a test. */
export async function stopJobs() {
	const stopping = boss ?? (await starting?.catch(() => null));
	boss = null;
	starting = null;
	await stopping?.stop({ graceful: true, timeout: 5000 });
}

process.on('sveltekit:shutdown', stopJobs);
