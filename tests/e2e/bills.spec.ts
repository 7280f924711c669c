import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, signInWithPassword } from './helpers';
import { baselineOf, createSite } from './site-setup';

// An invented site on an invented demo tariff, made for this test so no demo data changes.
async function siteWithAPump(page: Page) {
	const siteId = await createSite({ request: page.request }, 'Bill check test site', {
		tariffId: '7a1c0000-0000-4000-8000-000000000400'
	});
	const baseline = await baselineOf(page.request, siteId);
	const list = await (await page.request.get(`/api/v1/scenarios/${baseline}/equipment`)).json();
	const put = await page.request.put(`/api/v1/scenarios/${baseline}/equipment`, {
		data: {
			expectedRevision: list.revision,
			devices: [
				{ name: 'Pond pump', category: 'water-pump', power: { watts: 250 }, schedule: { type: 'always' } },
				{
					name: 'Tank heater',
					category: 'heater',
					power: { watts: 1500 },
					schedule: { type: 'windows', windows: [{ start: '16:00', end: '20:00' }] }
				}
			]
		}
	});
	expect(put.status()).toBe(200);
	return siteId;
}

test.describe('bill check', () => {
	test('an editor enters a bill, reads what explains it, is asked before an overlapping one, and imports a sheet', async ({
		page
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await siteWithAPump(page);
		await gotoReady(page, `/sites/${siteId}/bills`);
		const main = page.getByRole('main');

		// Dates out of order are refused at the field, and what was typed stays.
		await page.getByLabel('First day').fill('2026-03-31');
		await page.getByLabel('Last day').fill('2026-03-01');
		await page.getByLabel('kWh billed').fill('900');
		await page.getByLabel('Amount billed').fill('150');
		await page.getByRole('button', { name: 'Save the bill' }).click();
		await expect(main).toContainText('The last day must not be before the first day');
		await expect(page.getByLabel('kWh billed')).toHaveValue('900');

		// 250 W always on for March (743 h in Chicago, where the clocks go forward on the 8th) is about 186 kWh and the
		// heater about 186 kWh more, so 900 kWh billed leaves a gap the list does not explain.
		await page.getByLabel('First day').fill('2026-03-01');
		await page.getByLabel('Last day').fill('2026-03-31');
		await page.getByRole('button', { name: 'Save the bill' }).click();
		await expect(page.getByRole('heading', { name: 'Bill 2026-03-01 to 2026-03-31' })).toBeVisible();
		await expect(main).toContainText('Not explained by the list');
		await expect(main).toContainText('runs all the time that your list does not show');
		await expect(main).toContainText('Effective rate (amount ÷ kWh)');
		await expect(main).toContainText('$0.1667 per kWh');

		const api = await page.request.get(
			`${new URL(page.url()).pathname.replace('/sites/', '/api/v1/sites/')}/reconciliation`
		);
		expect(api.status()).toBe(200);
		const r = await api.json();
		// The always-on watts are the unexplained kWh over the period's hours (common practice: W = kWh ÷ h × 1000).
		expect(r.unexplained.watts).toBeCloseTo((r.unexplained.kwh / r.hours) * 1000, 9);
		expect(r.billed.effectivePerKwh).toBeCloseTo(150 / 900, 12);

		await gotoReady(page, `/sites/${siteId}/bills`);
		await page.getByLabel('First day').fill('2026-03-20');
		await page.getByLabel('Last day').fill('2026-04-19');
		await page.getByLabel('kWh billed').fill('500');
		await page.getByLabel('Amount billed').fill('80');
		await page.getByRole('button', { name: 'Save the bill' }).click();
		await expect(main).toContainText('This period overlaps a bill already entered: 2026-03-01 to 2026-03-31');
		await page.getByLabel(/Save it anyway/).check();
		await page.getByRole('button', { name: 'Save the bill' }).click();
		await expect(page.getByRole('heading', { name: 'Bill 2026-03-20 to 2026-04-19' })).toBeVisible();

		await gotoReady(page, `/sites/${siteId}/bills`);
		const sheet = (rows: string) => ({
			name: 'bills.csv',
			mimeType: 'text/csv',
			buffer: Buffer.from(`period_from,period_to,kwh,amount\n${rows}`)
		});
		await page
			.getByLabel('Sheet')
			.setInputFiles(sheet('2026-05-01,2026-05-31,600,90\n2026-06-01,2026-05-02,600,90\n'));
		await page.getByRole('button', { name: 'Import the sheet' }).click();
		await expect(main).toContainText('Nothing was imported');
		await expect(main).toContainText('Row 3, period_to: The last day must not be before the first day');
		await page
			.getByLabel('Sheet')
			.setInputFiles(sheet('2026-05-01,2026-05-31,600,90\n2026-06-01,2026-06-30,610,92\n'));
		await page.getByRole('button', { name: 'Import the sheet' }).click();
		await expect(main).toContainText('Imported 2 bills.');
		await page.reload();
		await expect(page.getByRole('table')).toContainText('2026-06-01 to 2026-06-30');
		await expect(page.getByText('Billed against estimated, bill by bill')).toBeVisible();
	});

	test('the bill API refuses dates out of order and asks before an overlap', async ({ page }) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await siteWithAPump(page);
		const url = `/api/v1/sites/${siteId}/bills`;
		const bad = await page.request.post(url, {
			data: { periodFrom: '2026-02-10', periodTo: '2026-02-01', kwh: 1, amount: 1 }
		});
		expect(bad.status()).toBe(400);
		expect((await bad.json()).issues).toContainEqual({
			path: 'periodTo',
			message: 'The last day must not be before the first day'
		});
		const first = await page.request.post(url, {
			data: { periodFrom: '2026-02-01', periodTo: '2026-02-28', kwh: 300, amount: 50 }
		});
		expect(first.status()).toBe(201);
		const overlap = await page.request.post(url, {
			data: { periodFrom: '2026-02-15', periodTo: '2026-03-14', kwh: 300, amount: 50 }
		});
		expect(overlap.status()).toBe(409);
		expect((await overlap.json()).error).toBe('overlap');
		const confirmed = await page.request.post(url, {
			data: { periodFrom: '2026-02-15', periodTo: '2026-03-14', kwh: 300, amount: 50, confirmOverlap: true }
		});
		expect(confirmed.status()).toBe(201);
		const bill = await first.json();
		const stale = await page.request.put(`${url}/${bill.id}`, {
			data: {
				periodFrom: '2026-02-01',
				periodTo: '2026-02-28',
				kwh: 310,
				amount: 50,
				expectedRevision: bill.revision - 1
			}
		});
		expect(stale.status()).toBe(409);
		expect((await page.request.delete(`${url}/${bill.id}`)).status()).toBe(204);
		expect((await page.request.get(`${url}/${bill.id}`)).status()).toBe(404);
	});

	test('a person enters a bill, attaches its PDF, imports a Green Button file and reads the reconciliation with the metered kWh', async ({
		page
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const siteId = await siteWithAPump(page);
		await gotoReady(page, `/sites/${siteId}/bills`);
		await page.getByLabel('First day').fill('2026-01-01');
		await page.getByLabel('Last day').fill('2026-01-31');
		await page.getByLabel('kWh billed').fill('420');
		await page.getByLabel('Amount billed').fill('71.40');
		await page.getByRole('button', { name: 'Save the bill' }).click();
		await expect(page.getByRole('heading', { name: 'Bill 2026-01-01 to 2026-01-31' })).toBeVisible();
		const billPage = new URL(page.url()).pathname;
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();

		// An invented one-page PDF: file-type reads "%PDF", the check wants "%%EOF" at the end.
		const pdf = Buffer.from('%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n');
		await page
			.getByLabel('Attach the bill’s PDF or a photo')
			.setInputFiles({ name: 'january-bill.pdf', mimeType: 'application/pdf', buffer: pdf });
		await page.getByRole('button', { name: 'Attach', exact: true }).click();
		await expect(page.getByRole('list', { name: 'Attached files' })).toContainText('january-bill.pdf');

		// The invented hourly fixture holds 48 readings, 50,200 Wh, on two January 2026 days.
		await gotoReady(page, `/sites/${siteId}/usage`);
		await page.getByLabel(/Usage file/).setInputFiles({
			name: 'hourly.xml',
			mimeType: 'application/xml',
			buffer: readFileSync('tests/fixtures/green-button/hourly.xml')
		});
		await page.getByRole('button', { name: 'Import' }).click();
		await expect(page.getByRole('region', { name: 'Stored readings' })).toContainText('48');

		await gotoReady(page, billPage);
		const main = page.getByRole('main');
		await expect(main).toContainText('Metered intervals in the period');
		await expect(main).toContainText('50 kWh');
		await expect(main).toContainText('What the numbers suggest');
		await expect(page.getByRole('list', { name: 'Attached files' })).toContainText('january-bill.pdf');
	});
});
