import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq, inArray } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { workspaces } from '$lib/server/db/schema';
import { startJobs, stopJobs } from '$lib/server/jobs';
import { purgeDeletedWorkspaces, purgeJob } from '$lib/server/workspaces/deletion';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { makeUser } from './fixtures';

// Against the real PostgreSQL and job queue of `npm test`; every workspace here is invented.
const tag = `purge-${Date.now()}`;
const HOUR = 60 * 60 * 1000;
const DAY = 24 * HOUR;
let ownerId = '';

/** A workspace whose grace period ends `fromNow` ms from now (negative: it ended), or none when null. */
async function workspace(label: string, fromNow: number | null) {
	const id = await createWorkspace(`${label} ${tag}`, ownerId);
	// Set directly: scheduleWorkspaceDeletion would also start the in-process purge, and the job is on test.
	const deleteAfter = fromNow === null ? null : new Date(Date.now() + fromNow);
	await db.update(workspaces).set({ deleteAfter }).where(eq(workspaces.id, id));
	return id;
}

const remaining = async (ids: string[]) =>
	(await db.select({ id: workspaces.id }).from(workspaces).where(inArray(workspaces.id, ids))).map(
		(w) => w.id
	);

async function completed(jobId: string | null) {
	for (const started = Date.now(); Date.now() - started < 15_000;) {
		const [job] = await client<{ state: string }[]>`select state from pgboss.job where id = ${jobId}`;
		if (job?.state === 'completed' || job?.state === 'failed') return job.state;
		await new Promise((resolve) => setTimeout(resolve, 100));
	}
	throw new Error(`The purge job ${jobId} did not finish within 15 s`);
}

beforeAll(async () => {
	ownerId = (await makeUser(`owner-${tag}@example.org`, 'Purge test owner (invented)')).id;
	await startJobs();
});

afterAll(async () => {
	await stopJobs();
	await client.end({ timeout: 5 });
});

describe('the scheduled purge', () => {
	it('is on the job queue’s schedule every hour once the workers start', async () => {
		const rows = await client`select name, cron from pgboss.schedule where name = 'workspace-purge'`;
		expect([...rows]).toEqual([{ name: 'workspace-purge', cron: '0 * * * *' }]);
	});

	it('removes a workspace past its grace period and keeps one within it, and one not being deleted', async () => {
		const past = await workspace('Past', -HOUR);
		const within = await workspace('Within', 6 * DAY);
		const kept = await workspace('Kept', null);
		expect(await completed(await purgeJob.send({}))).toBe('completed');
		expect((await remaining([past, within, kept])).sort()).toEqual([within, kept].sort());
	});
});

describe('two app processes', () => {
	it('share one schedule, and purges that overlap remove each workspace once, without an error', async () => {
		// A second copy of the modules is what a second process of the cluster holds: its own queue client.
		vi.resetModules();
		const second = {
			jobs: await import('$lib/server/jobs'),
			deletion: await import('$lib/server/workspaces/deletion'),
			db: await import('$lib/server/db')
		};
		try {
			await second.jobs.startJobs();
			const rows = await client`select name from pgboss.schedule where name = 'workspace-purge'`;
			expect(rows).toHaveLength(1);

			const gone = await Promise.all([1, 2, 3, 4].map((n) => workspace(`Overlap ${n}`, -DAY)));
			const [a, b] = await Promise.all([purgeDeletedWorkspaces(), second.deletion.purgeDeletedWorkspaces()]);
			const mine = (ids: string[]) => ids.filter((id) => gone.includes(id));
			expect([...mine(a!), ...mine(b!)].sort()).toEqual([...gone].sort());

			// The same through the queue: both processes' jobs complete, neither fails on the other's work.
			const again = await Promise.all([1, 2].map((n) => workspace(`Queued ${n}`, -DAY)));
			const jobs = await Promise.all([purgeJob.send({}), second.deletion.purgeJob.send({})]);
			expect(await Promise.all(jobs.map(completed))).toEqual(['completed', 'completed']);
			expect(await remaining(again)).toEqual([]);
		} finally {
			await second.jobs.stopJobs();
			await second.db.client.end({ timeout: 5 });
		}
	});
});
