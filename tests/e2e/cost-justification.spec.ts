import ExcelJS from 'exceljs';
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_PASSWORD, acceptSiteInvitation, gotoReady, signInWithPassword, uniqueEmail } from './helpers';
import { demoSites } from './site-setup';

// The grant writer's path (issue 17): a person the hatchery was shared with as a viewer goes from the
// site page to its cost justification, reads the summary, and downloads the workbook, whose figures
// are the page's. The demo hatchery: "One large pump, always on" is installed (the baseline), "Small
// pump plus an air-lift" is proposed with a $95 one-off cost (invented demo figures).
const hatchery = demoSites.sites[0]!;
const installed = hatchery.scenarios[0]!;
const proposal = hatchery.scenarios[1]!;
const guest = uniqueEmail('justification-guest');
const GUEST_PASSWORD = 'justification guest password 1';

test.beforeAll(async ({ browser, baseURL }) => {
	const owner = await (await browser.newContext({ baseURL })).newPage();
	await signInWithPassword(owner, 'owner@example.org', DEMO_PASSWORD);
	await gotoReady(owner, `/sites/${hatchery.id}`);
	const shared = await owner.request.post(`/sites/${hatchery.id}?/share`, {
		form: { email: guest, role: 'viewer' },
		headers: { origin: baseURL!, 'x-sveltekit-action': 'true' }
	});
	expect(shared.status()).toBe(200);
	expect(((await shared.json()) as { type: string }).type).not.toBe('failure');
	await owner.context().close();
	await acceptSiteInvitation(browser, baseURL!, guest, 'Justification guest (invented)', GUEST_PASSWORD);
});

test('a site viewer finds the cost justification, reads the summary and downloads the workbook', async ({
	page
}) => {
	await signInWithPassword(page, guest, GUEST_PASSWORD);
	await gotoReady(page, `/sites/${hatchery.id}`);
	await page.getByRole('link', { name: 'Cost justification' }).click();
	await expect(page.getByRole('heading', { name: 'Cost justification', level: 1 })).toBeVisible();

	const main = page.getByRole('main');
	await expect(page.getByRole('heading', { name: 'In plain words' })).toBeVisible();
	await expect(main).toContainText(`“${installed.name}” is what is installed now`);
	await expect(main).toContainText(`Choosing “${proposal.name}” instead of “${installed.name}” saves about`);
	await expect(main).toContainText('Air line and riser pipe');
	await expect(main).toContainText('Installed (already paid for)');
	await expect(main).toContainText('CO₂ is not set');
	await expect(page.getByRole('heading', { name: 'Sources' })).toBeVisible();
	// The tariff version's provenance, in words: its dates in force and when its source was checked.
	await expect(page.getByRole('region', { name: 'Sources' })).toContainText(
		/, version \d+, in force from \d{1,2} \w+ \d{4}.*: (source: .+|no source given), checked \d{1,2} \w+ \d{4}/
	);
	await expect(page.getByRole('heading', { name: 'Cautions' })).toBeVisible();
	await expect(page.getByRole('link', { name: 'Printable report' })).toBeVisible();
	// At a phone's width the page does not scroll sideways (wide tables scroll inside their own region).
	await page.setViewportSize({ width: 390, height: 844 });
	await expect.poll(() => page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
	await page.setViewportSize({ width: 1280, height: 900 });

	const download = page.waitForEvent('download');
	await page.getByRole('link', { name: 'Workbook (.xlsx)' }).click();
	const file = await download;
	expect(file.suggestedFilename()).toMatch(/\.xlsx$/);
	const bytes = readFileSync((await file.path())!);
	// An .xlsx is a zip archive: it starts with "PK".
	expect(bytes.subarray(0, 2).toString()).toBe('PK');
	const workbook = new ExcelJS.Workbook();
	await workbook.xlsx.load(bytes as unknown as ExcelJS.Buffer);
	const summary = workbook.getWorksheet('Summary');
	expect(summary?.getCell('A5').value).toBe(`${installed.name} (baseline)`);
	const cost = summary?.getCell('E5').result as number;
	expect(cost).toBeGreaterThan(0);
	const cents = cost.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
	await expect(page.getByRole('table', { name: 'The scenarios compared' })).toContainText(`$${cents}`);
	// The installed baseline's purchase and installation is its one-off costs only: none.
	expect(summary?.getCell('F5').result ?? 0).toBe(0);
	expect(summary?.getCell('L5').value).toBe('Installed (already paid for)');
});

test('the justification page of a site the caller may not read is not found', async ({ page }) => {
	await signInWithPassword(page, 'grower@example.org');
	const response = await page.request.get(`/sites/${hatchery.id}/justification`);
	expect(response.status()).toBe(404);
});
