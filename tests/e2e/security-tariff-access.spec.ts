import { expect, test, type APIRequestContext } from '@playwright/test';
import postgres from 'postgres';
import {
	DEMO_WS,
	acceptSiteInvitation,
	OTHER_WS,
	gotoReady,
	inventedTariff,
	signInWithPassword,
	uniqueEmail,
	rawPump
} from './helpers';
import {
	type Caller,
	PUBLIC_TARIFF as publicTariff,
	baselineOf,
	callerAs,
	siteBody as inventedSite
} from './site-setup';

// Issue 14, items 4 and 9: a workspace's private tariff is used only by that workspace's sites, and a
// site guest is offered (and may choose) only public tariffs and the site's current one.

/** A rate nobody else uses, so it can be looked for in every answer. */
const SECRET_RATE = 0.4321;
const UNAVAILABLE = "This site's tariff is not available to this workspace";

/** A private tariff of the demo co-op (workspace A), with a name and a rate found nowhere else. */
async function secretTariff(owner: Caller, name: string) {
	const body = inventedTariff('Hidden Valley Power (invented)', name);
	body.structure.energyCharges[0]!.perKwh = SECRET_RATE;
	const made = await owner.request.post('/api/v1/tariffs', {
		headers: owner.headers,
		data: { workspaceId: DEMO_WS.id, ...body }
	});
	expect(made.status()).toBe(201);
	return (await made.json()).id as string;
}

const siteBody = (workspaceId: string, more: Record<string, unknown> = {}) =>
	inventedSite('Tariff access site', { workspaceId, ...more });

/** A site with a baseline holding one pump and a second scenario, on the public tariff. */
async function pricedSite({ request, headers }: Caller, workspaceId: string) {
	const made = await request.post('/api/v1/sites', {
		headers,
		data: siteBody(workspaceId, { tariffId: publicTariff })
	});
	expect(made.status()).toBe(201);
	const siteId = (await made.json()).id as string;
	const baseline = await baselineOf(request, siteId);
	const equipment = `/api/v1/scenarios/${baseline}/equipment`;
	const start = (await (await request.get(equipment)).json()).revision as number;
	const added = await request.post(equipment, {
		headers,
		data: { expectedRevision: start, device: rawPump }
	});
	expect(added.status()).toBe(201);
	const other = await request.post(`/api/v1/sites/${siteId}/scenarios`, {
		headers,
		data: { name: 'Smaller pump', fromScenarioId: baseline }
	});
	expect(other.status()).toBe(201);
	return { siteId, baseline, other: (await other.json()).id as string };
}

const issuesOf = async (res: { json(): Promise<unknown> }) =>
	((await res.json()) as { issues?: { path: string; message: string }[] }).issues ?? [];

test.describe('private tariffs stay in their workspace', () => {
	test('tariff access: creating a site on another workspace’s private tariff is refused like an unknown id', async ({
		browser,
		baseURL
	}) => {
		const owner = await callerAs(browser, 'owner@example.org', baseURL!);
		const secret = await secretTariff(owner, `Secret create tariff ${Date.now()}`);
		const grower = await callerAs(browser, 'grower@example.org', baseURL!);
		const { request, headers } = grower;

		const foreign = await request.post('/api/v1/sites', {
			headers,
			data: siteBody(OTHER_WS.id, { tariffId: secret })
		});
		expect(foreign.status()).toBe(400);
		const foreignIssues = await issuesOf(foreign);
		expect(foreignIssues.map((i) => i.path)).toEqual(['tariffId']);

		// An id that exists nowhere gets the very same answer: no way to learn which ids exist.
		const unknown = await request.post('/api/v1/sites', {
			headers,
			data: siteBody(OTHER_WS.id, { tariffId: '00000000-0000-4000-8000-000000000000' })
		});
		expect(unknown.status()).toBe(400);
		expect(await issuesOf(unknown)).toEqual(foreignIssues);

		const noSuchVersion = await request.post('/api/v1/sites', {
			headers,
			data: siteBody(OTHER_WS.id, { tariffId: publicTariff, tariffVersion: 999 })
		});
		expect(noSuchVersion.status()).toBe(400);
		expect((await issuesOf(noSuchVersion)).map((i) => i.path)).toEqual(['tariffVersion']);

		const fine = await request.post('/api/v1/sites', {
			headers,
			data: siteBody(OTHER_WS.id, { tariffId: publicTariff, tariffVersion: 1 })
		});
		expect(fine.status()).toBe(201);

		// The site form refuses it at the field too.
		const page = await (await browser.newContext({ baseURL })).newPage();
		await signInWithPassword(page, 'grower@example.org');
		const form = await page.request.post(`/w/${OTHER_WS.id}/sites/new`, {
			headers: { origin: baseURL!, 'x-sveltekit-action': 'true' },
			form: siteBody(OTHER_WS.id, { tariffId: secret })
		});
		const answer = await form.json();
		expect(answer.type).toBe('failure');
		expect(answer.data).toContain('tariffId');
	});

	test('tariff access: a site forced onto another workspace’s private tariff shows none of it', async ({
		browser,
		baseURL
	}) => {
		const name = `Secret forced tariff ${Date.now()}`;
		const owner = await callerAs(browser, 'owner@example.org', baseURL!);
		const secret = await secretTariff(owner, name);
		const grower = await callerAs(browser, 'grower@example.org', baseURL!);
		const { request } = grower;
		const site = await pricedSite(grower, OTHER_WS.id);
		const compare = `scenarios=${site.baseline},${site.other}&baseline=${site.baseline}&start=2027-01`;
		const reads = [
			`/api/v1/scenarios/${site.baseline}/results`,
			`/api/v1/compare?${compare}`,
			`/api/v1/compare/export.xlsx?${compare}`,
			`/api/v1/compare/export.csv?${compare}`,
			`/compare/report?${compare}`,
			`/sites/${site.siteId}`,
			`/w/${OTHER_WS.id}/sites`
		];
		// Before: the site prices on the public tariff.
		expect((await request.get(reads[0]!)).status()).toBe(200);

		// The state a missing check once let in: written straight to the database.
		const sql = postgres(process.env.DATABASE_URL!, { max: 1 });
		try {
			await sql`update site set tariff_id = ${secret}, tariff_version = null where id = ${site.siteId}`;
			await expectNothingOf(request, reads, name);
			const results = await request.get(reads[0]!);
			expect(results.status()).toBe(409);
			expect((await results.json()).message).toContain(UNAVAILABLE);

			// A scenario's own override to that tariff is treated the same way.
			await sql`update site set tariff_id = ${publicTariff} where id = ${site.siteId}`;
			await sql`update scenario set tariff_id = ${secret} where id = ${site.baseline}`;
			await expectNothingOf(request, reads, name);
			expect((await request.get(reads[0]!)).status()).toBe(409);
			expect((await request.get(`/api/v1/scenarios/${site.other}/results`)).status()).toBe(200);
		} finally {
			await sql.end();
		}
	});
});

/** Every read answers without the tariff's name or its rate. */
async function expectNothingOf(request: APIRequestContext, paths: string[], name: string) {
	for (const path of paths) {
		const res = await request.get(path, { maxRedirects: 0 });
		expect.soft(res.status(), path).toBeLessThan(500);
		const bytes = await res.body();
		const text = path.includes('.xlsx') && res.status() === 200 ? '' : bytes.toString('utf8');
		expect.soft(text, path).not.toContain(name);
		expect.soft(text, path).not.toContain(String(SECRET_RATE));
		// A workbook is a zip, so its text says nothing: a 200 from the API would mean it was priced at all.
		if (path.startsWith('/api/v1/compare')) expect.soft(res.status(), path).toBe(400);
		// The pages say why instead (the report page shows the API's problem on the page).
		if (path.startsWith('/compare') || path.startsWith('/sites'))
			expect.soft(text.replaceAll('&#39;', "'").replaceAll('’', "'"), path).toContain(UNAVAILABLE);
	}
}

test.describe('a site guest and the workspace’s private tariffs', () => {
	test('tariff access: a guest is offered and may choose only public tariffs and the site’s own', async ({
		browser,
		baseURL
	}) => {
		const owner = await callerAs(browser, 'owner@example.org', baseURL!);
		const name = `Secret guest tariff ${Date.now()}`;
		const secret = await secretTariff(owner, name);
		const site = await pricedSite(owner, DEMO_WS.id);
		const email = uniqueEmail('tariff-guest');
		const password = 'tariff guest password 1';
		const shared = await owner.request.post(`/sites/${site.siteId}?/share`, {
			form: { email, role: 'editor' },
			headers: { ...owner.headers, 'x-sveltekit-action': 'true' }
		});
		expect((await shared.json()).type).toBe('success');
		await acceptSiteInvitation(browser, baseURL!, email, 'Tariff guest (invented)', password);

		const page = await (await browser.newContext({ baseURL })).newPage();
		await signInWithPassword(page, email, password);
		const guest = { request: page.request, headers: { origin: baseURL! } };

		// The site form lists no private tariff of the workspace.
		await gotoReady(page, `/sites/${site.siteId}/edit`);
		await expect(page.getByLabel('Tariff', { exact: true })).toBeVisible();
		expect(await page.content()).not.toContain(name);

		const patch = await guest.request.patch(`/api/v1/scenarios/${site.other}`, {
			headers: guest.headers,
			data: { tariff: { tariffId: secret } }
		});
		expect(patch.status()).toBe(400);
		expect((await issuesOf(patch)).map((i) => i.path)).toEqual(['tariff.tariffId']);

		const current = await (await guest.request.get(`/api/v1/sites/${site.siteId}`)).json();
		const put = await guest.request.put(`/api/v1/sites/${site.siteId}`, {
			headers: guest.headers,
			data: { ...current, tariffId: secret, expectedRevision: current.revision }
		});
		expect(put.status()).toBe(400);
		expect((await issuesOf(put)).map((i) => i.path)).toEqual(['tariffId']);

		const form = await guest.request.post(`/sites/${site.siteId}/edit`, {
			headers: { ...guest.headers, 'x-sveltekit-action': 'true' },
			form: {
				name: current.name,
				timezone: current.timezone,
				country: current.country,
				currency: current.currency,
				tariffId: secret,
				revision: String(current.revision)
			}
		});
		const refused = await form.json();
		expect(refused.type).toBe('failure');
		expect(refused.data).toContain('tariffId');

		// Public tariffs and the site's current one stay open to the guest.
		const publicChoice = await guest.request.patch(`/api/v1/scenarios/${site.other}`, {
			headers: guest.headers,
			data: { tariff: { tariffId: publicTariff } }
		});
		expect(publicChoice.status()).toBe(200);
		const keep = await guest.request.put(`/api/v1/sites/${site.siteId}`, {
			headers: guest.headers,
			data: { ...current, name: `${current.name} renamed`, expectedRevision: current.revision }
		});
		expect(keep.status()).toBe(200);

		// A member of the workspace may still choose its private tariff.
		const member = await owner.request.patch(`/api/v1/scenarios/${site.other}`, {
			headers: owner.headers,
			data: { tariff: { tariffId: secret } }
		});
		expect(member.status()).toBe(200);
	});
});
