import { expect, test } from '@playwright/test';
import { gotoReady } from './helpers';

// The browser's time zone decides the month's hours; pin it.
test.use({ timezoneId: 'UTC' });

test.describe('the public quick estimate', () => {
	test('prices a 1 A, 120 V pump running all June at 0.34 per kWh at about 29.4 (common practice, no source)', async ({
		page
	}) => {
		await gotoReady(page, '/');
		await page.getByLabel('Energy price (USD per kWh)').fill('0.34');
		await page.getByLabel('Billing month').fill('2027-06');
		const result = page.getByRole('region', { name: /Estimate for June 2027/ });
		// 0.12 kW × 720 h = 86.4 kWh; × 0.34 = 29.376, rounded to the cent.
		await expect(result.getByRole('row', { name: /Total/ })).toContainText('86.4 kWh');
		await expect(result.getByRole('row', { name: /Total/ })).toContainText('$29.38');

		// Twelve times the current, twelve times the cost (flat rate).
		await page.getByLabel('Amps (A)').fill('12');
		await expect(result.getByRole('row', { name: /Total/ })).toContainText('$352.51');
	});

	test('adds a second device on a timer and shows each device with its share', async ({ page }) => {
		await gotoReady(page, '/');
		await page.getByLabel('Billing month').fill('2027-06');
		await page.getByRole('button', { name: 'Add a device' }).click();
		const second = page.getByRole('group', { name: 'Device 2' });
		await second.getByLabel('Name', { exact: true }).fill('Grow light');
		await second.getByRole('radio', { name: 'Watts' }).check();
		await second.getByLabel('Watts (W)').fill('200');
		await second.getByRole('radio', { name: 'Hours a day' }).check();
		await second.getByLabel('Hours per day').fill('12');
		const result = page.getByRole('region', { name: /Estimate for June 2027/ });
		// 0.2 kW × 12 h × 30 days = 72 kWh at the default 0.15 = 10.80.
		await expect(result.getByRole('row', { name: /Grow light/ })).toContainText('72');
		await expect(result.getByRole('row', { name: /Grow light/ })).toContainText('$10.80');
		await expect(result.getByRole('row', { name: /Total/ })).toContainText('158.4 kWh');
	});

	test('ties a bad value to its field and keeps what was typed', async ({ page }) => {
		await gotoReady(page, '/');
		await page.getByRole('radio', { name: 'Hours a day' }).check();
		await page.getByLabel('Hours per day').fill('30');
		await expect(page.getByLabel('Hours per day')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('Fix the highlighted fields to see the estimate.')).toBeVisible();
		await expect(page.getByLabel('Hours per day')).toHaveValue('30');
	});

	test('prices the devices on a library tariff, with the version in force that month', async ({ page }) => {
		await gotoReady(page, '/');
		await page.getByLabel('Billing month').fill('2026-06');
		await page.getByRole('radio', { name: 'A tariff from the library' }).check();
		// The list opens on the library's first page; the search box finds the rest, as a person would.
		await page.getByLabel('Find a tariff: utility, name or open-data label').fill('Northmere');
		await expect(page.getByRole('status').filter({ hasText: 'found for “Northmere”' })).toBeVisible();
		await page
			.getByLabel('Library tariff')
			.selectOption({ label: 'Northmere Electric (invented) — Residential time-of-use' });
		const result = page.getByRole('region', { name: /Estimate for June 2026/ });
		await expect(result.getByRole('row', { name: /Fixed and minimum charges/ })).toBeVisible();
		await result.getByText('The rule used').click();
		await expect(result).toContainText('Residential time-of-use (Northmere Electric (invented)), version 1');
		await page.getByLabel('Billing month').fill('2027-06');
		await expect(page.getByRole('region', { name: /Estimate for June 2027/ })).toContainText('version 2');
	});

	test('says which month and time zone the hours are counted in', async ({ page }) => {
		await gotoReady(page, '/?month=2027-01');
		const result = page.getByRole('region', { name: 'Estimate for January 2027 (31 days)' });
		// 31 days × 24 hours = 744 hours in UTC, which has no daylight-saving change.
		await expect(result).toContainText('January 2027: 744 hours, on Coordinated Universal Time (UTC).');
		await expect(result.getByRole('columnheader', { name: 'kWh in January 2027' })).toBeVisible();
	});

	test('holds an invalid entry back: its field is marked and no request is sent', async ({ page }) => {
		await gotoReady(page, '/');
		await expect(page.getByRole('row', { name: /Total/ })).toBeVisible();
		const sent: string[] = [];
		const refused: number[] = [];
		page.on('request', (r) => {
			if (r.url().endsWith('/api/v1/calculate')) sent.push(r.postData() ?? '');
		});
		page.on('response', (r) => {
			if (r.url().endsWith('/api/v1/calculate') && r.status() >= 400) refused.push(r.status());
		});
		await page.getByLabel('Amps (A)').fill('');
		// Marked at once, in the browser: before this change the mark came only with the server's 400.
		await expect(page.getByLabel('Amps (A)')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('Amps must be a number')).toHaveCount(1);
		await expect(page.getByText('Fix the highlighted fields to see the estimate.')).toBeVisible();
		// Then a good value: its answer arrives, and it is the only request sent since the page settled.
		const answered = page.waitForResponse((r) => r.url().endsWith('/api/v1/calculate') && r.ok());
		await page.getByLabel('Amps (A)').fill('2');
		await answered;
		await expect(page.getByLabel('Amps (A)')).not.toHaveAttribute('aria-invalid', 'true');
		expect(sent.map((body) => JSON.parse(body).equipment[0].power.amps)).toEqual([2]);
		expect(refused).toEqual([]);
	});

	test('keeps the entries in the address: a reload and the link bring them back', async ({ page }) => {
		await gotoReady(page, '/');
		await page.getByLabel('Billing month').fill('2027-03');
		await page.getByLabel('Name', { exact: true }).fill('Raft pump');
		await page.getByRole('radio', { name: 'Watts' }).check();
		await page.getByLabel('Watts (W)').fill('85');
		await page.getByLabel('Energy price (USD per kWh)').fill('0.21');
		await expect(page).toHaveURL(/month=2027-03/);
		await expect(page).toHaveURL(/d=1_85W_always_Raft\+pump/);

		await page.reload();
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
		await expect(page.getByLabel('Name', { exact: true })).toHaveValue('Raft pump');
		await expect(page.getByLabel('Watts (W)')).toHaveValue('85');
		await expect(page.getByLabel('Energy price (USD per kWh)')).toHaveValue('0.21');
		await expect(page.getByRole('region', { name: /Estimate for March 2027/ })).toBeVisible();
		const link = page.getByRole('link', { name: 'Link to this estimate' });
		await expect(link).toHaveAttribute('href', /kwh=0\.21/);
	});
});
