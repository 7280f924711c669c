import {
	expect,
	test,
	type Browser,
	type BrowserContext,
	type BrowserContextOptions,
	type Locator,
	type Page
} from '@playwright/test';
import { DEMO_PASSWORD, DEMO_WS, gotoReady } from './helpers';
import { baselineOf, createSite } from './site-setup';

/*
 * The pages a grower uses at the tank, on a 390 × 844 phone: nothing wider than the screen, the save bar in
 * reach at the end of a long list, 44 px tap targets, a one-row header, folded tariff filters, tables that
 * scroll instead of cutting a figure, whole dates and chart labels that do not collide.
 */
const PHONE = { width: 390, height: 844 };
const HATCHERY_SCENARIOS = ['5c0e0000-0000-4000-8000-000000000101', '5c0e0000-0000-4000-8000-000000000102'];
const COMPARE = `/compare?scenarios=${HATCHERY_SCENARIOS.join(',')}`;
const DEVICES = 30;

let storageState: BrowserContextOptions['storageState'];
const opened: BrowserContext[] = [];
let siteId = '';
let scenarioId = '';
let billId = '';

/** An invented site with a long equipment list and a year of bills, made once for these tests. */
test.beforeAll(async ({ browser }) => {
	const context = await browser.newContext();
	const page = await context.newPage();
	await gotoReady(page, '/signin');
	await page.locator('#pw-email').fill('owner@example.org');
	await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
	await page.getByRole('button', { name: 'Sign in', exact: true }).click();
	await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();

	siteId = await createSite({ request: page.request }, 'Phone layout test site', {
		tariffId: '7a1c0000-0000-4000-8000-000000000400'
	});
	scenarioId = await baselineOf(page.request, siteId);
	const list = await (await page.request.get(`/api/v1/scenarios/${scenarioId}/equipment`)).json();
	const devices = Array.from({ length: DEVICES }, (_, i) => ({
		name: `Raceway ${i + 1} pump`,
		category: 'water-pump',
		inWater: true,
		power: { watts: 120 + i * 10 },
		schedule: { type: 'always' }
	}));
	const put = await page.request.put(`/api/v1/scenarios/${scenarioId}/equipment`, {
		data: { expectedRevision: list.revision, devices }
	});
	expect(put.status()).toBe(200);
	for (let month = 1; month <= 12; month++) {
		const mm = String(month).padStart(2, '0');
		const last = new Date(Date.UTC(2026, month, 0)).getUTCDate();
		const bill = await page.request.post(`/api/v1/sites/${siteId}/bills`, {
			data: { periodFrom: `2026-${mm}-01`, periodTo: `2026-${mm}-${last}`, kwh: 2400 + month, amount: 312.5 }
		});
		expect(bill.status()).toBe(201);
		billId = ((await bill.json()) as { id: string }).id;
	}
	storageState = await context.storageState();
	await context.close();
});

async function phone(browser: Browser, signedIn = true): Promise<Page> {
	const context = await browser.newContext({ viewport: PHONE, ...(signedIn ? { storageState } : {}) });
	opened.push(context);
	return context.newPage();
}

test.afterEach(async () => {
	for (const context of opened.splice(0)) await context.close();
});

/** Width and height of a control, to compare with the 44 × 44 px a wet thumb needs. */
async function expectTappable(control: Locator) {
	await expect(control).toBeVisible();
	const box = (await control.boundingBox())!;
	expect(box.width, `width of ${await control.textContent()}`).toBeGreaterThanOrEqual(44);
	expect(box.height, `height of ${await control.textContent()}`).toBeGreaterThanOrEqual(44);
}

/** Nothing on the page is wider than the phone: tables scroll inside their own box. */
async function expectNoSidewaysScroll(page: Page) {
	expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
}

/** Every figure cell shows its whole figure: no cell is narrower than its text. */
async function expectWholeFigures(page: Page) {
	const clipped = await page.evaluate(() =>
		[...document.querySelectorAll('main td.num, main th.num')]
			.filter((cell) => cell.scrollWidth > cell.clientWidth)
			.map((cell) => cell.textContent?.trim())
	);
	expect(clipped).toEqual([]);
}

/** In every drawn chart, labels on the same line of an axis do not overlap. */
async function expectNoCollidingLabels(page: Page) {
	await expect(page.locator('figure svg text').first()).toBeVisible();
	const collisions = await page.evaluate(() => {
		const found: string[] = [];
		for (const svg of document.querySelectorAll('figure svg')) {
			const rows = new Map<number, DOMRect[]>();
			for (const text of svg.querySelectorAll('text')) {
				const box = text.getBoundingClientRect();
				if (!text.textContent?.trim() || box.width === 0) continue;
				const key = Math.round(box.top);
				rows.set(key, [...(rows.get(key) ?? []), box]);
			}
			for (const boxes of rows.values()) {
				boxes.sort((a, b) => a.left - b.left);
				for (let i = 1; i < boxes.length; i++)
					if (boxes[i]!.left < boxes[i - 1]!.right) found.push(`${boxes[i - 1]!.left}→${boxes[i]!.left}`);
			}
		}
		return found;
	});
	expect(collisions).toEqual([]);
}

test.describe('phone layout at 390 × 844', () => {
	test('no page a grower uses scrolls sideways', async ({ browser }) => {
		const page = await phone(browser);
		for (const path of [
			`/sites/${siteId}/scenarios/${scenarioId}`,
			`/sites/${siteId}`,
			`/w/${DEMO_WS.id}/sites`,
			`/sites/${siteId}/bills`,
			`/sites/${siteId}/bills/${billId}`,
			`/sites/${siteId}/usage`,
			COMPARE,
			'/tariffs'
		]) {
			await gotoReady(page, path);
			await expectNoSidewaysScroll(page);
		}
		const signedOut = await phone(browser, false);
		await gotoReady(signedOut, '/signin');
		await expectNoSidewaysScroll(signedOut);
		await expectTappable(signedOut.getByRole('button', { name: 'Sign in', exact: true }));
		await expectTappable(signedOut.getByRole('banner').getByRole('link', { name: 'Sign in' }));
	});

	test('the save bar stays in reach at the end of a long list and covers no device', async ({ browser }) => {
		const page = await phone(browser);
		await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
		await expect(page.getByRole('button', { name: 'Save the list' })).toHaveCount(1);
		const save = page.getByRole('button', { name: 'Save the list' });
		await expect(save).toBeInViewport({ ratio: 1 });

		const lastName = page.getByLabel('Name', { exact: true }).last();
		await lastName.scrollIntoViewIfNeeded();
		await lastName.fill('Raceway 30 pump, renamed');
		await expect(page.getByText('Changes not saved')).toBeInViewport();
		await expect(save).toBeInViewport({ ratio: 1 });
		await expect(lastName).toBeInViewport({ ratio: 1 });
		const bar = (await page.locator('.save-bar').boundingBox())!;
		expect((await lastName.boundingBox())!.y + 44).toBeLessThanOrEqual(bar.y);

		// At the end of the list the bar sits below "Add a device" and the last device is whole above it.
		await page.getByRole('button', { name: 'Add a device' }).scrollIntoViewIfNeeded();
		const lastRow = (await page.locator('li.device').last().boundingBox())!;
		const barAtEnd = (await page.locator('.save-bar').boundingBox())!;
		expect(lastRow.y + lastRow.height).toBeLessThanOrEqual(barAtEnd.y);

		await save.click();
		await expect(page.getByText('Saved.')).toBeInViewport();
		await expect(page.getByText('All changes saved')).toBeVisible();
	});

	test('controls on the scenario page are at least 44 × 44 px', async ({ browser }) => {
		const page = await phone(browser);
		await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
		const main = page.getByRole('main');
		await expectTappable(main.getByRole('button', { name: 'Hide this caution' }));
		await expectTappable(main.getByRole('link', { name: 'CSV', exact: true }));
		await expectTappable(main.getByRole('link', { name: 'XLSX', exact: true }));
		await expectTappable(main.getByRole('link', { name: 'Import a list' }));
		await expectTappable(main.getByRole('button', { name: 'Save the list' }));
		await expectTappable(main.getByRole('button', { name: 'Add a device' }));
		await expectTappable(main.getByRole('button', { name: /^Move .* down$/ }).first());
		await expectTappable(main.getByRole('radio', { name: 'Watts' }).first().locator('xpath=..'));
		await page.getByRole('button', { name: 'Hide this caution' }).click();
		await expect(page.getByText('Electrical safety.')).toHaveCount(0);
	});

	test('the signed-in header is one row, with the rest behind a Menu that the keyboard can close', async ({
		browser
	}) => {
		const page = await phone(browser);
		await gotoReady(page, `/sites/${siteId}/bills`);
		const header = page.getByRole('banner');
		expect((await header.boundingBox())!.height).toBeLessThan(64);
		const menu = header.locator('summary', { hasText: 'Menu' });
		await expectTappable(menu);
		for (const link of await header.getByRole('navigation', { name: 'Main' }).getByRole('link').all())
			if (await link.isVisible()) await expectTappable(link);
		await expect(header.getByRole('button', { name: 'Sign out' })).toBeHidden();

		await menu.click();
		const more = header.getByRole('navigation', { name: 'More pages' });
		await expectTappable(more.getByRole('link', { name: 'Tariff library' }));
		await expectTappable(header.getByRole('button', { name: 'Sign out' }));
		await page.keyboard.press('Escape');
		await expect(header.getByRole('button', { name: 'Sign out' })).toBeHidden();
		await expect(menu).toBeFocused();

		await menu.click();
		await more.getByRole('link', { name: 'Tariff library' }).click();
		await expect(page.getByRole('heading', { name: 'Tariff library', level: 1 })).toBeVisible();
		await expect(header.getByRole('button', { name: 'Sign out' })).toBeHidden();
	});

	test('bills: the table says it scrolls, figures and dates stay whole, month labels do not collide', async ({
		browser
	}) => {
		const page = await phone(browser);
		await gotoReady(page, `/sites/${siteId}/bills`);
		const table = page.getByRole('region', { name: 'Bills and the baseline’s estimates' });
		await expect(page.getByText('Swipe the table sideways to see every column.').first()).toBeVisible();
		await expect(table).toBeVisible();
		await expectWholeFigures(page);
		const splitDates = await page.evaluate(
			() => [...document.querySelectorAll('main .date')].filter((d) => d.getClientRects().length > 1).length
		);
		expect(splitDates).toBe(0);
		await expectNoCollidingLabels(page);

		await gotoReady(page, `/sites/${siteId}/bills/${billId}`);
		const title = page.getByRole('heading', { level: 1 });
		await expect(title).toContainText('2026-12-01');
		for (const date of await title.locator('.date').all())
			expect(await date.evaluate((d) => d.getClientRects().length)).toBe(1);
	});

	test('compare: the baseline’s figures are whole and inside the table’s box; downloads are tappable', async ({
		browser
	}) => {
		const page = await phone(browser);
		await gotoReady(page, COMPARE);
		await expect(page.getByRole('heading', { name: 'Side by side' })).toBeVisible();
		await expect(page.getByText('Swipe the table sideways to see every scenario.')).toBeVisible();
		await expectWholeFigures(page);
		const table = page.locator('table', {
			has: page.locator('caption', { hasText: 'The scenarios compared' })
		});
		const cut = await table.evaluate((element) => {
			// The table's scroll box: what shows of the table on the screen.
			const box = element.parentElement!;
			const right = box.getBoundingClientRect().right;
			// The first figure column is the baseline's.
			return [...box.querySelectorAll('tbody tr')]
				.map((row) => row.querySelector('td'))
				.filter((cell) => {
					if (!cell) return false;
					const range = document.createRange();
					range.selectNodeContents(cell);
					return range.getBoundingClientRect().right > right;
				})
				.map((cell) => cell!.textContent?.trim());
		});
		expect(cut).toEqual([]);
		await expect(page.getByRole('region', { name: 'The scenarios side by side' })).toBeVisible();
		for (const name of ['Download the workbook (.xlsx)', 'Table as CSV', 'Months as CSV', 'Printable report'])
			await expectTappable(page.getByRole('link', { name }));
		await expectNoCollidingLabels(page);
	});

	test('scenario charts name fewer months instead of running them together', async ({ browser }) => {
		const page = await phone(browser);
		await gotoReady(page, `/sites/${siteId}/scenarios/${scenarioId}`);
		await page.locator('figure svg').first().scrollIntoViewIfNeeded();
		await expectNoCollidingLabels(page);
	});

	test('the tariff library’s filters start folded on a phone and say how many are on', async ({
		browser
	}) => {
		const page = await phone(browser);
		await gotoReady(page, '/tariffs');
		const summary = page.locator('summary', { hasText: 'Search and filters' });
		await expectTappable(summary);
		await expect(summary).toContainText('none on');
		const search = page.getByRole('searchbox');
		await expect(search).toBeHidden();
		await summary.click();
		await expect(search).toBeVisible();
		await page.getByLabel('Country').fill('US');
		await expect(summary).toContainText('1 on');

		// At desk width the same filters start open.
		await page.setViewportSize({ width: 1366, height: 900 });
		await gotoReady(page, '/tariffs');
		await expect(page.getByRole('searchbox')).toBeVisible();
	});
});
