import { expect, test, type Locator, type Page } from '@playwright/test';
import { AXE_CONTEXT, blockingFindings, describeFindings } from './axe';
import { gotoReady, signInWithPassword } from './helpers';
import { createSite } from './site-setup';

// Issue 18, a site's water: a grower at the tank records a tank on a phone, with a temperature for each
// month, and sees it on the site page; a bad volume is named once, at its box, and nothing typed is lost.
// Sites and tanks are invented.

const PHONE = { width: 390, height: 844 };
const DESK = { width: 1366, height: 900 };
test.use({ viewport: PHONE, contextOptions: AXE_CONTEXT });

/** A pond whose water follows the seasons, °C January first (invented). */
const MONTHS = ['10', '10', '12', '14', '18', '22', '26', '26', '22', '18', '14', '12'];

const tankGroup = (page: Page, n: number) =>
	page.getByRole('group', { name: new RegExp(`^Tank or pond ${n}`) });

async function expectNoSidewaysScroll(page: Page) {
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
}

/** 44 × 44 px at least: wet or gloved hands at the tank. */
async function expectTappable(control: Locator) {
	await expect(control).toBeVisible();
	const box = (await control.boundingBox())!;
	expect(box.width, `width of ${await control.getAttribute('id')}`).toBeGreaterThanOrEqual(44);
	expect(box.height, `height of ${await control.getAttribute('id')}`).toBeGreaterThanOrEqual(44);
}

test.beforeEach(async ({ page }) => {
	await signInWithPassword(page, 'owner@example.org');
});

test('on a phone, a tank with monthly temperatures is added in the site form and shown on the site page', async ({
	page
}) => {
	const siteId = await createSite({ request: page.request }, 'Water phone test site');
	await gotoReady(page, `/sites/${siteId}`);
	const water = page.getByRole('region', { name: 'Water' });
	await expect(water).toContainText('No tanks or ponds recorded yet.');
	await water.getByRole('link', { name: 'Add your tanks' }).click();
	await expect(page.getByRole('heading', { name: 'Edit the site', level: 1 })).toBeVisible();
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

	await page.getByLabel('Altitude (m)').fill('250');
	await expect(page.getByText('= 820 ft')).toBeVisible();
	await page.getByRole('button', { name: 'Add a tank or pond' }).click();
	const tank = tankGroup(page, 1);
	await expect(tank.getByLabel('Name', { exact: true })).toBeFocused();
	await tank.getByLabel('Name', { exact: true }).fill('Grow-out 1 (invented)');
	await tank.getByLabel('Volume', { exact: true }).fill('1000');
	// 1000 L = 264.17 US gal (NIST SP 811: 3.785 411 784 L a gallon).
	await expect(tank.getByText('= 264.2 US gal')).toBeVisible();
	await tank.getByLabel('Depth unit').selectOption({ label: 'feet' });
	await tank.getByLabel('Depth', { exact: true }).fill('4');
	await expect(tank.getByText('= 1.22 m')).toBeVisible();
	await tank.getByLabel('Water temperature varies by month').check();
	for (const [m, month] of [
		'January',
		'February',
		'March',
		'April',
		'May',
		'June',
		'July',
		'August',
		'September',
		'October',
		'November',
		'December'
	].entries())
		await tank.getByLabel(`${month} (°C)`).fill(MONTHS[m]!);
	await tank.getByLabel('Fish (kg)').fill('40');
	await tank.getByLabel('Daily feed (kg/day)').fill('0.8');
	await tank.getByLabel('Feed protein (%)').fill('40');

	await expectNoSidewaysScroll(page);
	for (const control of [
		tank.getByLabel('Name', { exact: true }),
		tank.getByLabel('Volume', { exact: true }),
		tank.getByLabel('Volume unit'),
		tank.getByLabel('Depth unit'),
		tank.getByLabel('Water', { exact: true }),
		tank.locator('label').filter({ hasText: 'Water temperature varies by month' }),
		tank.getByLabel('January (°C)'),
		tank.getByRole('button', { name: 'Remove tank or pond 1' }),
		page.getByRole('button', { name: 'Add a tank or pond' })
	])
		await expectTappable(control);

	await page.getByRole('button', { name: 'Save the site' }).click();
	await expect(page).toHaveURL(new RegExp(`/sites/${siteId}$`));
	const shown = page.getByRole('region', { name: 'Water' });
	await expect(shown).toContainText('Altitude 250 m (820 ft)');
	const card = shown.getByRole('listitem').filter({ hasText: 'Grow-out 1 (invented)' });
	await expect(card).toContainText('1,000 L (264 US gal)');
	await expect(card).toContainText('1.22 m (4 ft)');
	await expect(card).toContainText('Fresh water');
	await expect(card).toContainText('by month, 10–26 °C (50–79 °F)');
	await expect(card).toContainText('40 kg');
	await expect(card).toContainText('0.8 kg/day at 40 % protein');
	await expect(page.getByRole('list', { name: 'Changes to this site' })).toContainText(
		"Altitude 0 m → 250 m; Added tank 'Grow-out 1 (invented)'"
	);
	await expectNoSidewaysScroll(page);

	// Reopened, the form shows the stored litres and metres and the twelve months.
	await gotoReady(page, `/sites/${siteId}/edit`);
	const again = tankGroup(page, 1);
	await expect(again.getByLabel('Volume', { exact: true })).toHaveValue('1000');
	await expect(again.getByLabel('Depth', { exact: true })).toHaveValue('1.2192');
	await expect(again.getByLabel('Water temperature varies by month')).toBeChecked();
	await expect(again.getByLabel('July (°C)')).toHaveValue('26');
});

test('a bad volume gets one message at its box, keeps everything typed, and the tank editor passes axe', async ({
	page
}) => {
	const siteId = await createSite({ request: page.request }, 'Water form test site');
	await gotoReady(page, `/sites/${siteId}/edit`);
	await page.getByRole('button', { name: 'Add a tank or pond' }).click();
	const tank = tankGroup(page, 1);
	await tank.getByLabel('Name', { exact: true }).fill('Sump (invented)');
	await tank.getByLabel('Volume', { exact: true }).fill('0');
	await tank.getByLabel('Depth', { exact: true }).fill('0.8');
	await tank.getByLabel('Water', { exact: true }).selectOption({ label: 'Sea water' });
	await tank.getByLabel('Water temperature (°C)').fill('24');
	await expect(tank.getByText('= 75.2 °F')).toBeVisible();
	await tank.getByLabel('Fish (kg)').fill('12');
	await page.getByRole('button', { name: 'Save the site' }).click();

	const volume = tank.getByLabel('Volume', { exact: true });
	await expect(volume).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText('Volume must be more than 0')).toHaveCount(1);
	await expect(tank.getByText('Volume must be more than 0')).toBeVisible();
	await expect(volume).toHaveValue('0');
	await expect(tank.getByLabel('Name', { exact: true })).toHaveValue('Sump (invented)');
	await expect(tank.getByLabel('Depth', { exact: true })).toHaveValue('0.8');
	await expect(tank.getByLabel('Water', { exact: true })).toHaveValue('sea');
	await expect(tank.getByLabel('Water temperature (°C)')).toHaveValue('24');
	await expect(tank.getByLabel('Fish (kg)')).toHaveValue('12');

	// The tank editor with a message and the twelve months open, at phone and desk width.
	await tank.getByLabel('Water temperature varies by month').check();
	await expect(tank.getByLabel('December (°C)')).toHaveValue('24');
	for (const size of [PHONE, DESK]) {
		await page.setViewportSize(size);
		const findings = await blockingFindings(page);
		expect(findings, describeFindings([{ where: `site form ${size.width} px`, findings }])).toEqual([]);
	}
	await page.setViewportSize(PHONE);

	await volume.fill('600');
	await page.getByRole('button', { name: 'Save the site' }).click();
	await expect(page).toHaveURL(new RegExp(`/sites/${siteId}$`));
	const card = page.getByRole('region', { name: 'Water' }).getByRole('listitem');
	await expect(card).toContainText('Sump (invented)');
	await expect(card).toContainText('600 L (159 US gal)');
	await expect(card).toContainText('Sea water');
	await expect(card).toContainText('24 °C (75 °F) every month');
});
