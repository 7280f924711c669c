import { expect, test } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { DEMO_WS, signInWithPassword } from './helpers';

// Runs last (files run in name order, one worker): it stops the test run's own PostgreSQL and starts it again.
const pg = (command: 'start' | 'stop') =>
	execFileSync('bash', ['scripts/pg.sh', command], { env: process.env, stdio: 'pipe', timeout: 60_000 });

test('with the database stopped, pages and the API answer a readable 503 quickly, and recover by themselves', async ({
	page,
	request
}) => {
	expect(process.env.PGDATA, 'run through npm test, which starts a throwaway cluster').toBeTruthy();
	await signInWithPassword(page, 'owner@example.org');
	pg('stop');
	try {
		const started = Date.now();
		const res = await page.goto(`/w/${DEMO_WS.id}`);
		expect(res?.status()).toBe(503);
		// A stopped server refuses connections at once. The bound catches a request that waits out a
		// timeout instead (a hang), with room for a page load on a busy 2-core machine.
		expect(Date.now() - started).toBeLessThan(10_000);
		await expect(
			page.getByRole('heading', { name: 'Runrate cannot reach its database right now' })
		).toBeVisible();
		expect((await request.get('/health')).status()).toBe(503);
	} finally {
		pg('start');
	}
	await expect.poll(async () => (await request.get('/health')).status(), { timeout: 15_000 }).toBe(200);
	await page.goto(`/w/${DEMO_WS.id}`);
	await expect(page.getByRole('heading', { name: DEMO_WS.name })).toBeVisible();
});
