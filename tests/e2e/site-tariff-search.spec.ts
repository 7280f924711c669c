import { expect, test, type Page } from '@playwright/test';
import { blockingFindings, phoneWithAxe } from './axe';
import { gotoReady } from './helpers';
import { baselineOf, callerOn, createSite } from './site-setup';

// The site form reaches every tariff the site may use: the workspace's own in full, the public library
// by a search box that works with and without scripts. The tariffs are the invented demo library's.

const SEARCH = 'Find a tariff: utility, name or open-data label';
const publicOptions = (page: Page) =>
	page.getByLabel('Tariff', { exact: true }).locator('optgroup[label="Public library"] option');

test.describe('the site form’s tariff search', () => {
	test('an owner finds a demo tariff by its utility, chooses it and sees it on the site', async ({
		page,
		baseURL
	}) => {
		const caller = await callerOn(page, 'owner@example.org', baseURL!);
		const siteId = await createSite(caller, 'Tariff search');
		await gotoReady(page, `/sites/${siteId}/edit`);

		await page.getByLabel(SEARCH).fill('Kestrel');
		await expect(page.getByRole('status').filter({ hasText: 'found for' })).toHaveText(
			'2 public tariffs found for “Kestrel”.'
		);
		await expect(publicOptions(page)).toHaveText([
			'Kestrel Sound Energy (invented) — Residential two-step',
			'Kestrel Sound Energy (invented) — Small farm time-of-use'
		]);
		await page
			.getByLabel('Tariff', { exact: true })
			.selectOption({ label: 'Kestrel Sound Energy (invented) — Small farm time-of-use' });
		await page.getByRole('button', { name: 'Save the site' }).click();
		await expect(page).toHaveURL(new RegExp(`/sites/${siteId}$`));
		await expect(page.getByText('Small farm time-of-use')).toBeVisible();
	});

	test('without scripts, Find asks the page itself and keeps what was typed', async ({
		browser,
		baseURL
	}) => {
		const signedIn = await browser.newContext({ baseURL });
		const caller = await callerOn(await signedIn.newPage(), 'owner@example.org', baseURL!);
		const siteId = await createSite(caller, 'Tariff search, no scripts');
		const context = await browser.newContext({
			baseURL,
			javaScriptEnabled: false,
			storageState: await signedIn.storageState()
		});
		const page = await context.newPage();
		await page.goto(`/sites/${siteId}/edit`);
		const name = `Renamed without scripts ${Date.now()} (invented)`;
		await page.getByLabel('Site name').fill(name);
		await page.getByLabel(SEARCH).fill('Northmere');
		await page.getByRole('button', { name: 'Find' }).click();
		await expect(page).toHaveURL(/[?&]tariffs=Northmere(&|$)/);
		await expect(page.getByLabel('Site name')).toHaveValue(name);
		await expect(page.getByLabel(SEARCH)).toHaveValue('Northmere');
		await expect(page.getByRole('status').filter({ hasText: 'found for' })).toHaveText(
			'3 public tariffs found for “Northmere”.'
		);
		await expect(publicOptions(page)).toHaveCount(3);
		await page
			.getByLabel('Tariff', { exact: true })
			.selectOption({ label: 'Northmere Electric (invented) — Farm service' });
		await page.getByRole('button', { name: 'Save the site' }).click();
		await expect(page).toHaveURL(new RegExp(`/sites/${siteId}$`));
		await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
		await expect(page.getByText('Farm service')).toBeVisible();
		await context.close();
		await signedIn.close();
	});

	test('at 390 px the form fits the screen, the search’s controls are 44 px high, and axe finds nothing serious', async ({
		browser,
		baseURL
	}) => {
		const { context, page } = await phoneWithAxe(browser, baseURL);
		const caller = await callerOn(page, 'owner@example.org', baseURL!);
		const siteId = await createSite(caller, 'Tariff search phone');
		await gotoReady(page, `/sites/${siteId}/edit`);
		await page.getByLabel(SEARCH).fill('Demo Valley');
		// Other tests may add public tariffs of their own: at least the demo library's four.
		await expect(page.getByRole('status').filter({ hasText: 'found for' })).toHaveText(
			/^\d+ public tariffs found for “Demo Valley”\.$/
		);
		await expect(publicOptions(page).filter({ hasText: 'Demo Valley Power Cooperative' })).toHaveCount(4);
		expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
		for (const control of [page.getByLabel(SEARCH), page.getByRole('button', { name: 'Find' })]) {
			const box = await control.boundingBox();
			expect(box!.height).toBeGreaterThanOrEqual(44);
		}
		expect(await blockingFindings(page)).toEqual([]);
		await context.close();
	});
});

test('a scenario’s own tariff is found by the same search and saved with its details', async ({
	page,
	baseURL
}) => {
	const caller = await callerOn(page, 'owner@example.org', baseURL!);
	const siteId = await createSite(caller, 'Scenario tariff search');
	const scenarioId = await baselineOf(caller.request, siteId);
	await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
	await page.getByText('Change the name, kind, tariff or one-off costs').click();
	await page.getByLabel(SEARCH).fill('Kestrel');
	await expect(page.getByRole('status').filter({ hasText: 'found for' })).toHaveText(
		'2 public tariffs found for “Kestrel”.'
	);
	await page
		.getByLabel('Tariff of this scenario')
		.selectOption({ label: 'Kestrel Sound Energy (invented) — Residential two-step' });
	await page.getByRole('button', { name: 'Save the details' }).click();
	await expect(page.getByText('Details saved.')).toBeVisible();
	await expect(page.getByTestId('scenario-tariff')).toContainText(
		'Priced on its own tariff: Kestrel Sound Energy (invented) — Residential two-step.'
	);
});
