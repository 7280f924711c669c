import { expect, test, type Page } from '@playwright/test';
import type { Delivery } from '../../src/lib/calc';
import { oxygenText, waterText } from '../../src/lib/text/delivery-figures';
import { deliverySentence } from '../../src/lib/text/delivery-words';
import { gotoReady, rawPump, signInWithPassword } from './helpers';
import { PUBLIC_TARIFF, baselineOf, callerOn, createSite, demoSites } from './site-setup';

// Issue 18, "What each scenario delivers": the rows and the plain-words line on the compare page, for
// the invented demo farm and for an air-lift designed on a scenario page. Sites are invented.
const farm = demoSites.sites.find((s) => s.id === '5e7e0000-0000-4000-8000-000000000004')!;
const start = `${new Date().getFullYear()}-01`;

/** The delivery table's cell of a row (by its heading) in a scenario's column (1-based, after the row heading). */
const cell = (page: Page, row: string, column: number) =>
	page
		.getByRole('table', { name: /^What each scenario delivers/ })
		.getByRole('row')
		.filter({ has: page.getByRole('rowheader', { name: row, exact: true }) })
		.getByRole('cell')
		.nth(column - 1);

test.describe('what each scenario delivers', () => {
	test('the demo farm’s compare page shows water, oxygen and mains in the water, with the plain-words line', async ({
		page
	}) => {
		await signInWithPassword(page, 'viewer@example.org');
		const [baseline, proposal] = farm.scenarios;
		const search = `scenarios=${baseline!.id},${proposal!.id}&baseline=${baseline!.id}&start=${start}`;
		await gotoReady(page, `/compare?${search}`);
		await expect(page.getByRole('heading', { name: 'What each scenario delivers' })).toBeVisible();

		// The page's figures are the API's, which are the core's scenarioDelivery.
		const report = (await (await page.request.get(`/api/v1/compare?${search}`)).json()) as {
			scenarios: { name: string; delivery: Delivery }[];
		};
		const [big, small] = report.scenarios.map((s) => s.delivery);
		expect(big?.waterLpm).not.toBeNull();
		expect(small?.waterLpm).not.toBeNull();
		expect(small?.oxygenSuppliedGramsPerHour).not.toBeNull();
		await expect(cell(page, 'Water moved', 1)).toHaveText(waterText(big!.waterLpm!));
		await expect(cell(page, 'Water moved', 2)).toHaveText(waterText(small!.waterLpm!));
		await expect(cell(page, 'Oxygen supplied', 2)).toContainText(
			oxygenText(small!.oxygenSuppliedGramsPerHour!)
		);
		await expect(cell(page, 'Tank turnovers per hour', 1)).toContainText('per hour');
		await expect(cell(page, 'The stock’s oxygen demand', 1)).toContainText('g O₂/h at 5 mg/L');
		// The large pump sits in the tank on mains power; the air-lift scenario's pumps all stand dry.
		await expect(cell(page, 'Mains-powered devices in the water', 1)).toHaveText('1 unit');
		await expect(cell(page, 'Mains-powered devices in the water', 2)).toHaveText('0 units');
		await expect(cell(page, 'Water moved if the largest unit fails', 2)).toContainText('without one “');

		// The plain-words line is built from those figures: both hold the target, one has no mains in the water.
		const line = deliverySentence(report.scenarios);
		expect(line).toBe(
			`Both keep the fish above 5 mg/L; “${proposal!.name}” has no mains power in the water.`
		);
		await expect(
			page.getByRole('region', { name: 'What each scenario delivers' }).getByText(line)
		).toBeVisible();

		// The printable report carries the same rows.
		await gotoReady(page, `/compare/report?${search}`);
		await expect(cell(page, 'Water moved', 2)).toHaveText(waterText(small!.waterLpm!));
	});

	test('an air-lift designed on a scenario page and added to it shows in the compare rows', async ({
		page,
		baseURL
	}) => {
		const editor = await callerOn(page, 'editor@example.org', baseURL!);
		const siteId = await createSite(editor, 'Air-lift delivery site', { tariffId: PUBLIC_TARIFF });
		const baseline = await baselineOf(editor.request, siteId);
		const put = await editor.request.put(`/api/v1/scenarios/${baseline}/equipment`, {
			headers: editor.headers,
			data: { expectedRevision: 1, devices: [{ ...rawPump, inWater: true, waterLpm: 200 }] }
		});
		expect(put.status()).toBe(200);
		const created = await editor.request.post(`/api/v1/sites/${siteId}/scenarios`, {
			headers: editor.headers,
			data: { name: 'Air-lift instead (invented)' }
		});
		expect(created.status()).toBe(201);
		const proposal = (await created.json()).id as string;

		// Design one air-lift with the designer on the scenario page, and add it to the scenario.
		await gotoReady(page, `/sites/${siteId}/scenarios/${proposal}`);
		await page.getByText('Air and water designer: air-lifts, aeration and air pumps').click();
		const airlift = page.getByRole('group', { name: 'Air-lift 1', exact: true });
		await airlift.getByRole('textbox', { name: 'Riser inner diameter', exact: true }).fill('50');
		await airlift.getByRole('textbox', { name: 'Submergence', exact: true }).fill('0.9');
		await airlift.getByRole('textbox', { name: 'Lift', exact: true }).fill('0.25');
		await airlift.getByRole('textbox', { name: 'Target water flow per air-lift', exact: true }).fill('40');
		const added = page.waitForResponse(
			(r) => r.url().includes('?/airDesign') && r.request().method() === 'POST'
		);
		await page.getByRole('button', { name: 'Add to scenario', exact: true }).click();
		expect((await added).ok()).toBe(true);
		// The designer says what it put in the list; the list shows that one row, saved with the design.
		await expect(page.getByText(/^Added to the equipment list: \d+ × /)).toBeVisible();
		await expect(page.getByRole('group', { name: /, device 1 of 1$/ })).toBeVisible();
		await expect(page.getByText('All changes saved')).toBeVisible();

		// The scenario page shows what it delivers: water from the air-lift.
		await expect(page.getByRole('heading', { name: 'What it delivers' })).toBeVisible();

		const search = `scenarios=${baseline},${proposal}&baseline=${baseline}&start=${start}`;
		await gotoReady(page, `/compare?${search}`);
		await expect(page.getByRole('heading', { name: 'What each scenario delivers' })).toBeVisible();
		await expect(cell(page, 'Water moved', 1)).toHaveText(waterText(200));
		await expect(cell(page, 'Water moved', 2)).toContainText('L/min');
		await expect(cell(page, 'Oxygen supplied', 2)).toBeVisible();
		await expect(cell(page, 'Mains-powered devices in the water', 1)).toHaveText('1 unit');
		await expect(cell(page, 'Mains-powered devices in the water', 2)).toHaveText('0 units');
		await expect(
			page.getByText('“Air-lift instead (invented)” has no mains power in the water', { exact: false })
		).toBeVisible();
	});
});
