import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { gotoReady, signInWithPassword } from './helpers';
import { createSite, PUBLIC_TARIFF } from './site-setup';

// An invented site on the demo's public tariff, given a year of invented hourly readings through the
// usage API (a CSV sheet, as a person would import it), then the page ranks the tariffs it may use.

/** 2026 in full and 5 hours of 2027 (Chicago): 4 kWh an hour at night (22–06), 0.5 kWh by day. */
function yearCsv(): string {
	const lines = ['timestamp,kWh,minutes'];
	const start = Date.parse('2026-01-01T06:00:00Z');
	for (let i = 0; i < 8760 + 5; i++) {
		const at = new Date(start + i * 3_600_000);
		const hour = Number(
			at.toLocaleString('en-US', { timeZone: 'America/Chicago', hour: 'numeric', hourCycle: 'h23' })
		);
		lines.push(`${at.toISOString().slice(0, 16)}Z,${hour >= 22 || hour < 6 ? 4 : 0.5},60`);
	}
	return lines.join('\n') + '\n';
}

/** Elements reaching past the window's right edge, outside a box that scrolls on its own (none expected). */
const pastRightEdge = (page: Page) =>
	page.evaluate(() => {
		const width = document.documentElement.clientWidth;
		return [...document.querySelectorAll('main *')]
			.filter(
				(el) => !el.closest('[role="region"][tabindex]') && el.getBoundingClientRect().right > width + 0.5
			)
			.map((el) => `${el.tagName.toLowerCase()}.${el.className}`);
	});

const demoSite = (
	JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
		sites: { id: string; scenarios: { id: string }[] }[];
	}
).sites[0]!;

test.describe('which tariff is cheapest', () => {
	test('cheapest tariff: a site with a year of metered usage sees the tariffs ranked and the top one explained', async ({
		page,
		baseURL
	}) => {
		await signInWithPassword(page, 'editor@example.org');
		const caller = { request: page.request, headers: { origin: baseURL! } };
		const siteId = await createSite(caller, 'Cheapest test site', { tariffId: PUBLIC_TARIFF });

		// Before any usage: the page says what is missing and where to import it.
		await gotoReady(page, `/sites/${siteId}/cheapest`);
		await expect(page.getByText(/No metered usage is stored for this site yet/)).toBeVisible();
		await expect(page.getByRole('link', { name: 'Import usage' })).toHaveAttribute(
			'href',
			`/sites/${siteId}/usage`
		);

		const imported = await page.request.post(`/api/v1/sites/${siteId}/usage`, {
			headers: { origin: baseURL!, 'content-type': 'text/csv' },
			data: yearCsv()
		});
		expect(imported.status()).toBe(201);

		await gotoReady(page, `/sites/${siteId}/usage`);
		await page.getByRole('link', { name: 'Which tariff is cheapest for this usage?' }).click();
		await expect(page.getByRole('heading', { level: 1, name: 'Which tariff is cheapest?' })).toBeVisible();
		await expect(page.getByText('January 2026 – December 2026, 8,760 values of 60 minutes')).toBeVisible();
		await expect(
			page.getByText(/check that the site is eligible with the utility\s+before switching/)
		).toBeVisible();

		const table = page.getByRole('region', { name: 'Tariffs ranked by annual cost' });
		const current = table.getByRole('row').filter({ has: page.getByText('current', { exact: true }) });
		await expect(current).toHaveCount(1);
		await expect(current).toContainText('current tariff');
		await expect(current.getByRole('link')).toHaveAttribute('href', `/tariffs/${PUBLIC_TARIFF}`);
		await expect(page.getByRole('heading', { level: 2, name: /comes first$/ })).toBeVisible();
		await expect(page.getByText(/Its fixed charges come to \$[\d,.]+ a year/)).toBeVisible();

		// At 390 px the page does not scroll sideways: the table scrolls in its own box.
		await page.setViewportSize({ width: 390, height: 844 });
		await expect(table).toBeVisible();
		expect(await pastRightEdge(page)).toEqual([]);
	});

	test('cheapest tariff: a demo scenario priced over the coming year, with its report and workbook', async ({
		page
	}) => {
		await signInWithPassword(page, 'owner@example.org');
		await gotoReady(page, `/sites/${demoSite.id}/cheapest`);
		// The first month belongs to a scenario's estimate: it shows once a scenario is picked.
		await expect(page.getByLabel('First month')).toHaveCount(0);
		const scenario = demoSite.scenarios[0]!.id;
		await page.getByLabel('Load to price').selectOption(scenario);
		await expect(page.getByLabel('First month')).toBeVisible();
		await page.getByRole('button', { name: 'Price it' }).click();
		await page.waitForURL((url) => url.searchParams.get('scenario') === scenario);

		// The coming 12 months: the demo's tariffs are in force then, so they are ranked, not set aside.
		await expect(
			page.getByText(/^Months priced: \w+ \d{4} – \w+ \d{4}, the estimated load of the scenario/)
		).toBeVisible();
		const table = page.getByRole('region', { name: 'Tariffs ranked by annual cost' });
		await expect(table.getByRole('row').nth(1)).toBeVisible();
		await expect(
			page.getByRole('table', { name: 'Energy and peak demand of each month priced' })
		).toBeVisible();
		const sources = page.getByRole('region', { name: 'Sources' });
		await sources.locator('summary').first().click();
		await expect(sources.getByText(/source: .+; checked on \d{4}-\d{2}-\d{2}/).first()).toBeVisible();

		// A month out of reach is refused beside its field; the coming year is still priced.
		await page.getByLabel('First month').fill('2099-01');
		await page.getByRole('button', { name: 'Price it' }).click();
		await expect(page.getByLabel('First month')).toHaveAttribute('aria-invalid', 'true');
		await expect(page.getByText(/^Choose a first month within 10 years of today/)).toBeVisible();
		await expect(table.getByRole('row').nth(1)).toBeVisible();

		await page.getByLabel('First month').fill('2027-03');
		await page.getByRole('button', { name: 'Price it' }).click();
		await expect(
			page.getByText(/^Months priced: March 2027 – February 2028, the estimated load/)
		).toBeVisible();
		await expect(page.getByLabel('First month')).not.toHaveAttribute('aria-invalid', 'true');

		// At 390 px the page with both fields does not scroll sideways.
		await page.setViewportSize({ width: 390, height: 844 });
		await expect(page.getByLabel('First month')).toBeVisible();
		expect(await pastRightEdge(page)).toEqual([]);
		await page.setViewportSize({ width: 1366, height: 900 });

		await page.getByRole('link', { name: 'Printable report' }).click();
		await page.waitForURL(/\/cheapest\/report\?scenario=.+&from=2027-03$/);
		await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
		await expect(page.getByRole('button', { name: 'Print or save as PDF' })).toBeVisible();
		await expect(
			page.getByText(/^These are estimates from the tariffs as stored; check eligibility with the utility/)
		).toBeVisible();
		await expect(page.getByText('Prepared by')).toBeVisible();
		await expect(page.getByRole('heading', { level: 2, name: 'Sources' })).toBeVisible();
		await expect(page.getByText(/^March 2027 – February 2028, the estimated load/)).toBeVisible();

		const download = page.waitForEvent('download');
		await page.getByRole('link', { name: 'Download the workbook (.xlsx)' }).click();
		const file = await download;
		expect(file.suggestedFilename()).toMatch(/^alder-creek-trout-hatchery-demo-cheapest-tariff-.+\.xlsx$/);
		const answer = await page.request.get(
			new URL(page.url()).pathname.replace(/report$/, 'export.xlsx') + new URL(page.url()).search
		);
		expect(answer.status()).toBe(200);
		expect(answer.headers()['content-type']).toBe(
			'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'
		);
		// An .xlsx is a zip archive: it starts with "PK".
		expect((await answer.body()).subarray(0, 2).toString()).toBe('PK');

		await page.setViewportSize({ width: 390, height: 844 });
		expect(await pastRightEdge(page)).toEqual([]);
	});
});
