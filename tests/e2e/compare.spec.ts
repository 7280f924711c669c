import ExcelJS from 'exceljs';
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, signInWithPassword } from './helpers';
import { demoSites } from './site-setup';

const hatchery = demoSites.sites[0]!;
const greenhouse = demoSites.sites[1]!;

test.describe('comparing scenarios', () => {
	test('a viewer compares two demo scenarios, reads the charts and summary, downloads the workbook and CSV, and prints the report', async ({
		page
	}) => {
		await signInWithPassword(page, 'viewer@example.org');
		await gotoReady(page, '/compare');
		for (const s of hatchery.scenarios.slice(0, 2)) await page.getByLabel(s.name, { exact: false }).check();
		await page.getByLabel('Emission factor (kg CO₂ per kWh)').fill('0.4');
		await page.getByLabel('Source of the emission factor').fill('Example value, not a published factor');
		await page.getByRole('button', { name: 'Compare' }).click();

		const main = page.getByRole('main');
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await expect(main).toContainText(
			`Choosing “${hatchery.scenarios[1]!.name}” instead of “${hatchery.scenarios[0]!.name}” saves about`
		);
		await expect(main).toContainText('Example value, not a published factor');
		for (const caption of [
			'Cost by month, scenario beside scenario',
			'Money spent over 10 years',
			'Cost over the year by kind of charge',
			'Energy over the year by kind of equipment'
		])
			await expect(page.getByText(caption, { exact: true })).toBeVisible();
		await expect(page.locator('figure svg').first()).toBeVisible();
		await expect(page.getByRole('heading', { name: 'If one unit fails' })).toBeVisible();

		// The page's figures are the API's, which are compare()'s.
		const api = await page.request.get(`/api/v1/compare?${new URL(page.url()).searchParams}`);
		const report = (await api.json()) as { result: { scenarios: { annualCost: number }[] } };
		const cost = report.result.scenarios[0]!.annualCost.toLocaleString('en-US', { minimumFractionDigits: 2 });
		await expect(page.getByRole('table').first()).toContainText(`$${cost}`);

		const xlsx = page.waitForEvent('download');
		await page.getByRole('link', { name: 'Download the workbook (.xlsx)' }).click();
		const workbookFile = await xlsx;
		expect(workbookFile.suggestedFilename()).toBe(
			`alder-creek-trout-hatchery-demo-comparison-${new Date().getFullYear()}.xlsx`
		);
		const workbook = new ExcelJS.Workbook();
		await workbook.xlsx.readFile((await workbookFile.path())!);
		expect(workbook.worksheets.map((w) => w.name)).toContain('Summary');

		const csv = page.waitForEvent('download');
		await page.getByRole('link', { name: 'Table as CSV' }).click();
		const csvFile = await csv;
		expect(csvFile.suggestedFilename()).toBe(
			`alder-creek-trout-hatchery-demo-comparison-${new Date().getFullYear()}.csv`
		);
		const lines = readFileSync((await csvFile.path())!, 'utf8')
			.trim()
			.split('\r\n');
		expect(lines).toHaveLength(3);
		expect(lines[0]).toMatch(
			/^scenario,site,tariff,baseline,status,energy_a_year_kWh,running_cost_a_year_USD,one_off_costs_USD,purchase_and_installation_USD,/
		);

		await page.getByRole('link', { name: 'Printable report' }).click();
		await expect(page.getByRole('heading', { name: 'Sources' })).toBeVisible();
		await expect(page.getByText('Electrical safety.')).toBeVisible();
		const article = page.getByRole('article').first();
		await expect(article).toContainText('Prepared by');
		await expect(article).toContainText('Air line and riser pipe');
		await expect(article).toContainText(/\/rules/);
		await expect(article.getByText('Runrate’s rules page, /rules')).toHaveCount(0);
		await page.emulateMedia({ media: 'print' });
		await expect(page.getByRole('button', { name: 'Print or save as PDF' })).toBeHidden();
		// The tables behind the charts print as tables; their toggles and the development banner do not print.
		await expect(page.getByText('captured e-mail')).toBeHidden();
		await expect(page.locator('details > summary').first()).toBeHidden();
		await expect(page.locator('figure table').first()).toBeVisible();
		for (const format of ['A4', 'Letter'] as const) {
			const pdf = await page.pdf({ format });
			expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
		}
	});

	test('more than six scenarios get a clear message, and a scenario the caller may not read is not found', async ({
		page,
		browser
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const all = demoSites.sites.flatMap((s) => s.scenarios.map((c) => c.id));
		const seven = [...all, all[0]!.replace(/.$/, '9')].slice(0, 7);
		const tooMany = await page.request.get(`/api/v1/compare?scenarios=${seven.join(',')}`);
		expect(tooMany.status()).toBe(400);
		expect((await tooMany.json()).message).toBe('Pick at most 6 scenarios: a comparison shows up to 6');

		await gotoReady(page, '/compare');
		for (const s of [...hatchery.scenarios, ...greenhouse.scenarios].slice(0, 5))
			await page.getByLabel(s.name).check();
		// Other tests add sites: the search brings the third demo site into the list, whatever sorts before it.
		await page.getByLabel('Find a site or scenario').fill(demoSites.sites[2]!.name);
		await page.getByLabel(demoSites.sites[2]!.scenarios[0]!.name).check();
		await page.getByLabel(demoSites.sites[2]!.scenarios[1]!.name).check();
		await expect(page.getByText('Pick at most 6 scenarios')).toBeVisible();
		await expect(page.getByRole('button', { name: 'Compare' })).toBeDisabled();

		const outsider = await (await browser.newContext()).newPage();
		await signInWithPassword(outsider, 'grower@example.org');
		const hidden = `scenarios=${hatchery.scenarios[0]!.id},${hatchery.scenarios[1]!.id}`;
		for (const path of [
			'/api/v1/compare',
			'/api/v1/compare/export.xlsx',
			'/api/v1/compare/export.csv',
			'/compare'
		])
			expect((await outsider.request.get(`${path}?${hidden}`)).status(), path).toBe(404);
	});
});
