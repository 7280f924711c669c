import { expect, test, type BrowserContext } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { firstLoad, kB, MAIN_PAGES } from './first-load';
import { signInWithPassword } from './helpers';

// The browser's share, kept: each main page's first-load JavaScript (gzipped) stays within its budget in
// js-budgets.json, with 10 % of room. Bytes do not depend on the machine's speed, so this cannot fail
// by timing. After a deliberate change, set the page's budget and measured figure from the message.

type Budgets = { pages: Record<string, { budget: number; measured: number }> };
const budgets = (JSON.parse(readFileSync('tests/e2e/js-budgets.json', 'utf8')) as Budgets).pages;
const ROOM = 1.1;

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;
let owner: StorageState;

test.describe("The browser's share: first-load JavaScript", () => {
	test.beforeAll(async ({ browser, baseURL }) => {
		const context = await browser.newContext({ baseURL });
		await signInWithPassword(await context.newPage(), 'owner@example.org');
		owner = await context.storageState();
		await context.close();
	});

	test('every main page has a budget, and every budget a page', () => {
		expect(Object.keys(budgets).sort()).toEqual(MAIN_PAGES.map((p) => p.name).sort());
	});

	for (const { name, path, signedIn } of MAIN_PAGES) {
		test(`${name} stays within its JavaScript budget`, async ({ browser, baseURL }) => {
			// A fresh context: an empty cache, as on a first visit.
			const context = await browser.newContext({ baseURL, storageState: signedIn ? owner : undefined });
			const { bytes } = await firstLoad(await context.newPage(), context.request, path);
			await context.close();
			const budget = budgets[name]?.budget ?? 0;
			expect(
				bytes,
				`${name} (${path}): first-load JavaScript is ${bytes} bytes (${kB(bytes)} kB) gzipped, ` +
					`more than 10 % past its budget of ${budget} bytes (${kB(budget)} kB) in tests/e2e/js-budgets.json`
			).toBeLessThanOrEqual(budget * ROOM);
		});
	}
});
