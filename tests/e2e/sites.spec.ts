import { expect, test } from '@playwright/test';
import { DEMO_WS, gotoReady, latestMail, linkIn, signInWithPassword, uniqueEmail } from './helpers';
import { demoSites } from './site-setup';

const pond = demoSites.sites[2]!;

test.describe('sites and scenarios', () => {
	test('an editor creates a site on a library tariff, duplicates its baseline and sees live results', async ({
		page
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, `/w/${DEMO_WS.id}/sites`);
		await page.getByRole('link', { name: 'Add a site' }).click();
		await expect(page.getByRole('heading', { name: 'Add a site' })).toBeVisible();
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
		await page.getByLabel('Site name').fill('Test tank room (invented)');
		await page.getByLabel('State or province (optional)').fill('WI');
		// The public library is reached by its search (other tests add public tariffs of their own).
		await page.getByLabel('Find a tariff: utility, name or open-data label').fill('Northmere');
		await expect(page.getByRole('status').filter({ hasText: 'found for “Northmere”' })).toBeVisible();
		await page
			.getByLabel('Tariff', { exact: true })
			.selectOption({ label: 'Northmere Electric (invented) — Farm service' });
		await page.getByRole('button', { name: 'Create the site' }).click();
		await expect(page.getByRole('heading', { name: 'Test tank room (invented)', level: 1 })).toBeVisible();
		await expect(page.getByText('Farm service')).toBeVisible();

		await page.getByLabel('Name', { exact: true }).fill('With a timer');
		await page.getByRole('button', { name: 'Create scenario' }).click();
		await expect(page.getByRole('heading', { name: 'With a timer', level: 1 })).toBeVisible();
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
		await page.getByRole('button', { name: /Add a device/ }).click();
		await expect(page.getByRole('region', { name: 'What it costs' })).toContainText('kWh');
		await page.getByRole('button', { name: 'Save the list' }).click();
		await expect(page.getByText('Saved.')).toBeVisible();
		await page.reload();
		await expect(page.getByText('All changes saved')).toBeVisible();
	});

	test('a scenario deleted by mistake comes back with undo, and the trail records both', async ({ page }) => {
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/sites/${pond.id}`);
		const timer = pond.scenarios[1]!.name;
		page.once('dialog', (d) => d.accept());
		await page.getByRole('button', { name: `Delete ${timer}` }).click();
		await expect(page.getByText(`Deleted "${timer}". You can undo this for 10 minutes.`)).toBeVisible();
		await expect(
			page.getByRole('list', { name: 'Scenarios' }).getByRole('link', { name: timer })
		).toHaveCount(0);
		await page.getByRole('button', { name: 'Undo' }).click();
		await expect(
			page.getByRole('list', { name: 'Scenarios' }).getByRole('link', { name: timer })
		).toBeVisible();
		const trail = page.getByRole('list', { name: 'Changes to this site' });
		await expect(trail).toContainText(`Deleted (can be undone for 10 minutes) "${timer}"`);
		await expect(trail).toContainText(`Restored "${timer}"`);
	});

	test('the dashboard shows each site with this month and the year; a viewer cannot change a scenario', async ({
		page
	}) => {
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, `/w/${DEMO_WS.id}/sites`);
		const list = page.getByRole('list', { name: 'Sites' });
		await expect(list.getByRole('listitem').filter({ hasText: pond.name })).toContainText('kWh this month');
		await expect(page.getByRole('link', { name: 'Add a site' })).toHaveCount(0);
		await gotoReady(page, `/sites/${pond.id}/scenarios/${pond.scenarios[0]!.id}`);
		await expect(page.getByRole('button', { name: 'Save the list' })).toHaveCount(0);
		await expect(page.getByText('Electrical safety.')).toBeVisible();
		const res = await page.request.put(`/api/v1/scenarios/${pond.scenarios[0]!.id}/equipment`, {
			data: { expectedRevision: 1, devices: [] }
		});
		expect(res.status()).toBe(403);
	});

	test('a stale save gets a conflict and keeps the edits on the page', async ({ page, browser }) => {
		await signInWithPassword(page, 'owner@example.org');
		const url = `/sites/${pond.id}/scenarios/${pond.scenarios[0]!.id}`;
		const other = await (
			await browser.newContext({ storageState: await page.context().storageState() })
		).newPage();
		await gotoReady(page, url);
		await gotoReady(other, url);
		await page.getByRole('button', { name: /Add a device/ }).click();
		await page.getByRole('button', { name: 'Save the list' }).click();
		await expect(page.getByText('Saved.')).toBeVisible();
		await other.getByRole('button', { name: /Add a device/ }).click();
		await other.getByRole('button', { name: 'Save the list' }).click();
		await expect(other.getByText(/Someone else saved this scenario while you were editing/)).toBeVisible();
		await expect(other.getByText('Changes not saved')).toBeVisible();
	});

	test('an owner shares one site with a client, who sees that site only', async ({ page, browser }) => {
		const hatchery = demoSites.sites[0]!;
		const email = uniqueEmail('client');
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/sites/${hatchery.id}`);
		await page.locator('#share-email').fill(email);
		await page.getByLabel('As', { exact: true }).selectOption('viewer');
		await page.getByRole('button', { name: 'Share', exact: true }).click();
		await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();

		const mail = await latestMail(email, /is shared with you/);
		const client = await (await browser.newContext()).newPage();
		await gotoReady(client, new URL(linkIn(mail.text)).pathname);
		await expect(client.getByText('of this site only')).toBeVisible();
		await client.getByLabel('Your name').fill('Client (invented)');
		await client.getByLabel('Password', { exact: true }).fill('client password 123');
		await client.getByLabel('Password again').fill('client password 123');
		await client.getByRole('button', { name: 'Create account and join' }).click();
		await expect(client.getByRole('heading', { name: hatchery.name, level: 1, exact: true })).toBeVisible();
		await expect(client.getByRole('button', { name: 'Create scenario' })).toHaveCount(0);
		for (const other of [`/sites/${demoSites.sites[1]!.id}`, `/w/${DEMO_WS.id}`])
			expect((await client.request.get(other, { maxRedirects: 0 })).status(), other).toBe(404);
		const response = await client.goto(`/sites/${demoSites.sites[1]!.id}`);
		expect(response?.status()).toBe(404);
		await expect(client.getByRole('main')).toContainText('Not found');
		await gotoReady(client, `/sites/${hatchery.id}`);
		await expect(client.getByRole('heading', { name: hatchery.name, level: 1, exact: true })).toBeVisible();

		await page.reload();
		await expect(page.getByRole('list', { name: 'Shared with' })).toContainText('Client (invented)');
	});
});
