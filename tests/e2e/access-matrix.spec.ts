import { expect, test, type APIRequestContext } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_WS, gotoReady } from './helpers';

// Every route that exists, against every kind of caller. Expected statuses: 303 = sent to sign-in.
type Who = 'anonymous' | 'viewer' | 'editor' | 'owner' | 'outsider';
const people: Record<Exclude<Who, 'anonymous'>, string> = {
	viewer: 'viewer@example.org',
	editor: 'editor@example.org',
	owner: 'owner@example.org',
	outsider: 'grower@example.org'
};

const ws = `/w/${DEMO_WS.id}`;
// Harmless payloads: each is invalid or a no-op past the guard, so a 400 proves the guard let it through.
const routes: {
	method: 'GET' | 'POST';
	path: string;
	form?: Record<string, string>;
	expect: Record<Who, number[]>;
}[] = [
	{
		method: 'GET',
		path: '/workspaces',
		expect: { anonymous: [303], viewer: [200], editor: [200], owner: [200], outsider: [200] }
	},
	{
		method: 'GET',
		path: ws,
		expect: { anonymous: [303], viewer: [200], editor: [200], owner: [200], outsider: [404] }
	},
	{
		method: 'GET',
		path: '/w/00000000-0000-4000-8000-000000000000',
		expect: { anonymous: [303], viewer: [404], editor: [404], owner: [404], outsider: [404] }
	},
	{
		method: 'GET',
		path: '/w/not-a-uuid',
		expect: { anonymous: [303], viewer: [404], editor: [404], owner: [404], outsider: [404] }
	},
	...['rename', 'invite', 'changeRole', 'remove', 'revoke', 'delete'].map((action) => ({
		method: 'POST' as const,
		path: `${ws}?/${action}`,
		form: { name: '', email: 'bad', role: 'nope', userId: '', invitationId: 'x', confirmName: 'wrong' },
		expect: { anonymous: [401], viewer: [403], editor: [403], owner: [400], outsider: [404] }
	})),
	{
		method: 'POST',
		path: '/workspaces?/create',
		form: { name: '' },
		expect: { anonymous: [401], viewer: [400], editor: [400], owner: [400], outsider: [400] }
	}
];

async function effectiveStatus(res: import('@playwright/test').APIResponse): Promise<number> {
	if (!(res.headers()['content-type'] ?? '').includes('application/json') || res.status() !== 200)
		return res.status();
	const body = (await res.json()) as { type: string; status?: number };
	return body.type === 'failure' || body.type === 'redirect' ? (body.status ?? 200) : res.status();
}

async function requestAs(
	who: Who,
	baseURL: string,
	browser: import('@playwright/test').Browser
): Promise<APIRequestContext> {
	const context = await browser.newContext({ baseURL });
	if (who !== 'anonymous') {
		const page = await context.newPage();
		await gotoReady(page, '/signin');
		await page.locator('#pw-email').fill(people[who]);
		await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
		await page.getByRole('button', { name: 'Sign in', exact: true }).click();
		await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
	}
	return context.request;
}

for (const who of ['anonymous', 'viewer', 'editor', 'owner', 'outsider'] as const) {
	test(`access matrix: ${who}`, async ({ browser, baseURL }) => {
		const request = await requestAs(who, baseURL!, browser);
		for (const route of routes) {
			const res =
				route.method === 'GET'
					? await request.get(route.path, { maxRedirects: 0 })
					: await request.post(route.path, {
							form: route.form,
							// As use:enhance sends it: a failed action then reports its own status in the JSON body.
							headers: { origin: baseURL!, 'x-sveltekit-action': 'true' },
							maxRedirects: 0
						});
			expect(route.expect[who], `${who} ${route.method} ${route.path}`).toContain(await effectiveStatus(res));
			if (who === 'outsider' && route.path.startsWith(ws))
				expect(await res.text()).not.toContain(DEMO_WS.name);
		}
	});
}
