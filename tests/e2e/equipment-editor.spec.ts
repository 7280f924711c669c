import { expect, test, type Page, type Response } from '@playwright/test';
import { gotoReady, signInWithPassword } from './helpers';
import { PUBLIC_TARIFF, baselineOf, createSite } from './site-setup';

/*
 * The equipment list at the tank (issue 17): on an invented 240 V site, a new device's amps and a switch
 * to amps × volts use 240 V; a water pump asks "Is it in the water?" in its row and a yes shows the
 * caution at once; an invalid entry is marked at its field and sends no request that fails; a change
 * shows its yearly cost against the saved list; the pumping helper refuses 0.3 % and puts its watts
 * only into the device the person names, and works the pipe out by Darcy–Weisbach with two elbows.
 */

/** Every answer of the results endpoint that failed, and every error in the console, while the page is open. */
function failuresOn(page: Page) {
	const failed: string[] = [];
	page.on('response', (response: Response) => {
		if (response.url().includes('/results') && response.status() >= 400)
			failed.push(`${response.status()} ${response.url()}`);
	});
	page.on('console', (message) => {
		if (message.type() === 'error') failed.push(message.text());
	});
	return failed;
}

const priced = (page: Page) =>
	page.waitForResponse((r) => r.url().includes('/results') && r.request().method() === 'POST' && r.ok());

test('the equipment list on a 240 V site: voltage, in-water question, invalid entries, saving against the saved list', async ({
	page
}) => {
	await signInWithPassword(page, 'editor@example.org');
	const siteId = await createSite({ request: page.request }, 'Equipment editor test site', {
		tariffId: PUBLIC_TARIFF,
		supplyVolts: 240
	});
	const scenarioId = await baselineOf(page.request, siteId);
	const failed = failuresOn(page);
	await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);

	// A new device: 100 W at the site's 240 V is 0.42 A, and amps × volts starts at 240 V.
	await page.getByRole('button', { name: 'Add a device' }).click();
	const row = page.getByRole('group', { name: 'Water pump, device 1 of 1' });
	await expect(row.getByText('0.42 A at 240 V')).toBeVisible();
	await row.getByRole('radio', { name: 'Amps × volts' }).check();
	await expect(row.getByRole('textbox', { name: 'Volts', exact: true })).toHaveValue('240');
	await row.getByRole('radio', { name: 'Watts' }).check();
	const watts = row.getByRole('textbox', { name: 'Watts' });
	await watts.fill('100');

	const saving = page.getByRole('button', { name: 'Save the list' });
	await saving.click();
	await expect(page.getByText('Saved.')).toBeVisible();

	// The water pump asks in its row; a yes shows the caution there and at the top of the page.
	const inWater = row.getByRole('group', { name: 'Is it in the water?' });
	await expect(inWater).toBeVisible();
	await inWater.getByRole('radio', { name: 'Yes' }).check();
	await expect(row.getByText(/Mains power in the water can kill/)).toBeVisible();
	await expect(page.getByText('Electrical safety.')).toBeVisible();
	await saving.click();
	await expect(page.getByText('All changes saved')).toBeVisible();

	// An invalid entry: marked at its field, the results say why, and nothing is sent that fails.
	await watts.fill('-5');
	await expect(watts).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText('Fix the highlighted fields to see the results.')).toBeVisible();
	const answer = priced(page);
	await watts.fill('1000');
	await answer;
	await expect(watts).not.toHaveAttribute('aria-invalid', 'true');
	expect(failed).toEqual([]);

	// 1,000 W against the saved 100 W costs more a year; back at 100 W nothing changed and nothing shows.
	await expect(page.getByText(/^\+\$[\d,.]+ a year against the saved list$/)).toBeVisible();
	await watts.fill('100');
	await expect(page.getByText('All changes saved')).toBeVisible();
	await expect(page.getByText(/against the saved list/)).toHaveCount(0);

	// Triggered runs are drawn as a running share, said in words; money fields name the currency.
	await row.getByRole('button', { name: 'Details of Water pump' }).click();
	await row.getByRole('combobox', { name: 'Runs' }).selectOption({ label: 'Triggered runs' });
	await expect(row.getByText('Runs when triggered, about 2.5 min an hour').first()).toBeVisible();
	await row.getByText(/per unit, in USD/).click();
	await expect(row.getByRole('textbox', { name: 'Purchase' })).toBeVisible();
});

test('the pumping helper refuses 0.3 % and puts its watts only into the device named', async ({ page }) => {
	await signInWithPassword(page, 'editor@example.org');
	const siteId = await createSite({ request: page.request }, 'Pumping helper test site', {
		tariffId: PUBLIC_TARIFF
	});
	const scenarioId = await baselineOf(page.request, siteId);
	await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
	await page.getByRole('button', { name: 'Add a device' }).click();
	await page.getByRole('button', { name: 'Add a device' }).click();
	await page
		.getByRole('group', { name: 'Water pump, device 2 of 2' })
		.getByRole('textbox', { name: 'Name' })
		.fill('Second pump');
	await page.getByText(/Pumping and aeration helper/).click();

	await page.getByLabel('Flow', { exact: true }).fill('10');
	await page.getByLabel('Static lift', { exact: true }).fill('5');
	await page.getByLabel('Pipe length', { exact: true }).fill('50');
	await page.getByLabel('Inner diameter', { exact: true }).fill('1');
	const efficiency = page.getByLabel('Wire-to-water efficiency', { exact: true });
	await efficiency.fill('0.3');
	await expect(efficiency).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText(/Did you mean 30 %\?/)).toBeVisible();
	await page.getByRole('button', { name: 'Use 30 %' }).click();
	await expect(efficiency).toHaveValue('30');

	// US inputs: the water speed comes in ft/s; no device gets the watts until one is named.
	await expect(page.getByText(/ft\/s in the pipe/)).toBeVisible();
	const use = page.getByRole('button', { name: /^Use [\d.,]+ W for/ });
	await expect(use).toHaveCount(0);
	await page.getByLabel('Which device gets these watts?').selectOption({ label: 'Second pump' });
	await expect(use).toHaveText(/^Use [\d.,]+ W for Second pump$/);
	const offered = (/^Use ([\d.,]+) W/.exec((await use.textContent()) ?? '') ?? [])[1]!.replaceAll(',', '');
	await use.click();
	const second = page.getByRole('group', { name: 'Second pump, device 2 of 2' });
	const first = page.getByRole('group', { name: 'Water pump, device 1 of 2' });
	await expect(second.getByRole('textbox', { name: 'Watts' })).toHaveValue(offered);
	await expect(first.getByRole('textbox', { name: 'Watts' })).toHaveValue('100');

	// Darcy–Weisbach at 20 °C and two standard elbows (EPANET K 0.9 each), derived from the equations:
	// 10 gpm in a 1-inch pipe runs at 1.245 m/s; 50 ft of plastic pipe loses 1.109 m = 3.64 ft, the
	// elbows 1.8 × 1.245² ÷ 2g = 0.142 m = 0.47 ft; with the 5 ft lift the total is 9.1 ft.
	const helper = page.getByRole('region', { name: 'Pumping helper' });
	const line = (term: string) =>
		helper.locator('dt', { hasText: term }).locator('xpath=following-sibling::dd[1]');
	await helper.getByRole('radio', { name: /^Darcy–Weisbach with the Colebrook friction factor/ }).check();
	await expect(helper.getByLabel('Water temperature', { exact: true })).toHaveValue('20');
	await expect(line('Pipe friction')).toContainText('3.64 ft (Darcy–Weisbach)');
	await expect(line('Fittings and valves')).toHaveText('0 ft');
	await helper.getByRole('button', { name: 'Add a fitting' }).click();
	const fitting = helper.getByRole('group', { name: 'Fitting 1' });
	await fitting.getByLabel('Kind').selectOption({ label: '90° elbow, standard (K 0.9)' });
	await fitting.getByLabel('How many').fill('2');
	await expect(line('Fittings and valves')).toHaveText('0.47 ft');
	await expect(line('Pipe friction')).toContainText('3.64 ft');
	await expect(line('Total head')).toHaveText('9.1 ft');
	// A count that is not whole is refused at its row, in words.
	await fitting.getByLabel('How many').fill('1.5');
	await expect(fitting.getByLabel('How many')).toHaveAttribute('aria-invalid', 'true');
	await expect(fitting.getByText('Number of fittings must be a whole number')).toBeVisible();

	// At the tank on a phone: 390 px wide, no sideways scroll, and each control of a row 44 px or more.
	await page.setViewportSize({ width: 390, height: 844 });
	await helper.getByRole('button', { name: 'Add a fitting' }).click();
	await expect(helper.getByRole('group', { name: 'Fitting 2' })).toBeVisible();
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
	for (const control of [
		fitting.getByLabel('Kind'),
		fitting.getByLabel('How many'),
		fitting.getByRole('button', { name: 'Remove fitting 1' }),
		helper.getByRole('button', { name: 'Add a fitting' }),
		// A radio's target is its whole label.
		helper.locator('label', { hasText: /^\s*Hazen–Williams \(water near room temperature\)\s*$/ })
	]) {
		expect((await control.boundingBox())?.height ?? 0).toBeGreaterThanOrEqual(44);
	}
	await fitting.getByRole('button', { name: 'Remove fitting 1' }).click();
	await expect(helper.getByRole('group', { name: 'Fitting 2' })).toHaveCount(0);
	await expect(helper.getByRole('group', { name: 'Fitting 1' }).getByLabel('How many')).toHaveValue('1');
});
