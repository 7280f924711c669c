import { expect, test, type Page } from '@playwright/test';
import { readFileSync, writeFileSync } from 'node:fs';
import { DEMO_WS, gotoReady, signInWithPassword } from './helpers';

const byName = (name: string) =>
	(
		JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string; name: string }[] }
	).tariffs.find((t) => t.name === name)!.id;

async function publish(page: Page, effectiveFrom: string, note: string) {
	await page.getByLabel('In force from').fill(effectiveFrom);
	await page.getByLabel('What changed (shown in the version history)').fill(note);
	await page.getByRole('button', { name: /^Publish/ }).click();
}

test.describe('the tariff library', () => {
	test('anyone can search as they type, filter by structure and read a tariff in plain words', async ({
		page
	}) => {
		await gotoReady(page, '/tariffs');
		const list = page.getByRole('list', { name: 'Tariffs' });
		await page.getByLabel('Search').fill('irrigation');
		await expect(list.getByRole('listitem')).toHaveCount(1);
		await expect(page).toHaveURL(/q=irrigation/);
		await page.getByLabel('Search').fill('Northmere');
		await page.getByLabel('Has').selectOption('tou');
		await expect(list.getByRole('listitem')).toHaveCount(2);
		await expect(list).toContainText('Residential time-of-use');

		await list.getByRole('link', { name: 'Residential time-of-use' }).click();
		await expect(page.getByRole('heading', { name: /Residential time-of-use/, level: 1 })).toBeVisible();
		await expect(page.getByText('a typical month for 1 kW always on')).toBeVisible();
		await expect(page.getByRole('heading', { name: 'When each time-of-use rate applies' })).toBeVisible();
		// Version 2 starts 2027-01-01: "from" it while in the future, "in force from" it once in force.
		await expect(page.getByRole('heading', { name: /Version 2: (in force )?from 2027-01-01/ })).toBeVisible();
		await expect(page.getByText('What changed from version 1')).toBeVisible();
	});

	test('an admin publishes a new version of a public tariff; the old one stays as it was', async ({
		page
	}) => {
		const id = byName('Residential service');
		await signInWithPassword(page, 'admin@example.org');
		await gotoReady(page, `/tariffs/${id}/edit`);
		await page.getByRole('group', { name: 'Rider 1' }).getByLabel('Per kWh').fill('0.0123');
		await publish(page, '2028-01-01', 'Rider raised (invented test change).');
		await expect(page).toHaveURL(new RegExp(`/tariffs/${id}\\?published=3`));
		await expect(page.getByRole('heading', { name: /Version 3: (in force )?from 2028-01-01/ })).toBeVisible();
		const v3 = page.getByRole('listitem').filter({ hasText: 'Version 3:' });
		await expect(v3).toContainText('$0.0123');
		await expect(v3).toContainText('Rider raised (invented test change).');
		await expect(page.getByRole('heading', { name: /Version 2: (in force )?from 2027-01-01/ })).toBeVisible();
	});

	test('a second person saving over a stale copy gets a conflict instead of overwriting', async ({
		page,
		browser
	}) => {
		const id = byName('Residential two-step');
		await signInWithPassword(page, 'admin@example.org');
		const other = await (
			await browser.newContext({ storageState: await page.context().storageState() })
		).newPage();
		await gotoReady(page, `/tariffs/${id}/edit`);
		await gotoReady(other, `/tariffs/${id}/edit`);
		await publish(page, '2028-02-01', 'First editor (invented).');
		await expect(page).toHaveURL(/published=/);
		await publish(other, '2028-03-01', 'Second editor (invented).');
		await expect(
			other.getByText('Someone else published a version of this tariff while you were editing.')
		).toBeVisible();
		await gotoReady(other, `/tariffs/${id}`);
		await expect(other.getByText('First editor (invented).')).toBeVisible();
		await expect(other.getByText('Second editor (invented).')).toHaveCount(0);
	});

	test('an editor copies a public tariff into the workspace and exports it as JSON, which the editor takes back', async ({
		page
	}, info) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, `/tariffs/${byName('Farm service')}`);
		await page.getByLabel(/Copy into a workspace/).selectOption(DEMO_WS.id);
		await page.getByRole('button', { name: 'Make our copy' }).click();
		await expect(page.getByRole('heading', { name: /Farm service \(our copy\)/ })).toBeVisible();
		await expect(page.getByText('Our workspace ·')).toBeVisible();

		const download = page.waitForEvent('download');
		await page.getByRole('link', { name: /Download version 1 as JSON/ }).click();
		const file = info.outputPath('tariff.json');
		await (await download).saveAs(file);
		const exported = JSON.parse(readFileSync(file, 'utf8'));
		expect(exported.format).toBe('runrate-tariff-version');
		exported.meta.name = 'Farm service (from a file)';
		writeFileSync(file, JSON.stringify(exported));

		await gotoReady(page, '/tariffs/new');
		await page.getByLabel(/Fill the form from a Runrate tariff JSON file/).setInputFiles(file);
		await expect(page.getByText('Loaded tariff.json')).toBeVisible();
		await expect(page.locator('#meta-name')).toHaveValue('Farm service (from a file)');
		// A workspace's own tariff is saved, private to it; only the public library publishes.
		await page.getByRole('button', { name: 'Save the tariff' }).click();
		await expect(page.getByRole('heading', { name: /Farm service \(from a file\)/ })).toBeVisible();
	});

	test('bad input is refused at the field, and nothing typed is lost', async ({ page }) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, '/tariffs/new');
		await page.locator('#meta-utility').fill('Typed utility (invented)');
		await page.locator('#meta-name').fill('Typed tariff');
		await page.locator('#meta-timezone').fill('Mars/Olympus');
		await page.getByRole('textbox', { name: 'Source', exact: true }).fill('Invented for a test');
		await page.getByRole('button', { name: 'Save the tariff' }).click();
		await expect(page.locator('#meta-timezone')).toHaveAttribute('aria-invalid', 'true');
		// The field's own message; the live preview may say the same about the zone once it has answered.
		await expect(page.locator('#meta-timezone-error')).toHaveText(
			'Time zone must be an IANA name such as America/Chicago'
		);
		await expect(page.locator('#meta-utility')).toHaveValue('Typed utility (invented)');
		await expect(page.locator('#meta-name')).toHaveValue('Typed tariff');
	});

	test('a sheet import reports each refused row and imports the valid ones together', async ({
		page
	}, info) => {
		await signInWithPassword(page, 'editor@example.org');
		const template = await (await page.request.get('/tariffs/import/template.csv')).text();
		const [header, ...rows] = template.trim().split(/\r?\n/);
		const bad = rows[0]!.replace(',Invented for the template,', ',,'); // drop the required source
		const file = info.outputPath('tariffs.csv');
		writeFileSync(
			file,
			[header, ...rows.map((r) => r.replace(/^[^,]*/, (u) => `${u} ${Date.now()}`)), bad].join('\n')
		);

		await gotoReady(page, '/tariffs/import');
		await page.getByLabel(/Sheet/).setInputFiles(file);
		await page.getByRole('button', { name: 'Check only' }).click();
		await expect(page.getByRole('main')).toContainText('Checked: 2 rows are ready; nothing was imported.');
		await expect(page.getByRole('main')).toContainText('Row 4, source: Source is required');

		await page.getByLabel(/Sheet/).setInputFiles(file);
		await page.getByRole('button', { name: 'Import the valid rows' }).click();
		await expect(page.getByRole('main')).toContainText('Imported 2 tariffs.');
		await expect(page.getByRole('main')).toContainText('Row 4, source: Source is required');
	});

	test('a tariff page lists where the reader’s workspaces use it, and nothing of other workspaces', async ({
		page
	}) => {
		const id = byName('Agricultural irrigation pumping');
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/tariffs/${id}`);
		await expect(page.getByRole('region', { name: 'Where your workspaces use it' })).toContainText(
			'Alder Creek trout hatchery (demo)'
		);
		await page.getByRole('button', { name: 'Sign out' }).click();
		await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' })).toBeVisible();
		await signInWithPassword(page, 'grower@example.org');
		await gotoReady(page, `/tariffs/${id}`);
		await expect(page.getByText('Alder Creek')).toHaveCount(0);
	});
});
