import type { RequestEvent } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { client, db } from '$lib/server/db';
import { usageIntervals, type DeviceSpec } from '$lib/server/db/schema';
import { saveDevices } from '$lib/server/sites/equipment.service';
import { listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { cheapestTariffs } from '$lib/server/tariffs/cheapest';
import { createTariff } from '$lib/server/tariffs/tariff.service';
import type { Interval } from '$lib/server/usage/interval';
import { importUsage } from '$lib/server/usage/usage.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import type { Actor } from '$lib/server/workspaces/audit';
import { GET as exportXlsx } from '../../src/routes/sites/[siteId]/cheapest/export.xlsx/+server';
import { load as reportLoad } from '../../src/routes/sites/[siteId]/cheapest/report/+page.server';
import { flat, makeSite, makeUser, tariffMeta, versionMeta, weekdayPeak } from './fixtures';

// Against the real PostgreSQL of `npm test`; invented utilities, tariffs, sites and readings. The utilities'
// names start with "A0" so the library's utility order lists them first whatever other tests stored.
const tag = `cheapest-${Date.now()}`;
let owner: Actor;
let workspaceId = '';
const ids = { flat: '', tou: '', euro: '', foreign: '' };

/** 30 cents on weekday afternoons (14:00–20:00), 8 cents at all other hours. */
const touInput: TariffInput = weekdayPeak(0.3);

/** Hourly readings from 2026-01-01 local (Chicago) for `hours` real hours: 4 kWh at night (22–06), 0.5 by day. */
function nightHeavy(hours: number): Interval[] {
	const start = Date.parse('2026-01-01T06:00:00Z');
	return Array.from({ length: hours }, (_, i) => {
		const at = new Date(start + i * 3_600_000);
		const hour = Number(
			at.toLocaleString('en-US', { timeZone: 'America/Chicago', hour: 'numeric', hourCycle: 'h23' })
		);
		return { start: at, seconds: 3600, kwh: hour >= 22 || hour < 6 ? 4 : 0.5 };
	});
}

const tariff = (name: string, structure: TariffInput, ws: string | null, currency = 'USD') =>
	createTariff(
		{
			meta: tariffMeta(`A0 Demo Valley Power ${tag}`, name, { currency }),
			version: versionMeta('2025-01-01'),
			structure,
			workspaceId: ws
		},
		owner
	);

let site: SiteRow;

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Cheapest owner');
	workspaceId = await createWorkspace(`Cheapest ${tag}`, owner.id);
	const other = await createWorkspace(`Other ${tag}`, owner.id);
	ids.flat = await tariff('Flat 12 cents', flat(0.12), workspaceId);
	ids.tou = await tariff('Afternoon peak', touInput, workspaceId);
	ids.euro = await tariff('Euro flat', { ...flat(0.05), currency: 'EUR' }, null, 'EUR');
	ids.foreign = await tariff('Another workspace’s tariff', flat(0.01), other);
	site = await makeSite(workspaceId, owner, `Greenhouse ${tag}`, { tariffId: ids.flat });
	// 2026 in full (8,760 real hours in Chicago) and 5 hours of 2027: the last whole month is December 2026.
	await importUsage(site, nightHeavy(8760 + 5), owner);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('a site with a year of hourly usage and three tariffs', () => {
	it('ranks the tariffs in its currency, lists the other currency, and hides another workspace’s', async () => {
		const found = await cheapestTariffs(site, false);
		expect(found.ok).toBe(true);
		if (!found.ok) return;
		expect(found.priced).toBe('January 2026 – December 2026, 8,760 values of 60 minutes');
		const mine = found.ranked.filter((r) => r.id === ids.flat || r.id === ids.tou);
		expect(mine.map((r) => r.name)).toEqual(['Afternoon peak', 'Flat 12 cents']);
		const [tou, flatRow] = mine;
		expect(flatRow).toMatchObject({ current: true, differenceToCurrent: 0 });
		// Derived from the rule: 0.12 a kWh on every kWh the year holds.
		const kwh = nightHeavy(8760).reduce((sum, r) => sum + r.kwh, 0);
		expect(flatRow!.annualCost).toBeCloseTo(0.12 * kwh, 1);
		expect(tou!.differenceToCurrent).toBeCloseTo(tou!.annualCost - flatRow!.annualCost, 2);
		expect(found.unpriced).toContainEqual(
			expect.objectContaining({ id: ids.euro, reason: 'Priced in EUR; this site pays in USD.' })
		);
		expect([...found.ranked, ...found.unpriced].some((r) => r.id === ids.foreign)).toBe(false);
		if (found.ranked[0]!.id === ids.tou)
			expect(found.words.join(' ')).toContain('less than your current tariff, Flat 12 cents');
	});

	it('a guest of the site sees only public tariffs and the current one', async () => {
		const found = await cheapestTariffs(site, true);
		if (!found.ok) throw new Error(found.message);
		expect(found.ranked.some((r) => r.id === ids.flat)).toBe(true);
		expect(found.ranked.some((r) => r.id === ids.tou)).toBe(false);
	});
});

describe('usage that cannot be priced as a year', () => {
	it('names the first gap instead of pricing it as zero', async () => {
		const holed = await makeSite(workspaceId, owner, `Holed ${tag}`, { tariffId: ids.flat });
		await importUsage(holed, nightHeavy(8760 + 5), owner);
		await db
			.delete(usageIntervals)
			.where(
				and(eq(usageIntervals.siteId, holed.id), eq(usageIntervals.start, new Date('2026-03-10T15:00:00Z')))
			);
		const found = await cheapestTariffs(holed, false);
		expect(found.ok).toBe(false);
		if (!found.ok)
			expect(found.message).toContain(
				'1 60-minute interval is missing between January 2026 and December 2026, the first at 2026-03-10 10:00 (America/Chicago)'
			);
	});

	it('says how many whole months there are when fewer than 12', async () => {
		const short = await makeSite(workspaceId, owner, `Short ${tag}`);
		await importUsage(short, nightHeavy(24 * 100), owner);
		const found = await cheapestTariffs(short, false);
		expect(found).toEqual({
			ok: false,
			message:
				'The stored usage holds 3 whole calendar months; comparing tariffs needs 12 whole months in a row. Import more usage.'
		});
	});
});

describe('the printable report and the workbook', () => {
	/** A 1 kW pump running all day: 24 kWh a day whatever the tariff. */
	const pump = {
		name: 'Circulation pump',
		category: 'water-pump',
		power: { watts: 1000 },
		schedule: { type: 'always' }
	} as DeviceSpec;
	let stranger: SessionUser;
	let scenarioId = '';

	beforeAll(async () => {
		stranger = await makeUser(`stranger-${tag}@example.org`, 'Stranger');
		await createWorkspace(`Stranger's own ${tag}`, stranger.id);
		const [baseline] = await listScenarios(site.id);
		scenarioId = baseline!.id;
		await saveDevices(site, baseline!, baseline!.revision, [pump], owner);
	});

	const eventFor = (user: SessionUser, path: string, search = '') =>
		({
			locals: { user },
			params: { siteId: site.id },
			getClientAddress: () => '127.0.0.1',
			url: new URL(`http://127.0.0.1/sites/${site.id}/cheapest/${path}${search}`),
			request: new Request(`http://127.0.0.1/sites/${site.id}/cheapest/${path}${search}`)
		}) as unknown as RequestEvent;

	async function statusOf(run: () => unknown): Promise<number> {
		try {
			const answer = await run();
			return answer instanceof Response ? answer.status : 200;
		} catch (e) {
			return (e as { status: number }).status;
		}
	}

	it('refuses a stranger to the site as the site page does (404), on the report and the workbook', async () => {
		const report = await statusOf(() => reportLoad(eventFor(stranger, 'report') as never));
		const workbook = await statusOf(() => exportXlsx(eventFor(stranger, 'export.xlsx') as never));
		expect([report, workbook]).toEqual([404, 404]);
	});

	it('gives the owner the report of a scenario’s chosen year, with the sources and the usage priced', async () => {
		const data = (await reportLoad(
			eventFor(owner as SessionUser, 'report', `?scenario=${scenarioId}&from=2027-03`) as never
		)) as Exclude<Awaited<ReturnType<typeof reportLoad>>, void>;
		expect(data.author).toBe('Cheapest owner');
		expect(data.search).toBe(`?scenario=${scenarioId}&from=2027-03`);
		if (!data.cheapest.ok) throw new Error(data.cheapest.message);
		expect(data.cheapest.priced).toMatch(/^March 2027 – February 2028, the estimated load of the scenario/);
		const flatRow = data.cheapest.ranked.find((r) => r.id === ids.flat)!;
		// Derived from the rule: 24 kWh a day for the 366 days from March 2027 (February 2028 has 29) at 0.12 a kWh.
		expect(flatRow.annualCost).toBeCloseTo(24 * 366 * 0.12, 1);
		expect(flatRow.provenance).toEqual({
			urdbLabel: null,
			versions: [expect.objectContaining({ number: 1, effectiveFrom: '2025-01-01', effectiveTo: null })]
		});
		// 31 days of 24 hours, less the hour Chicago skips when daylight saving time starts (14 March 2027).
		expect(data.cheapest.usage[0]).toEqual({ month: '2027-03', kwh: 24 * 31 - 1, peakKw: 1 });
	});

	it('gives the owner the workbook of the metered year as an .xlsx download', async () => {
		const answer = (await exportXlsx(eventFor(owner as SessionUser, 'export.xlsx') as never)) as Response;
		expect(answer.status).toBe(200);
		expect(answer.headers.get('content-type')).toBe(
			'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'
		);
		expect(answer.headers.get('content-disposition')).toMatch(
			/^attachment; filename="greenhouse-cheapest-.*-cheapest-tariff-metered\.xlsx"$/
		);
		const workbook = new ExcelJS.Workbook();
		await workbook.xlsx.load((await answer.arrayBuffer()) as unknown as ExcelJS.Buffer);
		const usage = workbook.getWorksheet('Usage priced')!;
		expect(usage.getCell('A4').value).toBe('January 2026');
		expect(workbook.getWorksheet('Sources')!.getCell('B2').value).toBe(site.name);
	});

	it('says what is missing instead of an empty workbook when nothing can be priced', async () => {
		const empty = await makeSite(workspaceId, owner, `Empty ${tag}`);
		const event = { ...eventFor(owner as SessionUser, 'export.xlsx'), params: { siteId: empty.id } };
		expect(await statusOf(() => exportXlsx(event as never))).toBe(409);
	});

	it('answers 429 once a person has compared tariffs 60 times in a minute, before pricing anything', async () => {
		const busy = await makeUser(`busy-${tag}@example.org`, 'Busy');
		const own = await createWorkspace(`Busy's own ${tag}`, busy.id);
		const empty = await makeSite(own, busy as Actor, `Budget ${tag}`);
		const event = { ...eventFor(busy as SessionUser, 'export.xlsx'), params: { siteId: empty.id } };
		const statuses: number[] = [];
		for (let i = 0; i < 61; i++) statuses.push(await statusOf(() => exportXlsx(event as never)));
		// The budget is 60 a minute per person (src/lib/server/http/rate-limits.ts): 60 answers, then 429.
		expect(statuses.slice(0, 60).every((status) => status === 409)).toBe(true);
		expect(statuses[60]).toBe(429);
		const report = (await reportLoad({
			...event,
			url: new URL(event.url.href.replace('export.xlsx', 'report'))
		} as never)) as {
			cheapest: { ok: boolean; message?: string };
		};
		expect(report.cheapest).toMatchObject({ ok: false, message: expect.stringContaining('wait a minute') });
	});
});
