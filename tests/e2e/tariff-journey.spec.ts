import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { greenButtonXml } from '../../src/lib/server/usage/green-button-fixture';
import { createWorkspace, gotoReady, signInWithPassword } from './helpers';

// The whole journey in one browser: a person imports a real rate of the open rate database (the
// public FPL RS-1 sample of tests/fixtures/urdb/), reads it in plain words, puts a site on it, imports a
// year of Green Button readings (invented, greenbutton.example.org) and sees which tariff would have been
// cheapest. The workspace and the site are made here and invented.
const RS1 = 'tests/fixtures/urdb/fpl-rs1-2015.json';

/** 2026 in hourly readings, New York time (05:00 UTC is local midnight): 1.5 kWh at night, 0.5 by day. */
function yearOfHours(): string {
	const start = Date.UTC(2026, 0, 1, 5) / 1000;
	return greenButtonXml({
		start,
		readings: 365 * 24 + 24,
		seconds: 3600,
		value: (i) => {
			const hour = new Date((start + i * 3600) * 1000).getUTCHours();
			return (hour + 19) % 24 >= 22 || (hour + 19) % 24 < 6 ? 1500 : 500;
		}
	});
}

test('a real rate imported, put on a site, and a Green Button year priced on every tariff the site may use', async ({
	page,
	baseURL
}) => {
	const workspace = `Journey ${Date.now()} (invented)`;
	await signInWithPassword(page, 'owner@example.org');
	await gotoReady(page, '/workspaces');
	await createWorkspace(page, workspace);
	const workspaceId = /\/w\/([\w-]+)/.exec(page.url())?.[1];
	expect(workspaceId).toBeTruthy();

	// The rate, read in plain words and saved to the workspace.
	await gotoReady(page, '/tariffs/open-data');
	await page.getByLabel('The rate’s JSON').fill(readFileSync(RS1, 'utf8'));
	await page.getByRole('button', { name: 'Read the rate' }).click();
	// rate + adj to 1,000 kWh, then above (tests/fixtures/urdb/README.md: 0.07531 + 0.0119; 0.09613 + 0.0119).
	await expect(
		page.getByText(
			'Energy: $0.08721 per kWh for the first 1,000 kWh of each billing period, then $0.10803 per kWh.'
		)
	).toBeVisible();
	await page.getByLabel('Save it to').selectOption({ label: `${workspace} (private to the workspace)` });
	await page.getByLabel('Time zone of the utility’s hours').selectOption('America/New_York');
	// The sample ended in 2015; the person prices it as the rate still billed, as the form offers.
	await page.getByLabel('Price it as still in force: leave out the end date (2015-08-31)').check();
	await page.getByRole('button', { name: 'Save the tariff' }).click();
	await expect(page).toHaveURL(/\/tariffs\/[\w-]+\?published=1$/);
	const tariffId = /\/tariffs\/([\w-]+)/.exec(page.url())?.[1];

	// A site billed on it.
	const created = await page.request.post('/api/v1/sites', {
		headers: { origin: baseURL! },
		data: {
			workspaceId,
			name: 'Journey barn (invented)',
			timezone: 'America/New_York',
			country: 'US',
			currency: 'USD',
			tariffId
		}
	});
	expect(created.status()).toBe(201);
	const siteId = (await created.json()).id as string;
	await gotoReady(page, `/sites/${siteId}`);
	await expect(page.getByText('RS-1 Residential Service').first()).toBeVisible();

	// A year of readings through the usage page's form.
	await page.getByRole('link', { name: 'Metered usage' }).click();
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
	await page.getByLabel(/Usage file/).setInputFiles({
		name: 'journey-2026.xml',
		mimeType: 'application/xml',
		buffer: Buffer.from(yearOfHours())
	});
	await page.getByRole('button', { name: 'Import' }).click();
	await expect(page.getByText('Imported 8,784 intervals.')).toBeVisible();

	// Which tariff: the stored year on RS-1 and on every public tariff in force all of 2026.
	await page.getByRole('link', { name: 'Which tariff is cheapest for this usage?' }).click();
	await expect(page.getByRole('heading', { level: 1, name: 'Which tariff is cheapest?' })).toBeVisible();
	await expect(page.getByText('January 2026 – December 2026, 8,760 values of 60 minutes')).toBeVisible();
	const table = page.getByRole('region', { name: 'Tariffs ranked by annual cost' });
	const current = table.getByRole('row').filter({ has: page.getByText('current', { exact: true }) });
	await expect(current).toHaveCount(1);
	await expect(current).toContainText('RS-1 Residential Service');
	await expect(current.getByRole('link')).toHaveAttribute('href', `/tariffs/${tariffId}`);
	// Derived from the readings: 20 kWh a day, 7,300 kWh in the local year, no month over 1,000 kWh, so all
	// at 0.08721: 636.63 of energy (a cent or two either way from rounding each month), plus 12 × 7.57 fixed.
	await expect(current).toContainText(/\$727\.[45]\d/);
	expect(await table.getByRole('row').count()).toBeGreaterThan(2);
	await expect(page.getByRole('heading', { level: 2, name: /comes first$/ })).toBeVisible();
});
