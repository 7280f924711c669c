import ExcelJS from 'exceljs';
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, signInWithPassword } from './helpers';

const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; name: string }[];
};
const pond = demoSites.sites[2]!;

// An invented list with its own column names and one bad row.
const SHEET =
	'Device,Qty,Power (W),Schedule,Hours a day\nFountain pump,1,120,hours,10\nBroken pump,1,-5,always,\n';

test('an editor imports a list with its own column names, leaves out a bad row and downloads the list', async ({
	page
}) => {
	await signInWithPassword(page, 'editor@example.org');
	await gotoReady(page, `/sites/${pond.id}`);
	await page.getByLabel('Name', { exact: true }).fill('Imported list (test)');
	await page.getByRole('button', { name: 'Create scenario' }).click();
	await expect(page.getByRole('heading', { name: 'Imported list (test)', level: 1 })).toBeVisible();
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

	await page.getByRole('link', { name: 'Import a list' }).click();
	await expect(page.getByRole('heading', { name: 'Import an equipment list' })).toBeVisible();
	await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
	await page
		.getByLabel(/^Sheet/)
		.setInputFiles({ name: 'pond.csv', mimeType: 'text/csv', buffer: Buffer.from(SHEET) });
	// A new scenario starts as a copy of the baseline; this sheet replaces that list.
	await page.getByLabel('Replace the list with them').check();
	await page.getByRole('button', { name: 'Check the sheet' }).click();
	const main = page.getByRole('main');
	await expect(main).toContainText('2 rows read: 1 ready to import, 1 problem');
	await expect(main).toContainText('Row 3, watts: Watts must be zero or more');
	await expect(page.locator('select[name="map.watts"] option:checked')).toHaveText('Power (W)');
	await expect(page.locator('select[name="map.hours_per_day"] option:checked')).toHaveText('Hours a day');

	// Without leaving the bad row out, nothing is imported.
	await page.getByRole('button', { name: 'Import 1 device' }).click();
	await expect(main).toContainText('Some rows were refused');
	await page.getByLabel('Leave out the refused rows').check();
	await page.getByRole('button', { name: 'Import 1 device' }).click();
	await expect(main).toContainText('Imported 1 device from the sheet.');
	await expect(main).toContainText('Fountain pump');

	const csv = page.waitForEvent('download');
	await page.getByRole('link', { name: 'CSV', exact: true }).click();
	const csvFile = await csv;
	expect(csvFile.suggestedFilename()).toBe(
		'wrenfield-garden-centre-display-pond-demo-imported-list-test-equipment.csv'
	);
	const text = readFileSync((await csvFile.path())!, 'utf8');
	expect(text.split('\r\n')[1]).toMatch(/^Fountain pump,other,1,120,/);

	const xlsx = page.waitForEvent('download');
	await page.getByRole('link', { name: 'XLSX', exact: true }).click();
	const workbook = new ExcelJS.Workbook();
	await workbook.xlsx.readFile((await (await xlsx).path())!);
	expect(workbook.worksheets[0]?.getCell('A2').value).toBe('Fountain pump');
});
