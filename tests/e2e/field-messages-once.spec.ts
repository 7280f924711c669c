import { expect, test } from '@playwright/test';
import { gotoReady, signInWithPassword } from './helpers';

// Each field message shows once, at its field; summaries name fields in words (never a path such as
// "timezone:"). The live preview of the tariff form checks the same input as the save: here its answer
// is awaited before the save, the order that once showed the time-zone message twice on a busy machine.
const TIME_ZONE_MESSAGE = 'Time zone must be an IANA name such as America/Chicago';

test.describe('field messages show once, at their fields', () => {
	test('the live preview and the save never repeat the time zone’s message', async ({ page }) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, '/tariffs/new');
		const refused = page.waitForResponse(
			(r) => r.url().endsWith('/api/v1/calculate') && r.request().method() === 'POST' && r.status() === 400
		);
		await page.locator('#meta-utility').fill('Typed utility (invented)');
		await page.locator('#meta-name').fill('Typed tariff');
		await page.locator('#meta-timezone').fill('Mars/Olympus');
		await page.getByRole('textbox', { name: 'Source', exact: true }).fill('Invented for a test');
		// A new tariff starts empty; with its charges filled in, the preview asks the server.
		await page.locator('#meta-country').fill('US');
		await page.locator('#te-currency').fill('USD');
		await page.locator('#te-energyCharges-0-perKwh').fill('0.1');
		await refused;
		const preview = page.getByRole('complementary', { name: /^Preview/ });
		await expect(preview).toContainText('No preview until “Time zone” is corrected.');
		await expect(preview).toContainText('—');

		await page.getByRole('button', { name: 'Save the tariff' }).click();
		await expect(page.locator('#meta-timezone')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.locator('#meta-timezone-error')).toHaveText(TIME_ZONE_MESSAGE);
		await expect(page.getByText(TIME_ZONE_MESSAGE)).toHaveCount(1);
		await expect(page.getByRole('alert').filter({ hasText: 'attention' })).toContainText(
			'One field needs attention before this can be saved: Time zone.'
		);
		await expect(page.getByRole('main')).not.toContainText('timezone:');
		await expect(page.locator('#meta-utility')).toHaveValue('Typed utility (invented)');
		await expect(page.locator('#meta-timezone')).toHaveValue('Mars/Olympus');
	});

	test('the charges’ summary names the field and leaves the message to it', async ({ page }) => {
		await signInWithPassword(page, 'editor@example.org');
		await gotoReady(page, '/tariffs/new');
		await page.locator('#te-energyCharges-0-perKwh').fill('1');
		await page.locator('#te-energyCharges-0-perKwh').fill('');
		await expect(page.locator('#te-energyCharges-0-perKwh')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText('Per kWh is required')).toHaveCount(1);
		await expect(page.getByRole('link', { name: 'Energy charge 1 · Per kWh' })).toBeVisible();
		await expect(page.getByRole('main')).not.toContainText('energyCharges');
	});
});
