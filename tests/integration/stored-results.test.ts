import type { RequestEvent } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { RULES_VERSION } from '$lib/calc';
import type { SiteInput } from '$lib/forms/site.schema';
import { client, db } from '$lib/server/db';
import { pricedResults, type DeviceSpec } from '$lib/server/db/schema';
import { listDevices, saveDevices } from '$lib/server/sites/equipment.service';
import { priceScenario } from '$lib/server/sites/results.service';
import { findScenario, listScenarios } from '$lib/server/sites/scenario.service';
import { findSite, updateSite, type SiteRow } from '$lib/server/sites/site.service';
import { repriceBaselines } from '$lib/server/sites/reprice-job';
import { useRulesVersionForTest, yearSlot } from '$lib/server/sites/stored-key';
import type { PricedSummary } from '$lib/server/sites/stored-results';
import { createTariff, publishVersion } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { load as dashboardLoad } from '../../src/routes/w/[workspaceId]/sites/+page.server';
import { makeSite, makeUser, siteInput, tariffMeta, versionMeta, weekdayPeak } from './fixtures';

// Against the real PostgreSQL of `npm test`; the tariffs, sites and people are invented. Each input a
// stored figure depends on is changed in turn, and the dashboard must show what pricing from scratch gives.
const tag = `stored-${Date.now()}`;
let owner: SessionUser;
let workspaceId = '';
let site: SiteRow;
let baselineId = '';
const tariffIds = { first: '', second: '' };

/** Weekday afternoons dear, the rest cheap; holidays count as weekends (the core's default). */
const touTariff = weekdayPeak;

const pump = (watts: number) =>
	({
		name: 'Demo pump',
		category: 'water-pump',
		quantity: 1,
		power: { watts },
		schedule: { type: 'always' },
		inWater: false,
		outdoor: false
	}) as unknown as DeviceSpec;

const eventFor = (user: SessionUser, id: string) =>
	({
		locals: { user },
		params: { workspaceId: id },
		getClientAddress: () => '127.0.0.1',
		url: new URL(`http://127.0.0.1/w/${id}/sites`),
		request: new Request(`http://127.0.0.1/w/${id}/sites`)
	}) as unknown as RequestEvent;

type DashboardData = Exclude<Awaited<ReturnType<typeof dashboardLoad>>, void>;
const dashboard = async (id = workspaceId) =>
	(await dashboardLoad(eventFor(owner, id) as never)) as DashboardData;

/** The monthly costs the dashboard shows for the site. */
async function shown() {
	const row = (await dashboard()).sites.find((s) => s.id === site.id)!;
	return row.year.map((m) => m.cost);
}

/** The monthly costs priced from scratch (not stored) from what is stored now. */
async function fresh() {
	const now = (await findSite(site.id))!;
	const baseline = (await findScenario(baselineId))!;
	const specs = (await listDevices(baselineId)).map((d) => d.spec);
	const priced = await priceScenario(now, baseline, specs, {
		start: `${new Date().getUTCFullYear()}-01`,
		months: 12
	});
	if (!priced.ok) throw new Error(priced.message);
	return priced.result.periods.map((p) => p.total);
}

async function storedRow() {
	const [row] = await db
		.select()
		.from(pricedResults)
		.where(
			and(
				eq(pricedResults.scenarioId, baselineId),
				eq(pricedResults.slot, yearSlot(new Date().getUTCFullYear()))
			)
		);
	return row;
}

/**
 * Marks the stored summary with costs no pricing gives, and sees the dashboard serve them: what it shows
 * comes from the store. After a change to an input, a marked figure on the page would be a stale one.
 */
async function markStored() {
	const row = (await storedRow())!;
	const summary = row.summary as PricedSummary;
	const marked = { ...summary, periods: summary.periods.map((p) => ({ ...p, cost: -1 })) };
	await db
		.update(pricedResults)
		.set({ summary: marked })
		.where(and(eq(pricedResults.scenarioId, baselineId), eq(pricedResults.slot, row.slot)));
	expect(await shown()).toEqual(summary.periods.map(() => -1));
}

/** Changes one input; the dashboard then shows the figures priced from scratch, new ones, and stores them. */
async function expectNewFigures(change: () => Promise<unknown>) {
	const before = await shown();
	await markStored();
	await change();
	const after = await shown();
	expect(after).toEqual(await fresh());
	expect(after).not.toContain(-1);
	const stored = (await storedRow())!;
	// A repeat view is a stored hit: the row is not written again.
	expect(await shown()).toEqual(after);
	expect((await storedRow())!.computedAt).toEqual(stored.computedAt);
	return { before, after };
}

/** Saves the site with `fields` changed, the rest of what prices it kept, and reads it back. */
const changeSite = (fields: Partial<SiteInput>) => async () => {
	const kept = {
		tariffId: site.tariffId,
		tariffVersion: site.tariffVersion,
		timezone: site.timezone,
		country: site.country,
		region: site.region
	};
	await updateSite(site, site.revision, siteInput(site.name, { ...kept, ...fields }), owner);
	site = (await findSite(site.id))!;
};

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Stored owner');
	workspaceId = await createWorkspace(`Stored ${tag}`, owner.id);
	const make = (name: string, peak: number) =>
		createTariff(
			{
				meta: tariffMeta(`Invented Utility ${tag}`, name),
				version: versionMeta('2020-01-01'),
				structure: touTariff(peak),
				workspaceId
			},
			owner
		);
	tariffIds.first = await make('First', 0.3);
	tariffIds.second = await make('Second', 0.5);
	site = await makeSite(workspaceId, owner, `Stored farm ${tag}`, { tariffId: tariffIds.first });
	const [baseline] = await listScenarios(site.id);
	baselineId = baseline!.id;
	await saveDevices(site, baseline!, baseline!.revision, [pump(1000)], owner);
});

afterEach(() => {
	useRulesVersionForTest();
	vi.useRealTimers();
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('a stored result', () => {
	it('is priced on the first view and stored, and read back on the next', async () => {
		expect(await storedRow()).toBeUndefined();
		const first = await shown();
		expect(first).toEqual(await fresh());
		const row = (await storedRow())!;
		expect(row.rulesVersion).toBe(RULES_VERSION);
		expect(await shown()).toEqual(first);
		expect((await storedRow())!.computedAt).toEqual(row.computedAt);
	});

	it('is priced again after a device edit (the scenario’s revision)', async () => {
		const baseline = (await findScenario(baselineId))!;
		const { before, after } = await expectNewFigures(() =>
			saveDevices(site, baseline, baseline.revision, [pump(2000)], owner)
		);
		expect(after).not.toEqual(before);
	});

	it('is priced again when a new version of the tariff comes into force', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'First');
		const { before, after } = await expectNewFigures(() =>
			publishVersion(
				tariffIds.first,
				1,
				{ meta, version: versionMeta('2021-01-01'), structure: touTariff(0.4) },
				owner
			)
		);
		expect(after).not.toEqual(before);
	});

	it('is priced again when the site changes its tariff, then its pinned version', async () => {
		for (const [tariffId, tariffVersion] of [
			[tariffIds.second, null],
			[tariffIds.first, null],
			[tariffIds.first, 1]
		] as const) {
			const { before, after } = await expectNewFigures(changeSite({ tariffId, tariffVersion }));
			expect(after).not.toEqual(before);
		}
	});

	it.each([
		['time zone', { timezone: 'UTC' }],
		['holidays (its country)', { country: 'CA' }]
	])('is priced again when the site’s %s changes', async (_, fields) => {
		const { before, after } = await expectNewFigures(changeSite(fields));
		expect(after).not.toEqual(before);
	});

	it('is priced again under a new rules version', async () => {
		const row = (await storedRow())!;
		await expectNewFigures(async () => useRulesVersionForTest(RULES_VERSION + 1));
		const again = (await storedRow())!;
		expect(again.rulesVersion).toBe(RULES_VERSION + 1);
		expect(again.inputKey).not.toBe(row.inputKey);
	});

	it('is priced ahead of the next view when its tariff gets a new version (the queued job)', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'First');
		const row = (await storedRow())!;
		await publishVersion(
			tariffIds.first,
			2,
			{ meta, version: versionMeta('2022-01-01'), structure: touTariff(0.45) },
			owner
		);
		await repriceBaselines(tariffIds.first);
		const repriced = (await storedRow())!;
		expect(repriced.inputKey).not.toBe(row.inputKey);
		expect(await shown()).toEqual(await fresh());
		// The view was a stored hit: the job had written the row it reads.
		expect((await storedRow())!.computedAt).toEqual(repriced.computedAt);
	});

	it('is kept per year: next year’s dashboard prices that year', async () => {
		const thisYear = await shown();
		vi.useFakeTimers({ toFake: ['Date'] });
		vi.setSystemTime(new Date(Date.UTC(new Date().getUTCFullYear() + 1, 2, 15)));
		const nextYear = await shown();
		expect(nextYear).toEqual(await fresh());
		expect(nextYear).not.toEqual(thisYear);
		expect(await storedRow()).toBeDefined();
	});
});

describe('the dashboard', () => {
	/** The statements the dashboard's load sends for a workspace, counted at the database client. */
	async function statements(id: string) {
		const original = client.unsafe;
		let count = 0;
		client.unsafe = ((...args: Parameters<typeof original>) => {
			count++;
			if (process.env.SHOW_SQL) console.log(String(args[0]).slice(0, 90));
			return original.apply(client, args);
		}) as typeof original;
		try {
			await dashboard(id);
		} finally {
			client.unsafe = original;
		}
		return count;
	}

	async function workspaceOf(sites: number, tariffId: string) {
		const id = await createWorkspace(`Stored ${sites} ${tag}`, owner.id);
		for (let i = 0; i < sites; i++) {
			const made = await makeSite(id, owner, `Farm ${i} ${tag}`, { tariffId });
			const [baseline] = await listScenarios(made.id);
			await saveDevices(made, baseline!, baseline!.revision, [pump(500 + i)], owner);
		}
		return id;
	}

	it('sends as many statements for 30 sites as for 3, cold and warm', async () => {
		const meta = tariffMeta(`Invented Utility ${tag}`, 'Public');
		const structure = touTariff(0.35);
		const tariffId = await createTariff(
			{ meta, version: versionMeta('2020-01-01'), structure, workspaceId: null },
			owner
		);
		const [few, many] = [await workspaceOf(3, tariffId), await workspaceOf(30, tariffId)];
		const cold = [await statements(few), await statements(many)];
		const warm = [await statements(few), await statements(many)];
		expect(cold[1]).toBe(cold[0]);
		expect(warm[1]).toBe(warm[0]);
		// Warm: no rates or devices read (three queries) and nothing written.
		expect(warm[0]).toBe(cold[0]! - 4);
		// The totals at the top count every site of the workspace.
		const view = await dashboard(many);
		expect(view.siteCount).toBe(30);
		expect(view.totals).toEqual([expect.objectContaining({ currency: 'USD', sites: 30 })]);
		const rows = await db
			.select()
			.from(pricedResults)
			.where(eq(pricedResults.slot, yearSlot(new Date().getUTCFullYear())));
		expect(rows.length).toBeGreaterThanOrEqual(33);
	});
});
