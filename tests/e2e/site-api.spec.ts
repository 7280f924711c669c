import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { rawPump } from './helpers';
import {
	type Caller,
	PUBLIC_TARIFF as publicTariff,
	baselineOf,
	callerAs,
	callerOn,
	createSite
} from './site-setup';

// Every test works on a site of its own, made through the API, so the demo sites stay as other tests see them.
const airPump = { ...rawPump, name: 'Air pump', category: 'air-pump', power: { watts: 60 } };

/** A fresh invented site and its baseline scenario, made by whoever `editor` is signed in as. */
async function freshSite(editor: Caller) {
	const siteId = await createSite(editor, 'API test site');
	const scenarioId = await baselineOf(editor.request, siteId);
	return { siteId, scenarioId, equipment: `/api/v1/scenarios/${scenarioId}/equipment` };
}

/** The editor, signed in on `page`, with a fresh site of their own. */
async function editorWithSite(page: Page, baseURL: string) {
	const editor = await callerOn(page, 'editor@example.org', baseURL);
	return { editor, ...editor, ...(await freshSite(editor)) };
}

/** The equipment list's revision now. */
const revisionOf = async (request: APIRequestContext, equipment: string) =>
	(await (await request.get(equipment)).json()).revision as number;

const paths = (body: { issues?: { path: string }[] }) => (body.issues ?? []).map((i) => i.path);

test.describe('the site API', () => {
	test('site API: adds, reads, replaces and removes devices by position with revision checks', async ({
		page,
		baseURL
	}) => {
		const { request, headers, equipment } = await editorWithSite(page, baseURL!);
		const start = await revisionOf(request, equipment);

		const first = await request.post(equipment, {
			headers,
			data: { expectedRevision: start, device: rawPump }
		});
		expect(first.status()).toBe(201);
		expect(await first.json()).toEqual({ revision: start + 1, position: 0 });
		const ahead = await request.post(equipment, {
			headers,
			data: { expectedRevision: start + 1, device: airPump, position: 0 }
		});
		expect(ahead.status()).toBe(201);
		expect(ahead.headers()['location']).toBe(`${equipment}/0`);
		expect(await ahead.json()).toEqual({ revision: start + 2, position: 0 });

		const one = await request.get(`${equipment}/1`);
		expect(one.status()).toBe(200);
		expect(one.headers()['cache-control']).toBe('private, no-store');
		expect(await one.json()).toMatchObject({ revision: start + 2, position: 1, device: rawPump });

		const bigger = { ...rawPump, power: { watts: 550 } };
		const stale = await request.put(`${equipment}/1`, {
			headers,
			data: { expectedRevision: start, device: bigger }
		});
		expect(stale.status()).toBe(409);
		expect(await stale.json()).toMatchObject({ error: 'conflict', currentRevision: start + 2 });
		const replaced = await request.put(`${equipment}/1`, {
			headers,
			data: { expectedRevision: start + 2, device: bigger }
		});
		expect(replaced.status()).toBe(200);
		expect(await replaced.json()).toEqual({ revision: start + 3, position: 1 });
		expect((await (await request.get(`${equipment}/1`)).json()).device.power).toEqual({ watts: 550 });

		const staleDelete = await request.delete(`${equipment}/0?expectedRevision=${start + 2}`, { headers });
		expect(staleDelete.status()).toBe(409);
		const noRevision = await request.delete(`${equipment}/0`, { headers });
		expect(noRevision.status()).toBe(400);
		expect(paths(await noRevision.json())).toEqual(['expectedRevision']);
		const removed = await request.delete(`${equipment}/0?expectedRevision=${start + 3}`, { headers });
		expect(removed.status()).toBe(204);

		const after = await (await request.get(equipment)).json();
		expect(after.revision).toBe(start + 4);
		expect(after.devices.map((d: { name: string }) => d.name)).toEqual(['Raceway pump']);
	});

	test('site API: answers 404 for a position past the end of the list', async ({ page, baseURL }) => {
		const { request, headers, equipment } = await editorWithSite(page, baseURL!);
		const revision = await revisionOf(request, equipment);
		await request.post(equipment, { headers, data: { expectedRevision: revision, device: rawPump } });

		expect((await request.get(`${equipment}/1`)).status()).toBe(404);
		expect((await request.get(`${equipment}/first`)).status()).toBe(404);
		const put = await request.put(`${equipment}/3`, {
			headers,
			data: { expectedRevision: revision + 1, device: airPump }
		});
		expect(put.status()).toBe(404);
		expect((await put.json()).error).toBe('not_found');
		const del = await request.delete(`${equipment}/1?expectedRevision=${revision + 1}`, { headers });
		expect(del.status()).toBe(404);
		const far = await request.post(equipment, {
			headers,
			data: { expectedRevision: revision + 1, device: airPump, position: 5 }
		});
		expect(far.status()).toBe(400);
		expect(paths(await far.json())).toEqual(['position']);
		// Nothing above was written.
		expect((await (await request.get(equipment)).json()).revision).toBe(revision + 1);
	});

	test('site API: refuses a duplicate device name on device.name, and bad fields with their paths', async ({
		page,
		baseURL
	}) => {
		const { request, headers, equipment } = await editorWithSite(page, baseURL!);
		const revision = await revisionOf(request, equipment);
		await request.post(equipment, { headers, data: { expectedRevision: revision, device: rawPump } });
		await request.post(equipment, { headers, data: { expectedRevision: revision + 1, device: airPump } });

		// Inserted ahead of the device it clashes with: the issue is still on the new one.
		const twin = await request.post(equipment, {
			headers,
			data: { expectedRevision: revision + 2, device: { ...rawPump, name: ' raceway PUMP' }, position: 0 }
		});
		expect(twin.status()).toBe(400);
		const body = await twin.json();
		expect(body.error).toBe('invalid_request');
		expect(body.issues).toEqual([{ path: 'device.name', message: 'Another device (row 2) has this name' }]);

		const renamed = await request.put(`${equipment}/1`, {
			headers,
			data: { expectedRevision: revision + 2, device: { ...airPump, name: 'Raceway pump' } }
		});
		expect(renamed.status()).toBe(400);
		expect(paths(await renamed.json())).toEqual(['device.name']);

		const negative = await request.post(equipment, {
			headers,
			data: { expectedRevision: revision + 2, device: { ...rawPump, name: 'Spare', power: { watts: -5 } } }
		});
		expect(negative.status()).toBe(400);
		expect(paths(await negative.json())).toContain('device.power.watts');
		expect((await (await request.get(equipment)).json()).revision).toBe(revision + 2);
	});

	test('site API: a viewer may read but not write, and an outsider finds nothing', async ({
		page,
		browser,
		baseURL
	}) => {
		const { editor, siteId, scenarioId, equipment } = await editorWithSite(page, baseURL!);
		const revision = await revisionOf(editor.request, equipment);
		await editor.request.post(equipment, {
			headers: editor.headers,
			data: { expectedRevision: revision, device: rawPump }
		});
		const site = `/api/v1/sites/${siteId}`;
		const scenario = `/api/v1/scenarios/${scenarioId}`;
		const reads = [site, scenario, equipment, `${equipment}/0`];

		const writes = (who: Caller) => [
			who.request.put(site, { headers: who.headers, data: { expectedRevision: 1, name: '' } }),
			who.request.patch(scenario, { headers: who.headers, data: { name: 'Taken over' } }),
			who.request.delete(scenario, { headers: who.headers }),
			who.request.post(equipment, {
				headers: who.headers,
				data: { expectedRevision: revision + 1, device: airPump }
			}),
			who.request.put(`${equipment}/0`, {
				headers: who.headers,
				data: { expectedRevision: revision + 1, device: airPump }
			}),
			who.request.delete(`${equipment}/0?expectedRevision=${revision + 1}`, { headers: who.headers })
		];

		const viewer = await callerAs(browser, 'viewer@example.org', baseURL!);
		for (const path of reads) expect((await viewer.request.get(path)).status(), path).toBe(200);
		for (const res of await Promise.all(writes(viewer))) expect(res.status(), res.url()).toBe(403);

		const outsider = await callerAs(browser, 'grower@example.org', baseURL!);
		for (const path of reads) {
			const res = await outsider.request.get(path);
			expect(res.status(), path).toBe(404);
			expect(await res.text()).not.toContain('API test site');
		}
		for (const res of await Promise.all(writes(outsider))) expect(res.status(), res.url()).toBe(404);

		// Nothing the two tried was written.
		const now = await (await editor.request.get(equipment)).json();
		expect(now.revision).toBe(revision + 1);
		expect((await (await editor.request.get(scenario)).json()).name).toBe('What is installed now');
	});

	test('site API: renames, archives, re-tariffs, deletes and restores a scenario', async ({
		page,
		baseURL
	}) => {
		const { request, headers, siteId } = await editorWithSite(page, baseURL!);
		const made = await request.post(`/api/v1/sites/${siteId}/scenarios`, {
			headers,
			data: { name: 'Timer on the fountain pump' }
		});
		expect(made.status()).toBe(201);
		const scenario = `/api/v1/scenarios/${(await made.json()).id}`;

		const renamed = await request.patch(scenario, {
			headers,
			data: { name: 'Fountain pump on a timer', description: 'Runs 08:00–20:00 only.' }
		});
		expect(renamed.status()).toBe(200);
		expect(await renamed.json()).toMatchObject({
			name: 'Fountain pump on a timer',
			description: 'Runs 08:00–20:00 only.',
			archived: false,
			tariff: null
		});
		const cleared = await (await request.patch(scenario, { headers, data: { description: null } })).json();
		expect(cleared).toMatchObject({ name: 'Fountain pump on a timer', description: null });

		const two = await request.patch(scenario, { headers, data: { name: 'X', archived: true } });
		expect(two.status()).toBe(400);
		expect((await request.patch(scenario, { headers, data: {} })).status()).toBe(400);
		const blank = await request.patch(scenario, { headers, data: { name: '' } });
		expect(paths(await blank.json())).toEqual(['name']);

		const archived = await request.patch(scenario, { headers, data: { archived: true } });
		expect((await archived.json()).archived).toBe(true);
		const asBaseline = await request.patch(scenario, { headers, data: { baseline: true } });
		expect(asBaseline.status()).toBe(400);
		expect(paths(await asBaseline.json())).toEqual(['baseline']);
		await request.patch(scenario, { headers, data: { archived: false } });
		const baseline = await request.patch(scenario, { headers, data: { baseline: true } });
		expect((await baseline.json()).isBaseline).toBe(true);

		const tariff = await request.patch(scenario, {
			headers,
			data: { tariff: { tariffId: publicTariff, tariffVersion: 1 } }
		});
		expect((await tariff.json()).tariff).toEqual({ tariffId: publicTariff, tariffVersion: 1 });
		const noVersion = await request.patch(scenario, {
			headers,
			data: { tariff: { tariffId: publicTariff, tariffVersion: 99 } }
		});
		expect(noVersion.status()).toBe(400);
		expect(paths(await noVersion.json())).toEqual(['tariff.tariffVersion']);
		expect((await (await request.patch(scenario, { headers, data: { tariff: null } })).json()).tariff).toBe(
			null
		);

		const deleted = await request.delete(scenario, { headers });
		expect(deleted.status()).toBe(200);
		const { undoUntil } = await deleted.json();
		// The undo window is ten minutes (UNDO_MS in site.service.ts).
		expect(Date.parse(undoUntil) - Date.now()).toBeGreaterThan(9 * 60_000);
		expect((await request.get(scenario)).status()).toBe(404);
		expect((await request.patch(scenario, { headers, data: { name: 'Ghost' } })).status()).toBe(404);
		const listed = await (await request.get(`/api/v1/sites/${siteId}/scenarios`)).json();
		expect(listed.scenarios.map((s: { name: string }) => s.name)).toEqual(['What is installed now']);

		const restored = await request.patch(scenario, { headers, data: { restored: true } });
		expect(restored.status()).toBe(200);
		expect((await restored.json()).name).toBe('Fountain pump on a timer');
		expect((await request.get(scenario)).status()).toBe(200);
		expect((await request.patch(scenario, { headers, data: { restored: true } })).status()).toBe(409);
	});

	test('site API: site PUT answers 400 with field paths and 409 when stale', async ({ page, baseURL }) => {
		const { request, headers, siteId } = await editorWithSite(page, baseURL!);
		const site = `/api/v1/sites/${siteId}`;
		const read = await request.get(site);
		expect(read.headers()['cache-control']).toBe('private, no-store');
		const before = await read.json();
		const fields = {
			name: 'Display pond (invented)',
			address: null,
			timezone: 'America/Chicago',
			country: 'US',
			region: 'IL',
			supplyVolts: 240,
			supplyPhases: 1,
			tariffId: publicTariff,
			tariffVersion: null,
			currency: 'USD',
			notes: 'Invented for a test.'
		};

		const bad = await request.put(site, {
			headers,
			data: { ...fields, expectedRevision: before.revision, name: '', country: 'USA', supplyPhases: 2 }
		});
		expect(bad.status()).toBe(400);
		expect(paths(await bad.json()).sort()).toEqual(['country', 'name', 'supplyPhases']);
		const zone = await request.put(site, {
			headers,
			data: { ...fields, expectedRevision: before.revision, timezone: 'Mars/Olympus' }
		});
		expect(paths(await zone.json())).toEqual(['timezone']);
		const region = await request.put(site, {
			headers,
			data: { ...fields, expectedRevision: before.revision, region: 'ZZ' }
		});
		expect(paths(await region.json())).toEqual(['region']);
		const unknownTariff = await request.put(site, {
			headers,
			data: { ...fields, expectedRevision: before.revision, tariffId: '00000000-0000-4000-8000-000000000000' }
		});
		expect(paths(await unknownTariff.json())).toEqual(['tariffId']);
		const noRevision = await request.put(site, { headers, data: fields });
		expect(paths(await noRevision.json())).toEqual(['expectedRevision']);

		const saved = await request.put(site, {
			headers,
			data: { ...fields, expectedRevision: before.revision }
		});
		expect(saved.status()).toBe(200);
		expect(await saved.json()).toEqual({ revision: before.revision + 1 });
		const stale = await request.put(site, {
			headers,
			data: { ...fields, name: 'Lost change', expectedRevision: before.revision }
		});
		expect(stale.status()).toBe(409);
		expect(await stale.json()).toMatchObject({ error: 'conflict', currentRevision: before.revision + 1 });
		expect(await (await request.get(site)).json()).toMatchObject({
			name: 'Display pond (invented)',
			region: 'IL',
			tariffId: publicTariff,
			revision: before.revision + 1
		});

		const wrongMethod = await request.post(site, { headers, data: {} });
		expect(wrongMethod.status()).toBe(405);
		expect(wrongMethod.headers()['allow']).toBe('GET, PUT');
	});
});
