import { expect, test, type Page } from '@playwright/test';
import { blockingFindings, phoneWithAxe } from './axe';
import { gotoReady, signInWithPassword } from './helpers';
import { demoSites } from './site-setup';

// The compare page's chooser (issue 20, an adviser's scale), on the invented demo sites: the search, the
// picked scenarios kept in view whatever it hides, and the same path without scripts. How it lists 200
// sites twenty at a time is tested on its own logic (choice-filter.test.ts).

const hatchery = demoSites.sites[0]!;
const greenhouse = demoSites.sites[1]!;
const FIND = 'Find a site or scenario';
const picked = (page: Page) => page.getByRole('list', { name: /^Picked/ });
// By role: the comparison's charts name the scenarios too.
const box = (page: Page, name: string) => page.getByRole('checkbox', { name });
const removeButton = (page: Page, scenario: string, site: string) =>
	page.getByRole('button', { name: `Remove ${scenario}, ${site}`, exact: true });

test.describe('the compare page’s scenario chooser', () => {
	test('a viewer finds and picks two scenarios, compares them, and the picked stay in view when the search hides their site', async ({
		page
	}) => {
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, '/compare');
		// Picking and searching fetch the comparison, never the page's list of choices again.
		const listLoads: string[] = [];
		page.on('request', (r) => void (r.url().includes('/compare/__data.json') && listLoads.push(r.url())));
		await page.getByLabel(FIND).fill('alder creek');
		await expect(page.getByRole('status').filter({ hasText: 'match' })).toHaveText(
			/^\d+ scenarios at 1 site match “alder creek”\.$/
		);
		await expect(page.getByText(greenhouse.name, { exact: true })).toHaveCount(0);
		for (const s of hatchery.scenarios.slice(0, 2)) await box(page, s.name).check();
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await expect(picked(page).getByRole('listitem')).toHaveCount(2);

		// Another search hides the hatchery; its picked scenarios stay listed, each with its Remove.
		await page.getByLabel(FIND).fill('bramble');
		await expect(box(page, hatchery.scenarios[0]!.name)).toHaveCount(0);
		await expect(removeButton(page, hatchery.scenarios[0]!.name, hatchery.name)).toBeVisible();
		await removeButton(page, hatchery.scenarios[1]!.name, hatchery.name).click();
		await expect(picked(page).getByRole('listitem')).toHaveCount(1);
		await expect(page.getByText('Picked (1)')).toBeFocused();

		// The hatchery's remaining pick, hidden from the list, goes with the greenhouse's into the comparison.
		await box(page, greenhouse.scenarios[1]!.name).check();
		await expect(page).toHaveURL(new RegExp(`scenarios=${greenhouse.scenarios[1]!.id}`));
		await expect(page).toHaveURL(new RegExp(`scenarios=${hatchery.scenarios[0]!.id}`));
		const compared = page.getByRole('table', { name: /The scenarios compared/ });
		await expect(compared).toContainText(greenhouse.scenarios[1]!.name);
		await expect(compared).not.toContainText(hatchery.scenarios[1]!.name);
		// The first picked is the baseline.
		await expect(page.getByLabel('Baseline', { exact: true })).toHaveValue(hatchery.scenarios[0]!.id);
		expect(listLoads).toEqual([]);
	});

	test('without scripts, Find asks the page itself and keeps the picks and what was typed; Remove works too', async ({
		browser,
		baseURL
	}) => {
		const signedIn = await browser.newContext({ baseURL });
		await signInWithPassword(await signedIn.newPage(), 'viewer@example.org');
		const context = await browser.newContext({
			baseURL,
			javaScriptEnabled: false,
			storageState: await signedIn.storageState()
		});
		const page = await context.newPage();
		await page.goto(`/compare?scenarios=${hatchery.scenarios[0]!.id}`);
		await page.getByLabel(FIND).fill('bramble');
		await page.getByRole('button', { name: 'Find', exact: true }).click();
		await expect(page).toHaveURL(/[?&]find=bramble(&|$)/);
		await expect(page.getByLabel(FIND)).toHaveValue('bramble');
		await expect(page.getByRole('status').filter({ hasText: 'match' })).toHaveText(
			/^\d+ scenarios at 1 site match “bramble”\.$/
		);
		// Still choosing: one scenario is no error yet, and it stays picked though its site is not listed.
		await expect(page.getByText('Pick at least two')).toHaveCount(0);
		await expect(box(page, hatchery.scenarios[0]!.name)).toHaveCount(0);
		await expect(removeButton(page, hatchery.scenarios[0]!.name, hatchery.name)).toBeVisible();

		for (const s of greenhouse.scenarios.slice(0, 2)) await box(page, s.name).check();
		await page.getByRole('button', { name: 'Compare', exact: true }).click();
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await expect(picked(page).getByRole('listitem')).toHaveCount(3);
		await expect(page.getByLabel(FIND)).toHaveValue('bramble');

		await removeButton(page, greenhouse.scenarios[1]!.name, greenhouse.name).click();
		await expect(page).not.toHaveURL(/[?&]remove=/);
		await expect(picked(page).getByRole('listitem')).toHaveCount(2);
		await expect(box(page, greenhouse.scenarios[1]!.name)).not.toBeChecked();
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await context.close();
		await signedIn.close();
	});

	test('at 390 px the compare chooser fits the screen, its controls are 44 px high, and axe finds nothing serious', async ({
		browser,
		baseURL
	}) => {
		const { context, page } = await phoneWithAxe(browser, baseURL);
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, `/compare?scenarios=${hatchery.scenarios.map((s) => s.id).join(',')}`);
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await page.getByLabel(FIND).fill('greenhouse');
		await expect(page.getByRole('status').filter({ hasText: 'match' })).toContainText('“greenhouse”');
		expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
		for (const control of [
			page.getByLabel(FIND),
			removeButton(page, hatchery.scenarios[0]!.name, hatchery.name),
			page.locator('label', { has: box(page, greenhouse.scenarios[0]!.name) })
		]) {
			const box = await control.boundingBox();
			expect(box!.height).toBeGreaterThanOrEqual(44);
			expect(box!.width).toBeGreaterThanOrEqual(44);
		}
		expect(await blockingFindings(page)).toEqual([]);
		await context.close();
	});
});
