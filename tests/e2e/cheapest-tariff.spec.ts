import { expect, test } from '@playwright/test';
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
		// Elements reaching past the window's right edge, outside a box that scrolls on its own (none expected).
		const past = await page.evaluate(() => {
			const width = document.documentElement.clientWidth;
			return [...document.querySelectorAll('main *')]
				.filter(
					(el) => !el.closest('[role="region"][tabindex]') && el.getBoundingClientRect().right > width + 0.5
				)
				.map((el) => `${el.tagName.toLowerCase()}.${el.className}`);
		});
		expect(past).toEqual([]);
	});
});
