import { expect, test } from '@playwright/test';
import { gotoReady } from './helpers';

// The browser's time zone decides the month's hours; pin it.
test.use({ timezoneId: 'UTC' });

test.describe('the public quick estimate', () => {
	test('prices a 1 A, 120 V pump running all June at 0.34 per kWh at about 29.4 (common practice, no source)', async ({
		page
	}) => {
		await gotoReady(page, '/');
		await page.getByLabel('Energy price (per kWh)').fill('0.34');
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
});
