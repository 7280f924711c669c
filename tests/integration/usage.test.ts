import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { auditEvents, usageIntervals } from '$lib/server/db/schema';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import type { Actor } from '$lib/server/workspaces/audit';
import { parseGreenButton } from '$lib/server/usage/green-button';
import type { Interval } from '$lib/server/usage/interval';
import { dailyShape, importUsage, meteredKwh, usageSummary } from '$lib/server/usage/usage.service';
import { makeSite, makeUser } from './fixtures';

// Against the real PostgreSQL of `npm test`; invented people, sites and readings.
const tag = `usage-${Date.now()}`;
let owner: Actor;
let workspaceId = '';

/** A new site in this file's workspace, its name tagged with this run. */
const freshSite = (name: string) => makeSite(workspaceId, owner, `${name} ${tag}`);

/** `count` back-to-back readings of `seconds` each and `kwh` each, from `startIso`. */
const readingsFrom = (startIso: string, count: number, seconds: number, kwh: number): Interval[] =>
	Array.from({ length: count }, (_, i) => ({
		start: new Date(new Date(startIso).getTime() + i * seconds * 1000),
		seconds,
		kwh
	}));

/** `hours` hourly readings of `kwh` each from `startIso`. */
const hourly = (startIso: string, hours: number, kwh = 1): Interval[] =>
	readingsFrom(startIso, hours, 3600, kwh);

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Usage owner');
	workspaceId = await createWorkspace(`Usage ${tag}`, owner.id);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('importing intervals', () => {
	it('stores the invented hourly Green Button file and records the import in the site’s history', async () => {
		const site = await freshSite('Pond');
		const read = parseGreenButton(readFileSync('tests/fixtures/green-button/hourly.xml', 'utf8'));
		if ('error' in read) throw new Error(read.error);
		const result = await importUsage(site, read.intervals, owner);
		expect(result).toEqual({
			imported: 48,
			from: new Date('2026-01-09T06:00:00Z'),
			to: new Date('2026-01-11T06:00:00Z')
		});
		const summary = await usageSummary(site.id);
		expect(summary).toMatchObject({
			intervals: 48,
			firstStart: new Date('2026-01-09T06:00:00Z'),
			lastStart: new Date('2026-01-11T05:00:00Z')
		});
		// 50,200 Wh, as the fixture's comment states (invented data).
		expect(summary!.kwh).toBeCloseTo(50.2, 9);
		const [event] = await db
			.select({ summary: auditEvents.summary, userId: auditEvents.userId })
			.from(auditEvents)
			.where(and(eq(auditEvents.siteId, site.id), eq(auditEvents.action, 'usage imported')));
		expect(event).toEqual({
			summary: 'Imported 48 intervals of metered use (from 2026-01-09 00:00 to 2026-01-11 00:00)',
			userId: owner.id
		});
	});

	it('replaces readings already stored for the same start instead of adding them twice', async () => {
		const site = await freshSite('Re-import');
		await importUsage(site, hourly('2026-02-02T06:00:00Z', 24, 1), owner);
		await importUsage(site, hourly('2026-02-02T18:00:00Z', 24, 2), owner);
		const summary = await usageSummary(site.id);
		// 12 hours at 1 kWh kept, 24 hours at 2 kWh from the second file (12 of them replacing).
		expect(summary).toMatchObject({ intervals: 36, kwh: 12 + 48 });
	});

	it('stores more intervals than one batch holds, in one go', async () => {
		const site = await freshSite('Big');
		const year = readingsFrom('2026-01-01T06:00:00Z', 12_000, 900, 0.25);
		expect((await importUsage(site, year, owner)).imported).toBe(12_000);
		expect(await usageSummary(site.id)).toMatchObject({ intervals: 12_000, kwh: 3000 });
	});

	it('leaves another site’s readings alone', async () => {
		const [a, b] = [await freshSite('A'), await freshSite('B')];
		await importUsage(a, hourly('2026-03-02T06:00:00Z', 5), owner);
		expect(await usageSummary(b.id)).toBeNull();
		expect(await db.select().from(usageIntervals).where(eq(usageIntervals.siteId, b.id))).toEqual([]);
	});
});

describe('metered kWh in a billing period', () => {
	// One kWh an hour from 00:00 Chicago time, so kWh, intervals and hours covered are one number. Spring: from
	// 00:00 CST on 8 March (06:00Z) to 00:00 CDT on 9 March (05:00Z) is 23 hours, US rules.
	it.each`
		site             | from                      | hours  | first           | last            | kwh    | hoursInPeriod | what
		${'Bill period'} | ${'2026-01-01T06:00:00Z'} | ${744} | ${'2026-01-05'} | ${'2026-01-11'} | ${168} | ${168}        | ${'sums the intervals that start on the period’s local dates, inclusive'}
		${'Partial'}     | ${'2026-01-01T06:00:00Z'} | ${36}  | ${'2026-01-01'} | ${'2026-01-03'} | ${36}  | ${72}         | ${'reports how much of a period the readings cover'}
		${'Spring'}      | ${'2026-03-08T06:00:00Z'} | ${24}  | ${'2026-03-08'} | ${'2026-03-08'} | ${23}  | ${23}         | ${'counts 23 hours in the day clocks spring forward (8 March 2026 in Chicago)'}
	`('$what', async ({ site: name, from, hours, first, last, kwh, hoursInPeriod }) => {
		const site = await freshSite(name);
		await importUsage(site, hourly(from, hours), owner);
		expect(await meteredKwh(site.id, first, last, site.timezone)).toEqual({
			kwh,
			intervals: kwh,
			hoursCovered: kwh,
			hoursInPeriod
		});
	});

	it('stops the hours covered at the period’s end for a reading that runs past it', async () => {
		const site = await freshSite('Daily');
		await importUsage(site, [{ start: new Date('2026-04-01T17:00:00Z'), seconds: 86_400, kwh: 30 }], owner);
		expect(await meteredKwh(site.id, '2026-04-01', '2026-04-01', site.timezone)).toMatchObject({
			kwh: 30,
			hoursCovered: 12
		});
	});

	it('answers null when no interval falls in the period', async () => {
		const site = await freshSite('Empty');
		await importUsage(site, hourly('2026-01-01T06:00:00Z', 24), owner);
		expect(await meteredKwh(site.id, '2026-02-01', '2026-02-28', site.timezone)).toBeNull();
	});

	it('refuses a period whose dates are out of order', async () => {
		const site = await freshSite('Backwards');
		await expect(meteredKwh(site.id, '2026-02-10', '2026-02-01', site.timezone)).rejects.toThrow(RangeError);
	});
});

describe('the daily load shape', () => {
	it('averages each local hour, weekdays and weekends apart', async () => {
		const site = await freshSite('Shape');
		// Friday 9 and Saturday 10 January 2026: 2 kWh an hour on the Friday, 1 on the Saturday,
		// with an extra 3 kWh in the Friday 13:00 hour (00:00 CST is 06:00Z).
		const readings = [...hourly('2026-01-09T06:00:00Z', 24, 2), ...hourly('2026-01-10T06:00:00Z', 24, 1)];
		readings[13] = { ...readings[13]!, kwh: 5 };
		await importUsage(site, readings, owner);
		const shape = await dailyShape(site.id, site.timezone);
		expect(shape!.weekday).toHaveLength(24);
		expect(shape!.weekday[0]).toBe(2);
		expect(shape!.weekday[13]).toBe(5);
		expect(shape!.weekend).toEqual(Array(24).fill(1));
	});

	it('reads 15-minute readings as kWh per hour, and leaves out daily readings', async () => {
		const site = await freshSite('Quarter');
		const quarters = readingsFrom('2026-01-12T06:00:00Z', 4, 900, 0.25);
		await importUsage(
			site,
			[...quarters, { start: new Date('2026-01-13T06:00:00Z'), seconds: 86_400, kwh: 50 }],
			owner
		);
		const shape = await dailyShape(site.id, site.timezone);
		expect(shape!.weekday[0]).toBe(1);
		expect(shape!.weekday.filter((kwh) => kwh !== null)).toEqual([1]);
		expect(shape!.weekend.every((kwh) => kwh === null)).toBe(true);
	});

	it('has no shape before the first import', async () => {
		const site = await freshSite('None');
		expect(await dailyShape(site.id, site.timezone)).toBeNull();
	});
});
