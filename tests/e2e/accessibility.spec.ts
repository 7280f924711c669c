import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { WHO, makeFixtures, pageRoutes, type Route, type Who } from './access-routes';
import { AXE_CONTEXT, blockingFindings, describeFindings, type Finding } from './axe';
import { signInWithPassword } from './helpers';

// The accessibility gate: axe-core on every page of the access matrix, signed out and signed in, at desk
// and phone width. Any serious or critical violation fails, with the rule, the element and what is wrong.

const WIDTHS = [
	{ name: 'desk', width: 1366, height: 900 },
	{ name: 'phone', width: 390, height: 844 }
];
/** Pages per test: each test stays well inside its time on a busy 2-core machine. */
const GROUP = 6;

/**
 * Who looks at which pages. Signed out and the owner see every page open to them; the viewer sees the
 * workspace's pages read-only (no editing controls, other notices), and the platform admin sees the tariff
 * library with its editing controls and the public tariff's editor nobody else may open.
 */
const READERS: { who: Exclude<Who, 'guest'>; email?: string; sees: (path: string) => boolean }[] = [
	{ who: 'anonymous', sees: () => true },
	{ who: 'owner', email: 'owner@example.org', sees: () => true },
	{ who: 'viewer', email: 'viewer@example.org', sees: (path) => /^\/(w|sites|compare)\//.test(path) },
	{ who: 'admin', email: 'admin@example.org', sees: (path) => /^\/(tariffs|admin)\b/.test(path) }
];

/** A reader's pages: those that answer them with 200, and one error page (all errors share one layout). */
function pagesFor(who: Who, sees: (path: string) => boolean): Route[] {
	const column = WHO.indexOf(who);
	const pages = pageRoutes();
	const open = pages.filter((r) => r.expect[column] === 200 && sees(r.path()));
	const error = pages.find((r) => r.expect[column] === 404);
	return error ? [...open, error] : open;
}

type StorageState = Awaited<ReturnType<BrowserContext['storageState']>>;
/** Each reader's cookies, signed in once and reused by every test. */
const signedIn = new Map<Who, StorageState>();

test.beforeAll(async ({ browser, baseURL }) => {
	for (const { who, email } of READERS) {
		if (!email) continue;
		const context = await browser.newContext({ baseURL });
		const page = await context.newPage();
		await signInWithPassword(page, email);
		if (who === 'owner') await makeFixtures(context.request, baseURL!);
		signedIn.set(who, await context.storageState());
		await context.close();
	}
});

/** Two animation frames: charts measure their box and draw after a resize. */
const settle = (page: Page) =>
	page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));

for (const { who, sees } of READERS) {
	const pages = pagesFor(who, sees);
	for (let first = 0; first < pages.length; first += GROUP) {
		const group = pages.slice(first, first + GROUP);
		test(`axe: ${who}, pages ${first + 1}–${first + group.length} of ${pages.length}`, async ({
			browser,
			baseURL
		}) => {
			test.setTimeout(120_000);
			const context = await browser.newContext({
				...AXE_CONTEXT,
				baseURL,
				storageState: signedIn.get(who)
			});
			const page = await context.newPage();
			const found: { where: string; findings: Finding[] }[] = [];
			for (const route of group) {
				const path = route.path();
				await page.setViewportSize(WIDTHS[0]!);
				await page.goto(path);
				await expect(page.locator('body[data-hydrated="true"]')).toBeAttached();
				for (const size of WIDTHS) {
					await page.setViewportSize(size);
					await settle(page);
					found.push({ where: `${path} (${who}, ${size.name})`, findings: await blockingFindings(page) });
				}
			}
			await context.close();
			const failures = found.flatMap((f) => f.findings);
			expect(failures, `serious or critical accessibility violations:\n${describeFindings(found)}`).toEqual(
				[]
			);
		});
	}
}
