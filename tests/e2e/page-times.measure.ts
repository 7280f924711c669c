import { test, type BrowserContext } from '@playwright/test';
import { writeFileSync } from 'node:fs';
import { firstLoad, gzippedBytes, kB, MAIN_PAGES } from './first-load';
import { signInWithPassword } from './helpers';

// On demand only (PAGE_TIMES=1; playwright.config.ts collects this file then and only then): how long each main page takes, on a CPU slowed four times (a phone's
// class), until it answers input: the moment the root layout sets its hydration marker, in ms since the
// navigation began. Printed for the README, never asserted: wall-clock time on a shared machine varies.
// PAGE_TIMES_RUNS (default 3) visits per page, each with an empty cache; the median is reported.
// PAGE_TIMES_OUT names a JSON file to write the figures to.

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;
const RUNS = Number(process.env.PAGE_TIMES_RUNS ?? 3);
const median = (values: number[]) => {
	const sorted = [...values].sort((a, b) => a - b);
	const mid = Math.floor(sorted.length / 2);
	return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
};

test("The browser's share: ready on a four times slower CPU", async ({ browser, baseURL }) => {
	test.setTimeout(20 * 60_000);
	const signIn = await browser.newContext({ baseURL });
	await signInWithPassword(await signIn.newPage(), 'owner@example.org');
	const owner: StorageState = await signIn.storageState();
	await signIn.close();
	// Static files need no session: one plain context fetches them to count their bytes.
	const files = await browser.newContext({ baseURL });

	const rows = [];
	for (const { name, path, signedIn } of MAIN_PAGES) {
		const times: number[] = [];
		const allScripts = new Set<string>();
		// Counted in a context of its own, so every timed visit below starts with an empty cache.
		const counter = await browser.newContext({ baseURL, storageState: signedIn ? owner : undefined });
		const { bytes: firstLoadBytes } = await firstLoad(await counter.newPage(), files.request, path);
		await counter.close();
		for (let run = 0; run < RUNS; run++) {
			const context = await browser.newContext({ baseURL, storageState: signedIn ? owner : undefined });
			const page = await context.newPage();

			// The moment the marker appears, taken in the page, so the test's own round trips do not count.
			await page.addInitScript(() => {
				new MutationObserver((_, observer) => {
					if (document.body?.dataset.hydrated !== 'true') return;
					(window as unknown as { hydratedAt: number }).hydratedAt = performance.now();
					observer.disconnect();
				}).observe(document, { attributes: true, subtree: true, attributeFilter: ['data-hydrated'] });
			});
			const origin = new URL(baseURL!).origin;
			page.on('response', (r) => {
				if (r.request().resourceType() === 'script' && r.url().startsWith(origin)) allScripts.add(r.url());
			});
			const cdp = await context.newCDPSession(page);
			await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
			await page.goto(path);
			await page.locator('body[data-hydrated="true"]').waitFor({ state: 'attached' });
			times.push(await page.evaluate(() => (window as unknown as { hydratedAt: number }).hydratedAt));
			// Scripts fetched after the page is up (charts, the quick estimate's check) count for the table.
			await page.waitForLoadState('networkidle');
			await context.close();
		}
		const withDeferred = await gzippedBytes(files.request, [...allScripts]);
		rows.push({
			name,
			path,
			firstLoadBytes,
			withDeferredBytes: withDeferred,
			readyMs: times.map(Math.round),
			medianMs: Math.round(median(times))
		});
	}
	await files.close();
	console.log('\npage | first-load JS (gzip kB) | with deferred (gzip kB) | ready ×4 CPU, median ms (runs)');
	for (const r of rows)
		console.log(
			`${r.name} | ${kB(r.firstLoadBytes)} | ${kB(r.withDeferredBytes)} | ${r.medianMs} (${r.readyMs.join(', ')})`
		);
	if (process.env.PAGE_TIMES_OUT) writeFileSync(process.env.PAGE_TIMES_OUT, JSON.stringify(rows, null, '\t'));
});
