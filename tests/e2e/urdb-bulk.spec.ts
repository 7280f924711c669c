import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { AXE_CONTEXT, blockingFindings } from './axe';
import { gotoReady, signInWithPassword } from './helpers';

// The platform admin's bulk import of open rate database rates, in a real browser: the file goes up, the
// job reads it, the progress bar reaches its end and the report names what happened to each rate. The
// rates are Florida Power & Light's RS-1 (2015), a public record (tests/fixtures/urdb/), under labels
// invented for this run, and one invented broken rate.
const RS1 = JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8'));
const tag = `e2e-bulk-${Date.now()}`;

// axe is added to the page as a script, which the app's content security policy would refuse.
test.use(AXE_CONTEXT);

test('an admin imports a small file of rates, sees the bar reach its end and reads the report', async ({
	page
}) => {
	await signInWithPassword(page, 'admin@example.org');
	await gotoReady(page, '/admin/urdb-import');

	// The form fits a phone: no sideways scroll at 390 px, no serious finding of axe.
	await page.setViewportSize({ width: 390, height: 844 });
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
	expect(await blockingFindings(page)).toEqual([]);
	await page.setViewportSize({ width: 1366, height: 900 });

	// Without a file the form says so beside the file field, and nothing starts.
	await page.getByRole('button', { name: 'Upload and import' }).click();
	await expect(page.getByLabel(/File of rates/)).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText('Choose a JSON file of rates from the open rate database.')).toBeVisible();

	const rates = [
		{ ...RS1, label: `${tag}-1`, name: 'RS-1 first copy (invented label)' },
		{ ...RS1, label: `${tag}-2`, name: 'Invented broken rate', energyratestructure: [[{ rate: -1 }]] },
		{ ...RS1, label: `${tag}-3`, name: 'RS-1 second copy (invented label)' },
		{ ...RS1, label: `${tag}-4`, name: 'Invented commercial rate', sector: 'Commercial' }
	];
	await page.getByLabel(/File of rates/).setInputFiles({
		name: 'invented-rates.json',
		mimeType: 'application/json',
		buffer: Buffer.from(JSON.stringify(rates))
	});
	await page.getByRole('checkbox', { name: 'Residential' }).check();
	await page.getByLabel('Time zone of every tariff in the file').selectOption('America/New_York');
	await page.getByRole('button', { name: 'Upload and import' }).click();

	await expect(page.getByRole('heading', { name: 'Importing invented-rates.json' })).toBeVisible();
	await expect(page.getByRole('heading', { name: 'Report' })).toBeVisible({ timeout: 30_000 });
	const bar = page.getByRole('progressbar', { name: 'Done reading' });
	// The bar is full: all the file's bytes read.
	expect(await bar.evaluate((el: HTMLProgressElement) => el.value > 0 && el.value === el.max)).toBe(true);
	await expect(page.getByTestId('import-figures')).toContainText(
		'4 rates read: 2 imported, 1 skipped, 0 already present, 1 filtered out'
	);
	await expect(page.getByText('1 rate filtered out: 1 by sector, 0 by utility')).toBeVisible();
	await expect(page.getByText('Rate 2 of the file: Invented broken rate')).toBeVisible();
	await expect(page.getByText('Energy rates, period 1, tier 1: Rate must be zero or more')).toBeVisible();

	// The report reads at desk width and on a phone: no serious finding of axe, no sideways scroll at 390 px.
	for (const size of [
		{ width: 1366, height: 900 },
		{ width: 390, height: 844 }
	]) {
		await page.setViewportSize(size);
		expect(await blockingFindings(page)).toEqual([]);
		expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(size.width);
	}

	// Listed among the imported rates and again under the notes of rates taken in part (its comments).
	await page
		.getByRole('link', { name: `RS-1 first copy (invented label), label ${tag}-1` })
		.first()
		.click();
	await expect(page.getByRole('heading', { name: /RS-1 first copy \(invented label\)/ })).toBeVisible();
});
