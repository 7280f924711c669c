import { expect, test, type Locator, type Page } from '@playwright/test';
import { gotoReady, signInWithPassword } from './helpers';
import { PUBLIC_TARIFF, baselineOf, createSite } from './site-setup';

/*
 * The air and water designer (issue 18): the public page works the worked example out as the person
 * types; on a scenario, "Add to scenario" puts the air pumps in the equipment list, once, and the design
 * reopens with the page; both fit a 390 px phone without sideways scrolling.
 */

/** Types into a box of the designer and picks its unit. */
async function quantity(scope: Locator, label: string, value: string, unit?: string) {
	await scope.getByRole('textbox', { name: label, exact: true }).fill(value);
	if (unit)
		await scope.getByRole('combobox', { name: `${label}: unit`, exact: true }).selectOption({ label: unit });
}

/** The worked example of issue 18 in the first air-lift (derived from Nicklin's definition of efficiency). */
async function workedExample(page: Page) {
	const row = page.getByRole('group', { name: 'Air-lift 1', exact: true });
	await quantity(row, 'Target water flow per air-lift', '20', 'L/min');
	await quantity(row, 'Lift', '0.3', 'm');
	await quantity(row, 'Submergence', '0.7', 'm');
	await quantity(row, 'Riser inner diameter', '25', 'mm');
	await quantity(row, 'Air-lift efficiency', '30');
}

const noSidewaysScroll = async (page: Page) =>
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

test('the public designer: the worked example needs about 29.5 L/min of free air at about 6.9 kPa', async ({
	page
}) => {
	await gotoReady(page, '/air');
	await expect(page.getByRole('heading', { name: 'Air-lift and aeration designer', level: 1 })).toBeVisible();
	await expect(page.getByText(/Keep air pumps above the water line/)).toBeVisible();
	await page.getByRole('textbox', { name: 'Water temperature' }).fill('20');
	await page.getByRole('radio', { name: 'Fresh water' }).check();
	await workedExample(page);
	await page.getByRole('textbox', { name: 'Line and diffuser loss' }).fill('0');

	// Issue 18: "about 29.5 L/min of free air at about 6.9 kPa gauge" (derived from the equation).
	await expect(page.getByTestId('air-needed')).toContainText(/29\.[45] L\/min \(1\.04 cfm\)/);
	await expect(page.getByTestId('air-pressure')).toContainText(/(6\.8|6\.9|7) kPa gauge/);
	await expect(page.getByTestId('air-pressure')).toContainText('psi');
	await expect(page.getByTestId('air-pressure')).toContainText('inches of water');
	await expect(page.getByRole('figure', { name: /water lifted against air given/ })).toBeVisible();

	// A bad entry is named at its box, once, in words; the figures wait for it.
	const lift = page
		.getByRole('group', { name: 'Air-lift 1', exact: true })
		.getByRole('textbox', { name: 'Lift', exact: true });
	await lift.fill('0.3 m');
	await expect(lift).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText('Lift must be a number')).toHaveCount(1);
	await expect(page.getByText('Fix the fields marked in red')).toBeVisible();
	await lift.fill('0.3');
	await expect(page.getByTestId('air-needed')).toBeVisible();

	// The typical pump classes say what they are.
	await expect(page.getByText("Typical values — check against your pump's data sheet.")).toBeVisible();
	await expect(page.getByRole('button', { name: 'Add to scenario' })).toHaveCount(0);
});

test('the public designer fits a 390 px phone', async ({ browser }) => {
	const page = await (await browser.newContext({ viewport: { width: 390, height: 844 } })).newPage();
	await gotoReady(page, '/air');
	await page.getByRole('checkbox', { name: 'Size aeration for the fish too' }).check();
	await page.getByRole('button', { name: 'Add an air-lift' }).click();
	await expect(page.getByRole('group', { name: 'Air-lift 2', exact: true })).toBeVisible();
	await expect(page.getByTestId('air-needed')).toBeVisible();
	await noSidewaysScroll(page);
});

test('on a scenario: two air-lifts, "Add to scenario", and the air pumps are in the equipment list once', async ({
	page
}) => {
	await signInWithPassword(page, 'editor@example.org');
	const siteId = await createSite({ request: page.request }, 'Air designer test site', {
		tariffId: PUBLIC_TARIFF
	});
	const scenarioId = await baselineOf(page.request, siteId);
	await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);

	await page.getByText('Air and water designer: air-lifts, aeration and air pumps').click();
	await workedExample(page);
	await page.getByRole('button', { name: 'Add an air-lift' }).click();
	const second = page.getByRole('group', { name: 'Air-lift 2', exact: true });
	await second.getByRole('textbox', { name: 'Air-lift name', exact: true }).fill('Sump riser');
	await expect(page.getByRole('rowheader', { name: '1 × Sump riser' })).toBeAttached();
	const pumps = (await page.getByTestId('pump-count').innerText()).trim();
	const pumpName = pumps.replace(/^\d+ × /, '');

	const saved = page.waitForResponse(
		(r) => r.url().includes('?/airDesign') && r.request().method() === 'POST'
	);
	await page.getByRole('button', { name: 'Add to scenario' }).click();
	expect((await saved).ok()).toBe(true);
	await expect(page.getByText(`Added to the equipment list: ${pumps}`)).toBeVisible();
	const row = page.getByRole('group', { name: `${pumpName}, device 1 of 1` });
	await expect(row).toBeVisible();

	// A second "Add to scenario" replaces the row; it never adds another.
	await page.getByRole('button', { name: 'Add to scenario' }).click();
	await expect(page.getByText(`Added to the equipment list: ${pumps}`)).toBeVisible();
	await expect(page.getByRole('group', { name: /, device \d+ of \d+$/ })).toHaveCount(1);

	// The saved design opens again with the page; the list holds the pumps.
	await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
	await expect(page.getByRole('group', { name: 'Air-lift 2', exact: true })).toBeVisible();
	await expect(
		page
			.getByRole('group', { name: 'Air-lift 2', exact: true })
			.getByRole('textbox', { name: 'Air-lift name', exact: true })
	).toHaveValue('Sump riser');
	await expect(page.getByRole('group', { name: `${pumpName}, device 1 of 1` })).toBeVisible();

	// Unsaved changes to the list come first.
	await page.getByRole('button', { name: 'Add a device' }).click();
	await page.getByRole('button', { name: 'Add to scenario' }).click();
	await expect(page.getByText("Save or discard the list's changes first.")).toBeVisible();

	// At 390 px the page with the designer open does not scroll sideways.
	await page.setViewportSize({ width: 390, height: 844 });
	await noSidewaysScroll(page);
});
