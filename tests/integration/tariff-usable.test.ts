import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { scenarios, sites, type DeviceSpec } from '$lib/server/db/schema';
import { buildComparison } from '$lib/server/compare/build';
import { priceScenario } from '$lib/server/sites/results.service';
import { createScenario, listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { createTariff, publishVersion, searchTariffs } from '$lib/server/tariffs/tariff.service';
import { costChanges } from '$lib/server/tariffs/tariff-notice.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import {
	chooserFor,
	PICK_A_TARIFF,
	TARIFF_UNAVAILABLE,
	tariffChoiceProblem,
	tariffUsableBy
} from '$lib/server/tariffs/usable';
import { allChoices, tariffChoices } from '$lib/server/tariffs/tariff-choices';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// Issue 14, items 4 and 9, against the real PostgreSQL of `npm test`. Every person, site and tariff is invented.
const tag = `usable-${Date.now()}`;
const SECRET_NAME = `Secret tariff ${tag}`;
const SECRET_RATE = 0.4321;
let ownerA: SessionUser;
let ownerB: SessionUser;
let wsA = '';
let wsB = '';
let secret = '';
let publicId = '';

const pump: DeviceSpec = {
	name: 'Raceway pump',
	category: 'water-pump',
	quantity: 1,
	power: { watts: 370 },
	schedule: { type: 'always' }
} as DeviceSpec;

const eventFor = (user: SessionUser) =>
	({
		locals: { user },
		url: new URL('http://127.0.0.1/api/v1/compare'),
		request: new Request('http://127.0.0.1/api/v1/compare')
	}) as unknown as RequestEvent;

/** A site of workspace B whose stored tariff id points at workspace A's private tariff. */
async function forcedSite(name: string): Promise<SiteRow> {
	const site = await makeSite(wsB, ownerB, `${name} ${tag}`, { tariffId: publicId });
	await db.update(sites).set({ tariffId: secret }).where(eq(sites.id, site.id));
	return { ...site, tariffId: secret };
}

beforeAll(async () => {
	ownerA = await makeUser(`owner-a-${tag}@example.org`, 'Owner A');
	ownerB = await makeUser(`owner-b-${tag}@example.org`, 'Owner B');
	wsA = await createWorkspace(`A ${tag}`, ownerA.id);
	wsB = await createWorkspace(`B ${tag}`, ownerB.id);
	secret = await createTariff(
		{
			meta: tariffMeta('Hidden Valley Power (invented)', SECRET_NAME),
			version: versionMeta('2026-01-01'),
			structure: flat(SECRET_RATE),
			workspaceId: wsA
		},
		ownerA
	);
	publicId = await createTariff(
		{
			meta: tariffMeta(`Open Utility ${tag}`, 'Public flat rate'),
			version: versionMeta('2026-01-01'),
			structure: flat(0.1),
			workspaceId: null
		},
		ownerA
	);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('tariffUsableBy', () => {
	it('lets a site use public tariffs and its own workspace’s private ones only', () => {
		expect(tariffUsableBy(wsB, { workspaceId: null })).toBe(true);
		expect(tariffUsableBy(wsA, { workspaceId: wsA })).toBe(true);
		expect(tariffUsableBy(wsB, { workspaceId: wsA })).toBe(false);
	});
});

describe('choosing a tariff', () => {
	it('refuses another workspace’s private tariff with the same words as an unknown id', async () => {
		const foreign = await tariffChoiceProblem(
			{ workspaceId: wsB },
			{ tariffId: secret, tariffVersion: null }
		);
		const unknown = await tariffChoiceProblem(
			{ workspaceId: wsB },
			{ tariffId: '00000000-0000-4000-8000-000000000000', tariffVersion: null }
		);
		expect(foreign).toEqual({ field: 'tariffId', message: PICK_A_TARIFF });
		expect(unknown).toEqual(foreign);
		expect(
			await tariffChoiceProblem({ workspaceId: wsA }, { tariffId: secret, tariffVersion: null })
		).toBeNull();
	});

	it('refuses a pinned version that does not exist, at the version field', async () => {
		expect(await tariffChoiceProblem({ workspaceId: wsB }, { tariffId: publicId, tariffVersion: 7 })).toEqual(
			{ field: 'tariffVersion', message: 'That tariff has no version 7' }
		);
		expect(
			await tariffChoiceProblem({ workspaceId: wsB }, { tariffId: publicId, tariffVersion: 1 })
		).toBeNull();
	});

	it('offers a site guest public tariffs and the site’s own, never the workspace’s other private ones', async () => {
		const own = await createTariff(
			{
				meta: tariffMeta('Hidden Valley Power (invented)', `Site's own ${tag}`),
				version: versionMeta('2026-01-01'),
				structure: flat(0.2),
				workspaceId: wsA
			},
			ownerA
		);
		const site = await makeSite(wsA, ownerA, `Shared ${tag}`, { tariffId: own });
		const guest = chooserFor({ site, viaGrant: true });
		const member = chooserFor({ site, viaGrant: false });
		const offered = allChoices(await tariffChoices(guest)).map((t) => t.id);
		expect(offered).toContain(own);
		expect(offered).not.toContain(secret);
		expect(allChoices(await tariffChoices(member)).map((t) => t.id)).toContain(secret);
		expect(await tariffChoiceProblem(guest, { tariffId: secret, tariffVersion: null })).toEqual({
			field: 'tariffId',
			message: PICK_A_TARIFF
		});
		expect(await tariffChoiceProblem(guest, { tariffId: own, tariffVersion: null })).toBeNull();
		expect(await tariffChoiceProblem(guest, { tariffId: publicId, tariffVersion: null })).toBeNull();
		expect(await tariffChoiceProblem(member, { tariffId: secret, tariffVersion: null })).toBeNull();
	});
});

describe('using a tariff the site may not use', () => {
	it('prices nothing and names nothing, for the site’s tariff and for a scenario’s own', async () => {
		const site = await forcedSite('Forced');
		const [baseline] = await listScenarios(site.id);
		const priced = await priceScenario(site, baseline!, [pump], { start: '2027-01', months: 12 });
		expect(priced).toMatchObject({ ok: false, reason: 'unavailable' });
		expect(JSON.stringify(priced)).toContain(TARIFF_UNAVAILABLE);
		expect(JSON.stringify(priced)).not.toContain(SECRET_NAME);

		// The site back on the public tariff, one scenario overriding to the private one.
		await db.update(sites).set({ tariffId: publicId }).where(eq(sites.id, site.id));
		await db.update(scenarios).set({ tariffId: secret }).where(eq(scenarios.id, baseline!.id));
		const [override] = await db.select().from(scenarios).where(eq(scenarios.id, baseline!.id));
		const onPublic = { ...site, tariffId: publicId };
		expect(await priceScenario(onPublic, override!, [pump], { start: '2027-01', months: 12 })).toMatchObject({
			ok: false,
			reason: 'unavailable'
		});
	});

	it('refuses to compare it and leaves its name, source and rates out of the answer', async () => {
		const site = await forcedSite('Compared');
		const [baseline] = await listScenarios(site.id);
		const other = await createScenario(site, { name: 'Other', description: null }, baseline!.id, ownerB);
		const built = await buildComparison(eventFor(ownerB), {
			scenarios: [baseline!.id, other],
			baseline: baseline!.id,
			start: '2027-01',
			horizonYears: 10,
			discountPercent: 5,
			escalationPercent: 2,
			emissionKgPerKwh: 0,
			emissionSource: ''
		});
		expect(built.ok).toBe(false);
		const text = JSON.stringify(built);
		expect(text).toContain(TARIFF_UNAVAILABLE);
		expect(text).not.toContain(SECRET_NAME);
		expect(text).not.toContain('Invented for a test');
		expect(text).not.toContain(String(SECRET_RATE));
	});

	it('sends no tariff-change notice about it to the other workspace', async () => {
		await forcedSite('Noticed');
		await publishVersion(
			secret,
			1,
			{
				meta: tariffMeta('Hidden Valley Power (invented)', SECRET_NAME),
				version: versionMeta('2027-01-01', 'A private change'),
				structure: flat(0.5)
			},
			ownerA
		);
		expect(await costChanges({ tariffId: secret, versionNumber: 2, workspaceId: wsB })).toBeNull();
		const stillListed = await searchTariffs([wsB], { q: SECRET_NAME });
		expect(stillListed.total).toBe(0);
	});
});
