import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import type { SiteWater } from '$lib/calc';
import { client } from '$lib/server/db';
import { findSite } from '$lib/server/sites/site.service';
import { siteTrail } from '$lib/server/workspaces/audit';
import { exportWorkspace } from '$lib/server/workspaces/export';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { GET as getSite, PUT as putSite } from '../../src/routes/api/v1/sites/[siteId]/+server';
import { POST as postSite } from '../../src/routes/api/v1/sites/+server';
import { actions as editActions } from '../../src/routes/sites/[siteId]/edit/+page.server';
import { makeUser } from './fixtures';

// Issue 18, a site's water: the site API and form round trip, the trail's words and the export, against
// the real PostgreSQL of `npm test`. People, sites and tanks are invented.
const tag = `water-${Date.now()}`;
let owner: SessionUser;
let workspaceId = '';

const water: SiteWater = {
	altitudeM: 250,
	tanks: [
		{
			id: 'growout1',
			name: 'Grow-out 1',
			volumeLiters: 1000,
			depthM: 1.2,
			water: 'fresh',
			temperatureC: 26,
			monthlyTemperatureC: [10, 10, 12, 14, 18, 22, 26, 26, 22, 18, 14, 12],
			fishKg: 40,
			feedKgPerDay: 0.8,
			proteinPercent: 40
		}
	]
};

/** A request to a route, as the signed-in owner. */
function eventFor(method: string, path: string, params: Record<string, string>, body?: BodyInit) {
	const url = new URL(`http://127.0.0.1${path}`);
	return {
		locals: { user: owner },
		params,
		url,
		request: new Request(url, { method, body, headers: { origin: url.origin } })
	} as unknown as RequestEvent;
}

const json = (method: string, path: string, params: Record<string, string>, body: unknown) =>
	eventFor(method, path, params, JSON.stringify(body));

async function createWithWater(): Promise<string> {
	const res = await postSite(
		json(
			'POST',
			'/api/v1/sites',
			{},
			{
				workspaceId,
				name: `Water site ${tag} (invented)`,
				timezone: 'America/Chicago',
				country: 'US',
				currency: 'USD',
				water
			}
		) as never
	);
	expect(res.status).toBe(201);
	return ((await res.json()) as { id: string }).id;
}

const read = async (siteId: string) =>
	(await (await getSite(eventFor('GET', `/api/v1/sites/${siteId}`, { siteId }) as never)).json()) as {
		revision: number;
		water: SiteWater;
	} & Record<string, unknown>;

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Owner (invented)');
	workspaceId = await createWorkspace(`Water ${tag}`, owner.id);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('the site API with water', () => {
	it('stores the water sent on POST and answers it on GET', async () => {
		const siteId = await createWithWater();
		expect((await read(siteId)).water).toEqual(water);
	});

	it('starts a site sent without water at sea level with no tanks', async () => {
		const res = await postSite(
			json(
				'POST',
				'/api/v1/sites',
				{},
				{
					workspaceId,
					name: `Dry site ${tag} (invented)`,
					timezone: 'America/Chicago',
					country: 'US',
					currency: 'USD'
				}
			) as never
		);
		const { id } = (await res.json()) as { id: string };
		expect((await read(id)).water).toEqual({ altitudeM: 0, tanks: [] });
	});

	it('keeps the stored water on a PUT without it, and bumps the revision on a PUT that changes it', async () => {
		const siteId = await createWithWater();
		const before = await read(siteId);
		const { water: _water, ...fields } = before;
		const kept = await putSite(
			json(
				'PUT',
				`/api/v1/sites/${siteId}`,
				{ siteId },
				{ ...fields, expectedRevision: before.revision }
			) as never
		);
		expect(kept.status).toBe(200);
		const afterKeep = await read(siteId);
		expect(afterKeep.water).toEqual(water);

		const bigger = { ...water, tanks: [{ ...water.tanks[0]!, volumeLiters: 1200 }] };
		const changed = await putSite(
			json(
				'PUT',
				`/api/v1/sites/${siteId}`,
				{ siteId },
				{
					...fields,
					water: bigger,
					expectedRevision: afterKeep.revision
				}
			) as never
		);
		expect(await changed.json()).toEqual({ revision: afterKeep.revision + 1 });
		expect((await read(siteId)).water).toEqual(bigger);
		const words = (await siteTrail(siteId)).map((e) => e.summary);
		expect(words[0]).toBe("Tank 'Grow-out 1' volume 1,000 L → 1,200 L");
	});

	it('refuses a bad tank with its field path, and writes nothing', async () => {
		const siteId = await createWithWater();
		const before = await read(siteId);
		const { water: _water, ...fields } = before;
		const res = await putSite(
			json(
				'PUT',
				`/api/v1/sites/${siteId}`,
				{ siteId },
				{
					...fields,
					water: { ...water, tanks: [{ ...water.tanks[0]!, volumeLiters: 0, water: 'brackish' }] },
					expectedRevision: before.revision
				}
			) as never
		);
		expect(res.status).toBe(400);
		const body = (await res.json()) as { issues: { path: string; message: string }[] };
		expect(body.issues).toEqual(
			expect.arrayContaining([
				{ path: 'water.tanks.0.volumeLiters', message: 'Volume must be more than 0' },
				expect.objectContaining({ path: 'water.tanks.0.water' })
			])
		);
		expect((await read(siteId)).revision).toBe(before.revision);
	});
});

describe('the site form with water', () => {
	const formOf = (fields: Record<string, string>) => {
		const form = new FormData();
		for (const [k, v] of Object.entries(fields)) form.append(k, v);
		return form;
	};
	const base = (revision: number) => ({
		name: `Form water site ${tag} (invented)`,
		timezone: 'America/Chicago',
		country: 'US',
		currency: 'USD',
		revision: String(revision)
	});

	it('saves a tank typed in US gallons and feet as litres and metres, and the trail says it was added', async () => {
		const siteId = await createWithWater();
		const site = (await findSite(siteId))!;
		const post = formOf({
			...base(site.revision),
			altitudeM: '250',
			'tanks.0.id': 'growout1',
			'tanks.0.name': 'Grow-out 1',
			'tanks.0.volume': '1000',
			'tanks.0.volumeUnit': 'L',
			'tanks.0.depth': '1.2',
			'tanks.0.depthUnit': 'm',
			'tanks.0.water': 'fresh',
			'tanks.0.byMonth': 'on',
			...Object.fromEntries(
				water.tanks[0]!.monthlyTemperatureC!.map((t, m) => [`tanks.0.monthlyTemperatureC.${m}`, String(t)])
			),
			'tanks.0.fishKg': '40',
			'tanks.0.feedKgPerDay': '0.8',
			'tanks.0.proteinPercent': '40',
			'tanks.1.id': 'sump',
			'tanks.1.name': 'Sump',
			'tanks.1.volume': '100',
			'tanks.1.volumeUnit': 'gal',
			'tanks.1.depth': '2',
			'tanks.1.depthUnit': 'ft',
			'tanks.1.water': 'fresh',
			'tanks.1.temperatureC': '22'
		});
		const event = eventFor('POST', `/sites/${siteId}/edit`, { siteId }, post);
		await expect(editActions.default(event as never)).rejects.toMatchObject({ status: 303 });
		const saved = (await read(siteId)).water;
		expect(saved.tanks[0]).toEqual(water.tanks[0]);
		// NIST SP 811: 1 US gallon = 3.785 411 784 L, 1 ft = 0.3048 m.
		expect(saved.tanks[1]!.volumeLiters).toBeCloseTo(378.5411784, 9);
		expect(saved.tanks[1]!.depthM).toBeCloseTo(0.6096, 12);
		expect((await siteTrail(siteId))[0]!.summary).toBe(`Changed name; Added tank 'Sump'`);
	});

	it('answers a bad volume with one message at its box and every value as typed', async () => {
		const siteId = await createWithWater();
		const site = (await findSite(siteId))!;
		const fields = {
			...base(site.revision),
			altitudeM: '250',
			'tanks.0.id': 'growout1',
			'tanks.0.name': 'Grow-out 1',
			'tanks.0.volume': '-3',
			'tanks.0.depth': '1.2',
			'tanks.0.water': 'fresh',
			'tanks.0.temperatureC': '24'
		};
		const event = eventFor('POST', `/sites/${siteId}/edit`, { siteId }, formOf(fields));
		const result = (await editActions.default(event as never)) as {
			status: number;
			data: { values: Record<string, string>; errors: Record<string, string> };
		};
		expect(result.status).toBe(400);
		expect(result.data.errors).toEqual({ 'tanks.0.volume': 'Volume must be more than 0' });
		expect(result.data.values).toMatchObject(fields);
		expect((await read(siteId)).water).toEqual(water);
	});
});

describe('the workspace export', () => {
	it('holds each site’s water', async () => {
		const siteId = await createWithWater();
		const data = await exportWorkspace(workspaceId);
		expect(data!.sites.find((s) => s.id === siteId)!.water).toEqual(water);
	});
});
