import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, db } from '$lib/server/db';
import { memberships, type DeviceSpec } from '$lib/server/db/schema';
import { priceScenario } from '$lib/server/sites/results.service';
import { listScenarios } from '$lib/server/sites/scenario.service';
import { noticeAudience, noticeRecipients } from '$lib/server/tariffs/notice-audience';
import { typicalMonth, versionForToday } from '$lib/server/tariffs/submission';
import { createTariff, findTariff, publishVersion } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// Against the real PostgreSQL of `npm test`; every tariff, site and person here is invented.
const tag = `vif-${Date.now()}`;
let author: SessionUser;
let ws = '';

const oneKilowatt = {
	name: 'Load',
	category: 'other',
	quantity: 1,
	power: { watts: 1000 },
	schedule: { type: 'always' },
	inWater: false,
	outdoor: false
} as unknown as DeviceSpec;

beforeAll(async () => {
	author = await makeUser(`vif-${tag}@example.org`, 'Curator');
	ws = await createWorkspace(`VIF ${tag}`, author.id);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('the version the tariff page prices', () => {
	it('is the one in force today, not a newer one published ahead of its date', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'Ahead of its date');
		const id = await createTariff(
			{ meta, version: versionMeta('2026-01-01'), structure: flat(0.1), workspaceId: ws },
			author
		);
		await publishVersion(id, 1, { meta, version: versionMeta('2099-01-01'), structure: flat(0.2) }, author);
		const found = (await findTariff(id))!;
		const shown = versionForToday(found.versions, '2026-12-03');
		expect(shown?.number).toBe(1);
		// 1 kW always on for the 8,760 h of 2026 (Chicago's DST days cancel out) at $0.10, ÷ 12: $73.00.
		expect(typicalMonth(found.tariff, shown, 2026)).toBeCloseTo(73, 10);
		// A tariff whose only version starts later is shown on that version (the page says "from <date>").
		expect(versionForToday(found.versions, '2025-06-01')?.number).toBe(1);
	});
});

describe('months before the first version', () => {
	it('prices a site’s earlier months on the first version, with a note naming them', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'Added today');
		const id = await createTariff(
			{ meta, version: versionMeta('2026-12-03'), structure: flat(0.1), workspaceId: ws },
			author
		);
		const site = await makeSite(ws, author, `Site on a new tariff ${tag}`, { tariffId: id });
		const baseline = (await listScenarios(site.id)).find((s) => s.isBaseline)!;
		const year = await priceScenario(site, baseline, [oneKilowatt], { start: '2026-01', months: 12 });
		expect(year.ok).toBe(true);
		if (!year.ok) return;
		// 8,760 kWh at $0.10 (hand-checked); December starts on the 1st, before the version's 3rd.
		expect(year.result.totals.cost).toBe(876);
		expect(year.note).toBe(
			'January–December 2026 are priced on version 1, which starts 2026-12-03: the tariff has no earlier rates.'
		);

		const bill = await priceScenario(site, baseline, [oneKilowatt], {
			billingPeriods: [{ from: '2026-06-01', to: '2026-06-30' }]
		});
		expect(bill).toMatchObject({ ok: false, message: 'No version of this tariff is in force on 2026-06-01' });
	});
});

describe('who a tariff change notice reaches', () => {
	it('is every owner and editor of a workspace billed on the tariff, never a viewer', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'Public and used');
		const id = await createTariff(
			{ meta, version: versionMeta('2026-01-01'), structure: flat(0.1), workspaceId: null },
			author
		);
		const editor = await makeUser(`vif-editor-${tag}@example.org`, 'Editor');
		const viewer = await makeUser(`vif-viewer-${tag}@example.org`, 'Viewer');
		await db.insert(memberships).values([
			{ workspaceId: ws, userId: editor.id, role: 'editor' },
			{ workspaceId: ws, userId: viewer.id, role: 'viewer' }
		]);
		await makeSite(ws, author, `Site on a public tariff ${tag}`, { tariffId: id });
		expect((await noticeRecipients(ws)).sort()).toEqual([author.email, editor.email].sort());
		expect(await noticeAudience(id)).toEqual({ people: 2, workspaces: 1 });
	});
});
