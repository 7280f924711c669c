import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { blockingFindings, phoneWithAxe } from './axe';
import { createWorkspace, gotoReady, signInWithPassword } from './helpers';

// One rate of the open rate database, imported through the tariff library's page in a real browser. The
// rates are the public samples of tests/fixtures/urdb/; the workspace they go into is made here (invented),
// so a repeated run meets no earlier import of the same label.
const RS1 = 'tests/fixtures/urdb/fpl-rs1-2015.json';
const GEORGIA = 'tests/fixtures/urdb/georgia-power-tou-reo-2013.json';

test.describe('import from the open rate database', () => {
	test('a pasted FPL RS-1 reads in plain words with its notes, saves once, and opens as a tariff', async ({
		page
	}) => {
		const workspace = `Open data ${Date.now()} (invented)`;
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, '/workspaces');
		await createWorkspace(page, workspace);

		await gotoReady(page, '/tariffs');
		await page.getByRole('link', { name: 'Import from the open rate database' }).click();
		await expect(
			page.getByRole('heading', { name: 'Import a rate from the open rate database' })
		).toBeVisible();
		await page.getByLabel('The rate’s JSON').fill(readFileSync(RS1, 'utf8'));
		await page.getByRole('button', { name: 'Read the rate' }).click();

		// rate + adj per kWh to 1,000 kWh, then above (tests/fixtures/urdb/README.md).
		await expect(
			page.getByText(
				'Energy: $0.08721 per kWh for the first 1,000 kWh of each billing period, then $0.10803 per kWh.'
			)
		).toBeVisible();
		const notes = page.getByRole('region', { name: 'Notes on the import' });
		// RS-1's free-text energy comments are named, not priced.
		await expect(notes).toContainText('energycomments is not priced by Runrate');
		// The message names its field, so the field is not printed before it again.
		await expect(notes).not.toContainText('energycomments: energycomments');
		await expect(notes).toContainText('Holidays: none.');
		const provenance = page.getByRole('region', { name: 'Where the rate comes from' });
		await expect(provenance).toContainText('Florida Power & Light Co.');
		await expect(provenance).toContainText('from 2015-06-01 to 2015-08-31');
		await expect(provenance).toContainText('5550d6fd5457a3187e8b4567');

		await page.getByLabel('Save it to').selectOption({ label: `${workspace} (private to the workspace)` });
		await page.getByLabel('Time zone of the utility’s hours').selectOption('America/New_York');
		await page.getByRole('button', { name: 'Save the tariff' }).click();
		await expect(page).toHaveURL(/\/tariffs\/[\w-]+\?published=1$/);
		await expect(page.getByRole('heading', { level: 1, name: 'RS-1 Residential Service' })).toBeVisible();
		await expect(page.getByText('Version 1 is saved, private to your workspace.')).toBeVisible();
		const saved = page.url();

		// The same rate again, into the same workspace: a message with a link to the one saved.
		await gotoReady(page, '/tariffs/open-data');
		await page.getByLabel('The rate’s JSON').fill(readFileSync(RS1, 'utf8'));
		await page.getByRole('button', { name: 'Read the rate' }).click();
		await expect(page.getByText('This rate is already in your library:')).toBeVisible();
		await page.getByLabel('Save it to').selectOption({ label: `${workspace} (private to the workspace)` });
		await page.getByLabel('Time zone of the utility’s hours').selectOption('America/New_York');
		await page.getByRole('button', { name: 'Save the tariff' }).click();
		await expect(page.getByText('is already in this workspace: nothing new was saved.')).toBeVisible();
		await page.getByRole('link', { name: 'RS-1 Residential Service' }).click();
		await expect(page).toHaveURL(saved.replace(/\?published=1$/, ''));
	});

	test('an uploaded Georgia Power file shows its time-of-use chart and periods; bad JSON is refused at the field', async ({
		page
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, '/tariffs/open-data');
		await page.getByLabel(/Or a \.json file/).setInputFiles(GEORGIA);
		await page.getByRole('button', { name: 'Read the rate' }).click();

		const tou = page.getByRole('region', { name: 'When each time-of-use rate applies' });
		await expect(tou).toBeVisible();
		await expect(tou.getByRole('figure').first()).toBeVisible();
		await expect(
			page.getByText('Energy, June–September: Period 2 $0.24814 per kWh on weekdays 14:00–19:00')
		).toBeVisible();
		await expect(page.getByRole('region', { name: 'Where the rate comes from' })).toContainText(
			'Schedule TOU-REO-7 - Time of Use - Residential'
		);
		// The file's text is on show (and posted again on save).
		await expect(page.getByLabel('The rate’s JSON')).toHaveValue(/539f6d9eec4f024411ecb875/);

		await page.getByLabel(/Or a \.json file/).setInputFiles([]);
		await page.getByLabel('The rate’s JSON').fill('{"label": "oops",');
		await page.getByRole('button', { name: 'Read the rate' }).click();
		await expect(page.getByLabel('The rate’s JSON')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('This is not valid JSON.', { exact: false })).toBeVisible();
		await expect(page.getByRole('button', { name: 'Save the tariff' })).toHaveCount(0);
	});

	test('on a 390 px phone the read rate fits the screen, its buttons are 44 px, and axe finds nothing serious', async ({
		browser,
		baseURL
	}) => {
		const { context, page } = await phoneWithAxe(browser, baseURL);
		await signInWithPassword(page, 'editor@example.org');
		for (const [fill, heading] of [
			[async () => page.getByLabel('The rate’s JSON').fill(readFileSync(RS1, 'utf8')), 'Tiers'],
			[
				async () => page.getByLabel(/Or a \.json file/).setInputFiles(GEORGIA),
				'When each time-of-use rate applies'
			]
		] as const) {
			await gotoReady(page, '/tariffs/open-data');
			await fill();
			await page.getByRole('button', { name: 'Read the rate' }).click();
			await expect(page.getByRole('heading', { name: heading })).toBeVisible();
			expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
			// Every field of the save form fits inside the form, not cut off at its right edge.
			const saveForm = page.getByRole('form', { name: 'Save it in the library' });
			const form = await saveForm.boundingBox();
			for (const field of await saveForm.getByRole('combobox').all()) {
				const box = await field.boundingBox();
				expect(box!.x + box!.width, (await field.getAttribute('name')) ?? 'a select').toBeLessThanOrEqual(
					form!.x + form!.width
				);
			}
			for (const name of ['Read the rate', 'Save the tariff']) {
				const box = await page.getByRole('button', { name }).boundingBox();
				expect(box!.height, name).toBeGreaterThanOrEqual(44);
			}
			expect(await blockingFindings(page)).toEqual([]);
		}
		await context.close();
	});
});
