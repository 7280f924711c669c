import { expect, test } from '@playwright/test';
import { DEMO_WS, signInWithPassword } from './helpers';

// A workspace's own air pumps, entered from a data sheet on a phone at the tank. The pumps are invented
// and deleted again, so the demo workspace stays as the other specs expect it.
test.use({ viewport: { width: 390, height: 844 } });

const POINTS_PSI: [string, string][] = [
	['1', '70'],
	['2', '62'],
	['3', '50']
];

test('an editor adds a pump with three points on a phone and sees it listed with its curve', async ({
	page
}) => {
	const name = `Phone pump ${Date.now()} (invented)`;
	await signInWithPassword(page, 'editor@example.org');
	await page.goto(`/w/${DEMO_WS.id}`);
	await page.getByRole('link', { name: 'Air pumps from data sheets' }).click();
	await expect(page.getByRole('heading', { name: 'Air pumps', level: 1 })).toBeVisible();
	await page.locator('body[data-hydrated]').waitFor();

	const add = page.getByRole('region', { name: 'Add a pump from its data sheet' });
	await add.getByLabel('Pump name').fill(name);
	await add.getByLabel('Pressure unit').selectOption('psi');
	for (const [i, [psi, lpm]] of POINTS_PSI.entries()) {
		const row = add.getByRole('group', { name: `Point ${i + 1}` });
		await row.getByLabel('Pressure').fill(psi);
		await row.getByLabel('Air flow').fill(lpm);
	}
	// A box left wrong is named beside itself, once, and nothing typed is lost.
	await add.getByRole('group', { name: 'Point 3' }).getByLabel('Air flow').fill('lots');
	await add.getByRole('button', { name: 'Add pump' }).click();
	const third = add.getByRole('group', { name: 'Point 3' }).getByLabel('Air flow');
	await expect(third).toHaveAttribute('aria-invalid', 'true');
	await expect(add.getByText('Air flow must be a number')).toHaveCount(1);
	await expect(add.getByLabel('Pump name')).toHaveValue(name);
	await third.fill('50');
	await add.getByLabel('Input watts at rated pressure').fill('45');
	await add.getByRole('button', { name: 'Add pump' }).click();
	await expect(page.getByText(`Saved ${name}.`)).toBeVisible();

	const card = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name, exact: true }) });
	await expect(card.getByText('45 W at its rated pressure (data sheet)')).toBeVisible();
	await expect(card.getByText(`${name}: free air against pressure`)).toBeVisible();
	await expect(card.locator('figure path').first()).toBeAttached();
	await card.getByText('Curve points as a table').click();
	const rows = card.getByRole('table').getByRole('row');
	// 1 psi = 6.894757 kPa (NIST SP 811, Appendix B.8); the page stores kPa and shows both.
	await expect(rows.nth(1)).toHaveText(/6\.89 kPa\s*1 psi\s*70 L\/min/);
	await expect(rows.nth(2)).toHaveText(/13\.79 kPa\s*2 psi\s*62 L\/min/);
	await expect(rows.nth(3)).toHaveText(/20\.68 kPa\s*3 psi\s*50 L\/min/);
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

	await card.getByRole('button', { name: `Delete ${name}` }).click();
	await expect(page.getByText('The pump is deleted.')).toBeVisible();
	await expect(page.getByRole('heading', { name, exact: true })).toHaveCount(0);
});
