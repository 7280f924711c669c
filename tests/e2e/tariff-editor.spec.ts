import { type Page, expect, test } from '@playwright/test';
import { gotoReady, signInWithPassword } from './helpers';

// The tariff editor as an editor of a workspace uses it: a new tariff starts empty, the country and the
// currency are asked once, the preview waits for a form without marked fields, a summer-only
// time-of-use adder needs no dummy season, and a workspace's own tariff is saved, never "published".
test('an editor adds a private tariff with a summer-only time-of-use adder', async ({ page }) => {
	await signInWithPassword(page, 'editor@example.org');
	await gotoReady(page, '/tariffs/new');

	// Empty, with examples only as placeholders.
	await expect(page.locator('#meta-timezone')).toHaveValue('');
	await expect(page.locator('#meta-country')).toHaveValue('');
	await expect(page.locator('#te-currency')).toHaveValue('');
	await expect(page.locator('#te-energyCharges-0-perKwh')).toHaveValue('');
	await expect(page.getByText('Holiday country')).toHaveCount(0);
	await expect(page.getByLabel('Currency', { exact: true })).toHaveCount(1);
	const preview = page.getByRole('complementary', { name: /^Preview/ });
	await expect(preview).toContainText('Fill in the fields to see the preview.');
	await expect(page.getByRole('button', { name: 'Save the tariff' })).toBeVisible();
	await expect(page.getByText('private to your workspace; saved versions are never changed')).toBeVisible();

	const name = `Summer adder ${Date.now()} (invented)`;
	await page.locator('#meta-utility').fill('Invented Test Power');
	await page.locator('#meta-name').fill(name);
	await page.locator('#meta-country').fill('US');
	await page.locator('#meta-timezone').fill('America/Chicago');
	await page.getByRole('textbox', { name: 'Source', exact: true }).fill('Invented for a test');
	await page.locator('#te-currency').fill('USD');
	await page.locator('#te-energyCharges-0-perKwh').fill('0.1');

	// A field marked: no figure.
	await page.locator('#te-energyCharges-0-perKwh').fill('');
	await expect(preview).toContainText('Fix the fields marked to see the preview.');
	await expect(preview).not.toContainText('$');
	await page.locator('#te-energyCharges-0-perKwh').fill('0.1');

	// The adder: time-of-use, only in June–September, one season, no dummy season for the other months.
	await page.getByRole('button', { name: 'Add an energy charge' }).click();
	await page.locator('#te-energyCharges-1-label').fill('Summer peak adder');
	await page.locator('#te-energyCharges-1-type').selectOption('tou');
	await page.locator('#te-energyCharges-1-months-only').check();
	const months = page.locator('#te-energyCharges-1-months');
	for (const month of ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Oct', 'Nov', 'Dec'])
		await months.getByRole('button', { name: month, exact: true }).click();
	await expect(
		page.locator('#te-energyCharges-1-seasons-0-months').getByRole('button', { pressed: true })
	).toHaveText(['Jun', 'Jul', 'Aug', 'Sep']);
	const priced = page.waitForResponse((r) => r.url().endsWith('/api/v1/calculate') && r.status() === 200);
	await page.locator('#te-energyCharges-1-seasons-0-periods-0-perKwh').fill('0.05');
	await expect(page.getByText('The tariff checks out.')).toBeVisible();
	await expect(page.getByText(/Every month needs a season/)).toHaveCount(0);

	await priced;
	await expect(preview).toContainText('$');
	await expect(preview).toContainText('calendar year in America/Chicago divided by 12');

	await page.getByRole('button', { name: 'Save the tariff' }).click();
	await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(page.getByRole('status').filter({ hasText: 'saved' })).toHaveText(
		'Version 1 is saved, private to your workspace.'
	);
	await expect(page.getByText(/Summer peak adder, June–September/).first()).toBeVisible();
	await expect(page.getByRole('link', { name: 'Add a new version' })).toBeVisible();
	// Our own tariff: no "Make our copy" into the workspace that owns it.
	await expect(page.getByRole('button', { name: 'Make our copy' })).toHaveCount(0);
	await expect(page.getByText(/Priced on version 1, in force since/)).toBeVisible();
	await expect(page.getByText(/Published/)).toHaveCount(0);
});

/** Signs in as an editor and fills a new tariff's details and one flat energy charge; gives its name. */
async function newTariff(page: Page, what: string): Promise<string> {
	await signInWithPassword(page, 'editor@example.org');
	await gotoReady(page, '/tariffs/new');
	const name = `${what} ${Date.now()} (invented)`;
	await page.locator('#meta-utility').fill('Invented Test Power');
	await page.locator('#meta-name').fill(name);
	await page.locator('#meta-country').fill('US');
	await page.locator('#meta-timezone').fill('America/Chicago');
	await page.getByRole('textbox', { name: 'Source', exact: true }).fill('Invented for a test');
	await page.locator('#te-currency').fill('USD');
	await page.locator('#te-energyCharges-0-perKwh').fill('0.1');
	return name;
}

// The charges real tariffs use (issue 19) in the editor: tiered demand, a ratchet checked at its field,
// a daily minimum; saved, the tariff page reads them in plain words. Invented rates.
test('an editor saves tiered, ratcheted demand and a daily minimum', async ({ page }) => {
	const name = await newTariff(page, 'Ratchet');

	await page.getByRole('button', { name: 'Add a demand charge' }).click();
	await page.locator('#te-demandCharges-0-pricing').selectOption('tiers');
	await page.locator('#te-demandCharges-0-tiers-0-perKw').fill('10');
	await page.locator('#te-demandCharges-0-tiers-1-perKw').fill('15');
	await page.getByLabel('Ratchet: bill at least a share of an earlier peak').check();
	const percent = page.locator('#te-demandCharges-0-ratchet-percent');
	await percent.fill('250');
	await expect(percent).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText(/Ratchet percent/).first()).toBeVisible();
	await percent.fill('80');
	await expect(percent).not.toHaveAttribute('aria-invalid', 'true');
	await page.locator('#te-minimumPerDay').fill('0.5');
	await expect(page.getByText('The tariff checks out.')).toBeVisible();

	await page.getByRole('button', { name: 'Save the tariff' }).click();
	await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(
		page.getByText(/\$10\.00 per kW for the first 100 kW, then \$15\.00 per kW/).first()
	).toBeVisible();
	await expect(page.getByText(/billed on at least 80% of the highest peak/).first()).toBeVisible();
	await expect(page.getByText('Minimum bill: $0.50 a day of the billing period.')).toBeVisible();
});

// A demand charge of every day measured on weekday nights and all day at weekends (issue 19): the
// weekend hours are their own list, their message shows at them, and the saved tariff reads the rule.
test('an editor saves a demand charge with other hours at weekends', async ({ page }) => {
	const name = await newTariff(page, 'Weekend demand');

	await page.getByRole('button', { name: 'Add a demand charge' }).click();
	await page.locator('#te-demandCharges-0-perKw').fill('3');
	await page.getByLabel('Only at some hours').check();
	await page.locator('#te-demandCharges-0-windows-0-start').selectOption('20:00');
	await page.locator('#te-demandCharges-0-windows-0-end').selectOption('15:00');
	await page.getByLabel('Other hours at weekends').check();
	await expect(page.locator('#te-demandCharges-0-weekendWindows-0-start')).toHaveValue('00:00');
	await expect(page.locator('#te-demandCharges-0-weekendWindows-0-end')).toHaveValue('24:00');

	const message = 'Other hours at weekends need a charge measured every day';
	await page.locator('#te-demandCharges-0-days').selectOption('weekdays');
	await expect(page.locator('#te-demandCharges-0-weekendWindows')).toContainText(message);
	await expect(page.getByText(message)).toHaveCount(1);
	await page.locator('#te-demandCharges-0-days').selectOption('all');
	await expect(page.getByText(message)).toHaveCount(0);
	await expect(page.getByText('The tariff checks out.')).toBeVisible();

	await page.getByRole('button', { name: 'Save the tariff' }).click();
	await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
	await expect(page.getByText(/\(weekdays 20:00–15:00 and all day at weekends\)/).first()).toBeVisible();
});
