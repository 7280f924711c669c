import { expect, test, type Browser, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, signInWithPassword } from './helpers';
import { createSite } from './site-setup';

// Every test works on a site of its own, made through the API, so the demo sites keep no readings.
const fixture = (name: string) => `tests/fixtures/green-button/${name}`;

async function signedIn(browser: Browser, baseURL: string, email: string): Promise<Page> {
	const page = await (await browser.newContext({ baseURL })).newPage();
	await signInWithPassword(page, email);
	return page;
}

/** A fresh invented site in the demo workspace, made by whoever `page` is signed in as. */
function freshSite(page: Page, baseURL: string): Promise<string> {
	return createSite({ request: page.request, headers: { origin: baseURL } }, 'Usage test site');
}

test.describe('metered usage', () => {
	test('metered usage: an editor imports a Green Button file and reads the summary and the load shape', async ({
		page,
		baseURL
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await freshSite(page, baseURL!);
		await gotoReady(page, `/sites/${siteId}`);
		await page.getByRole('link', { name: 'Metered usage' }).click();
		await expect(page.getByRole('heading', { level: 1, name: 'Metered usage' })).toBeVisible();
		await expect(page.getByText('No metered use is stored yet.')).toBeVisible();
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

		await page.getByLabel(/Usage file/).setInputFiles(fixture('hourly.xml'));
		await page.getByRole('button', { name: 'Import' }).click();
		await expect(page.getByText('Imported 48 intervals.')).toBeVisible();

		// The invented file: 48 hourly readings from 00:00 on Friday 9 January 2026, 50,200 Wh in all.
		const stored = page.getByRole('region', { name: 'Stored readings' });
		await expect(stored.getByText('Jan 9, 2026, 12:00 AM')).toBeVisible();
		await expect(stored.getByText('Jan 10, 2026, 11:00 PM')).toBeVisible();
		await expect(stored.getByText('50.2 kWh')).toBeVisible();

		const shape = page.getByRole('region', { name: 'Daily load shape' });
		await expect(shape.locator('svg path[stroke="#2f7a62"]')).toHaveCount(1);
		await expect(shape.locator('svg path[stroke="#b7791f"]')).toHaveCount(1);
		await shape.getByText('Load shape as a table').click();
		// 08:00–09:00: 1,400 Wh on the Friday, 1,100 Wh on the Saturday (the fixture's values).
		await expect(shape.getByRole('row', { name: '08:00' })).toHaveText(/08:00\s*1\.4\s*1\.1/);
		await expect(shape.getByRole('row', { name: '03:00' })).toHaveText(/03:00\s*0\.9\s*0\.9/);
	});

	test('metered usage: an XML bomb and a file cut short are refused with their reasons, nothing stored', async ({
		page,
		baseURL
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await freshSite(page, baseURL!);
		await gotoReady(page, `/sites/${siteId}/usage`);
		const file = page.getByLabel(/Usage file/);

		await file.setInputFiles(fixture('bomb.xml'));
		await page.getByRole('button', { name: 'Import' }).click();
		await expect(page.locator('#usage-file-error')).toContainText('declares a DOCTYPE or entities');
		await expect(file).toHaveAttribute('aria-invalid', 'true');
		await expect(file).toHaveAttribute('aria-describedby', 'usage-file-error');

		await file.setInputFiles(fixture('malformed.xml'));
		await page.getByRole('button', { name: 'Import' }).click();
		await expect(page.locator('#usage-file-error')).toContainText('The XML is malformed or cut short');

		await file.setInputFiles({
			name: 'readings.csv',
			mimeType: 'text/csv',
			buffer: Buffer.from('timestamp,kWh\n2026-01-09 00:00,0.9\n2026-01-09 01:00,lots\n')
		});
		await page.getByRole('button', { name: 'Import' }).click();
		await expect(page.locator('#usage-file-error')).toContainText(
			'Row 3, kWh: must be a number with a dot for decimals'
		);

		await gotoReady(page, `/sites/${siteId}/usage`);
		await expect(page.getByText('No metered use is stored yet.')).toBeVisible();
	});

	test('metered usage: a viewer reads the stored readings but has no upload form', async ({
		browser,
		baseURL
	}) => {
		const editor = await signedIn(browser, baseURL!, 'editor@example.org');
		const siteId = await freshSite(editor, baseURL!);
		const imported = await editor.request.post(`/api/v1/sites/${siteId}/usage`, {
			headers: { origin: baseURL!, 'content-type': 'application/xml' },
			data: readFileSync(fixture('quarter-hour.xml'))
		});
		expect(imported.status()).toBe(201);

		const viewer = await signedIn(browser, baseURL!, 'viewer@example.org');
		await gotoReady(viewer, `/sites/${siteId}/usage`);
		await expect(viewer.getByRole('region', { name: 'Stored readings' }).getByText('1.7 kWh')).toBeVisible();
		await expect(viewer.getByLabel(/Usage file/)).toHaveCount(0);
		await expect(viewer.getByRole('button', { name: 'Import' })).toHaveCount(0);
		const refused = await viewer.request.post(`/api/v1/sites/${siteId}/usage`, {
			headers: { origin: baseURL!, 'content-type': 'text/csv' },
			data: 'timestamp,kWh\n2026-01-09T06:00Z,1\n2026-01-09T07:00Z,1\n'
		});
		expect(refused.status()).toBe(403);
	});

	test('metered usage API: imports a sheet, reports row problems, refuses a file over 10 MB', async ({
		page,
		baseURL
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await freshSite(page, baseURL!);
		const url = `/api/v1/sites/${siteId}/usage`;
		const headers = { origin: baseURL! };

		const sheet = await page.request.post(url, {
			headers,
			multipart: {
				file: {
					name: 'readings.csv',
					mimeType: 'text/csv',
					buffer: Buffer.from('timestamp,kWh\n2026-01-09 00:00,0.5\n2026-01-09 01:00,0.75\n')
				}
			}
		});
		expect(sheet.status()).toBe(201);
		expect(await sheet.json()).toEqual({
			imported: 2,
			format: 'csv',
			from: '2026-01-09T06:00:00.000Z',
			to: '2026-01-09T08:00:00.000Z'
		});

		const bad = await page.request.post(url, {
			headers: { ...headers, 'content-type': 'text/csv' },
			data: 'timestamp,kWh\n2026-01-09 00:00,-1\n2026-01-09 01:00,1\n'
		});
		expect(bad.status()).toBe(400);
		expect(await bad.json()).toMatchObject({
			error: 'invalid_file',
			issues: [{ path: 'rows.2.kWh', message: 'Row 2, kWh: must not be negative' }]
		});

		const huge = await page.request.post(url, {
			headers: { ...headers, 'content-type': 'text/csv' },
			data: Buffer.alloc(10 * 1024 * 1024 + 1, 'a')
		});
		expect(huge.status()).toBe(413);

		const read = await (await page.request.get(url)).json();
		expect(read.summary).toMatchObject({ intervals: 2, kwh: 1.25 });
		expect(read.dailyShape.weekday.slice(0, 3)).toEqual([0.5, 0.75, null]);
	});
});
