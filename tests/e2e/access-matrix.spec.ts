import { expect, test, type APIRequestContext, type APIResponse, type Browser } from '@playwright/test';
import { readdirSync } from 'node:fs';
import { OTHER_SITE, SITE, WHO, fixtures, makeFixtures, routes, ws, type Who } from './access-routes';
import { DEMO_PASSWORD, DEMO_WS, acceptSiteInvitation, gotoReady, uniqueEmail } from './helpers';

// Every route that exists (the table is in access-routes.ts), against every kind of caller. 303 = sent
// to sign-in. The guest is a person the owner shared one site with (the hatchery, as a viewer); they
// belong to no workspace, so they cannot add tariffs either.
const people: Record<Exclude<Who, 'anonymous'>, string> = {
	viewer: 'viewer@example.org',
	editor: 'editor@example.org',
	owner: 'owner@example.org',
	outsider: 'grower@example.org',
	admin: 'admin@example.org',
	guest: uniqueEmail('matrix-guest')
};
const GUEST_PASSWORD = 'matrix guest password 1';

async function signedIn(browser: Browser, baseURL: string, who: Who): Promise<APIRequestContext> {
	const context = await browser.newContext({ baseURL });
	if (who !== 'anonymous') {
		const page = await context.newPage();
		await gotoReady(page, '/signin');
		await page.locator('#pw-email').fill(people[who]);
		await page.getByLabel('Password', { exact: true }).fill(who === 'guest' ? GUEST_PASSWORD : DEMO_PASSWORD);
		await page.getByRole('button', { name: 'Sign in', exact: true }).click();
		await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
	}
	return context.request;
}

/** Form actions answer as use:enhance sees them: a failure or redirect carries its own status in the JSON body. */
async function effectiveStatus(res: APIResponse): Promise<number> {
	if (!(res.headers()['content-type'] ?? '').includes('application/json') || res.status() !== 200)
		return res.status();
	const body = (await res.json()) as { type?: string; status?: number };
	return body.type === 'failure' || body.type === 'redirect' ? (body.status ?? 200) : res.status();
}

test.beforeAll(async ({ browser, baseURL }) => {
	const owner = await signedIn(browser, baseURL!, 'owner');
	await makeFixtures(owner, baseURL!);
	await makeGuest(browser, owner, baseURL!);
});

/** The owner shares the hatchery with a new address as a viewer; the guest accepts and sets a password. */
async function makeGuest(browser: Browser, owner: APIRequestContext, baseURL: string) {
	const shared = await owner.post(`/sites/${SITE}?/share`, {
		form: { email: people.guest, role: 'viewer' },
		headers: { origin: baseURL, 'x-sveltekit-action': 'true' }
	});
	expect(await effectiveStatus(shared)).toBe(200);
	await acceptSiteInvitation(browser, baseURL, people.guest, 'Matrix guest (invented)', GUEST_PASSWORD);
}

for (const [column, who] of WHO.entries()) {
	test(`access matrix: ${who}`, async ({ browser, baseURL }) => {
		const request = await signedIn(browser, baseURL!, who);
		for (const route of routes) {
			const path = route.path();
			const res =
				route.method === 'GET'
					? await request.get(path, { maxRedirects: 0 })
					: route.form
						? await request.post(path, {
								form: route.form,
								headers: { origin: baseURL!, 'x-sveltekit-action': 'true' },
								maxRedirects: 0
							})
						: await request.fetch(path, { method: route.method, data: route.json, maxRedirects: 0 });
			expect
				.soft([route.expect[column]], `${who} ${route.method} ${path}`)
				.toContain(await effectiveStatus(res));
			if (
				who === 'outsider' &&
				(path.startsWith(ws) || path.includes(fixtures().privateTariff) || path.includes(SITE))
			) {
				const text = await res.text();
				expect(text).not.toContain(DEMO_WS.name);
				expect(text).not.toContain('Private matrix tariff');
				expect(text).not.toContain('Alder Creek');
			}
			// The guest sees their one site and nothing else of the workspace.
			if (
				who === 'guest' &&
				(path.startsWith(ws) || path.includes(fixtures().privateTariff) || path.includes(OTHER_SITE))
			) {
				const text = await res.text();
				expect(text).not.toContain('Private matrix tariff');
				expect(text).not.toContain('Bramble Hill');
			}
		}
	});
}

/** Every page, form action and endpoint folder under src/routes, as a pattern of its addresses. */
function routeTree(dir = 'src/routes', prefix = ''): { route: string; pattern: RegExp }[] {
	const entries = readdirSync(dir, { withFileTypes: true });
	const here = entries.some((e) => /^\+(page\.svelte|page\.server\.ts|server\.ts)$/.test(e.name))
		? [
				{
					route: prefix || '/',
					pattern: new RegExp(
						`^${(prefix || '/')
							.replace(/\[\.\.\.[^\]]+\]/g, '.*')
							.replace(/\[[^\]]+\]/g, '[^/]+')
							.replace(/\./g, '\\.')}$`.replace(/\\\.\*/g, '.*')
					)
				}
			]
		: [];
	return [
		...here,
		...entries
			.filter((e) => e.isDirectory())
			.flatMap((e) => routeTree(`${dir}/${e.name}`, /^\(.*\)$/.test(e.name) ? prefix : `${prefix}/${e.name}`))
	];
}

test('every route in the tree has a row in the matrix, so a new route cannot be forgotten', () => {
	const covered = routes.map((r) => new URL(r.path(), 'http://x').pathname);
	const missing = routeTree()
		.filter(({ pattern }) => !covered.some((path) => pattern.test(path)))
		.map(({ route }) => route);
	expect(missing).toEqual([]);
});
