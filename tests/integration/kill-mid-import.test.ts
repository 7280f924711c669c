import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, asc, count, eq, getTableName, type Table } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import {
	auditEvents,
	bills,
	devices,
	scenarios,
	tariffs,
	tariffVersions,
	usageIntervals
} from '$lib/server/db/schema';
import { parseBillSheet } from '$lib/server/bills/bill-sheet';
import { createBills } from '$lib/server/bills/bill.service';
import type { Actor } from '$lib/server/workspaces/audit';
import { saveDevices } from '$lib/server/sites/equipment.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { importTariffs } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { parseTariffSheet } from '$lib/server/tariffs/sheet-import';
import { importUsage, usageSummary } from '$lib/server/usage/usage.service';
import {
	BILL_ROWS,
	billSheetCsv,
	DONE,
	pumps,
	quarterHours,
	TARIFF_ROWS,
	tariffSheetCsv,
	TRIPPED,
	YEAR_QUARTER_HOURS,
	type ChildJob,
	type Tripwire
} from './kill-mid-import.data';
import { makeSite, makeUser } from './fixtures';

// Against the real PostgreSQL of `npm test`: each import runs in a child process that is SIGKILLed part-way,
// the way a crash or an out-of-memory kill would end the app. Invented people, sites, bills and tariffs.
const tag = `kill-${Date.now()}`;
const CHILD = fileURLToPath(new URL('./kill-mid-import.child.ts', import.meta.url));
let owner: Actor;
let workspaceId = '';

type Session = { state: string | null; query: string };

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * What the child's database session is doing, found by the application name it connected with; given a
 * moment to leave "active", as the driver can hand back a result just before the server reports idle.
 */
async function session(app: string): Promise<Session | null> {
	let row: Session | undefined;
	for (let waited = 0; waited < 2_000 && (!row || row.state === 'active'); waited += 20) {
		if (waited) await pause(20);
		[row] = await client<Session[]>`
			select state, query from pg_stat_activity where application_name = ${app} and xact_start is not null`;
	}
	return row ?? null;
}

/** Until PostgreSQL has noticed the dead client and ended its session (rolling back what it held). */
async function sessionGone(app: string) {
	for (let waited = 0; waited < 10_000; waited += 50) {
		const [row] = await client<{ n: number }[]>`
			select count(*)::int as n from pg_stat_activity where application_name = ${app}`;
		if (row!.n === 0) return;
		await pause(50);
	}
	throw new Error(`The session of ${app} is still open 10 s after its client was killed`);
}

/**
 * Runs the import in a child process and SIGKILLs it at its tripwire. For a held tripwire, returns what its
 * database session was doing at that moment; returns once PostgreSQL has closed the session.
 */
async function killAt(job: ChildJob): Promise<Session | null> {
	const app = `kill-mid-import ${randomUUID()}`;
	const child = spawn(process.execPath, ['--import', 'tsx', CHILD, JSON.stringify(job)], {
		env: { ...process.env, PGAPPNAME: app, DATABASE_POOL_SIZE: '2', LOG_LEVEL: 'silent' },
		stdio: ['ignore', 'pipe', 'pipe']
	});
	let stderr = '';
	child.stderr.on('data', (chunk) => (stderr += chunk));
	const ended = new Promise<NodeJS.Signals | null>((resolve) =>
		child.on('exit', (_, signal) => resolve(signal))
	);
	const said = await new Promise<string>((resolve, reject) => {
		createInterface({ input: child.stdout }).on('line', (line) => {
			if (line === TRIPPED || line === DONE) resolve(line);
		});
		child.on('exit', (code) =>
			reject(new Error(`The child exited (${code}) before its tripwire:\n${stderr}`))
		);
	});
	const held = job.trip.hold && said === TRIPPED ? await session(app) : null;
	child.kill('SIGKILL');
	expect(await ended).toBe('SIGKILL');
	if (job.trip.hold) expect(said).toBe(TRIPPED);
	await sessionGone(app);
	return held;
}

/** The session stood idle inside its open transaction, the last statement it ran an insert into `table`. */
const heldAfterInsertInto = (table: Table) => ({
	state: 'idle in transaction',
	query: expect.stringMatching(new RegExp(`^insert into "${getTableName(table)}"`))
});

/** A new site in this file's workspace, its name tagged with this run. */
const freshSite = (name: string) => makeSite(workspaceId, owner, `${name} ${tag}`);

async function audited(siteId: string, entity: 'site' | 'bill', action: string) {
	const [row] = await db
		.select({ n: count() })
		.from(auditEvents)
		.where(
			and(eq(auditEvents.siteId, siteId), eq(auditEvents.entity, entity), eq(auditEvents.action, action))
		);
	return row!.n;
}

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Kill test owner (invented)');
	workspaceId = await createWorkspace(`Kill ${tag}`, owner.id);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

const row = (index: number, key: string, read = 1): Tripwire => ({ on: 'row', index, key, read, hold: true });
const atActor: Tripwire = { on: 'actor', key: 'id', read: 1, hold: true };
const QUARTER_HOUR = 900_000;
const JANUARY = 31 * 96;

describe('a usage import killed part-way', () => {
	// The site already holds January at 1 kWh a reading; the killed import is the whole year at 0.25 kWh.
	const before = async (site: SiteRow) => {
		await importUsage(site, quarterHours(JANUARY, 1), owner);
	};
	const untouched = {
		summary: {
			intervals: JANUARY,
			kwh: JANUARY,
			firstStart: new Date('2026-01-01T06:00:00Z'),
			lastStart: new Date(Date.UTC(2026, 0, 1, 6) + (JANUARY - 1) * QUARTER_HOUR)
		},
		imports: 1
	};
	const whole = {
		summary: {
			intervals: YEAR_QUARTER_HOURS,
			kwh: YEAR_QUARTER_HOURS * 0.25,
			firstStart: new Date('2026-01-01T06:00:00Z'),
			lastStart: new Date(Date.UTC(2026, 0, 1, 6) + (YEAR_QUARTER_HOURS - 1) * QUARTER_HOUR)
		},
		imports: 2
	};
	const stored = async (site: SiteRow) => ({
		summary: await usageSummary(site.id),
		imports: await audited(site.id, 'site', 'usage imported')
	});

	it.each([
		{ at: 'after the first of its 36 batches', trip: row(1_000, 'kwh') },
		{ at: 'half-way, after 18 of its 36 batches', trip: row(18_000, 'kwh') },
		{ at: 'after its last batch, before the audit entry', trip: atActor }
	])('keeps the readings as they were when killed $at', async ({ trip }) => {
		const site = await freshSite('Usage');
		await before(site);
		const held = await killAt({ kind: 'usage', site, actor: owner, kwh: 0.25, trip });
		expect(held).toEqual(heldAfterInsertInto(usageIntervals));
		expect(await stored(site)).toEqual(untouched);
	});

	it('holds the readings from before or the whole file when killed as it commits, and imports whole afterwards', async () => {
		const site = await freshSite('Usage commit');
		await before(site);
		// Not held: the child writes the audit entry and commits while the kill is on its way.
		await killAt({ kind: 'usage', site, actor: owner, kwh: 0.25, trip: { ...atActor, hold: false } });
		const after = await stored(site);
		expect([untouched, whole]).toContainEqual(after);

		// Nothing is left locked: the same file imports whole at once (a second time if the first committed).
		await importUsage(site, quarterHours(YEAR_QUARTER_HOURS, 0.25), owner);
		expect(await stored(site)).toEqual({ ...whole, imports: after.imports + 1 });
		// Two imports of a year of readings: 6 s on the development machine, 12 s when it was busy.
	}, 40_000);
});

describe('a bill sheet import killed part-way', () => {
	const stored = async (site: SiteRow) => ({
		bills: (await db.select({ n: count() }).from(bills).where(eq(bills.siteId, site.id)))[0]!.n,
		audited: await audited(site.id, 'bill', 'created')
	});

	it.each([
		{ at: 'after the bills went in, before their audit entries', trip: row(0, 'amount', 2), last: bills },
		{ at: 'after 60 of its 120 audit entries', trip: row(60, 'amount', 2), last: auditEvents }
	])('stores none of the bills when killed $at', async ({ trip, last }) => {
		const site = await freshSite('Bills');
		const held = await killAt({ kind: 'bills', site, actor: owner, trip });
		expect(held).toEqual(heldAfterInsertInto(last));
		expect(await stored(site)).toEqual({ bills: 0, audited: 0 });

		const sheet = await parseBillSheet(new TextEncoder().encode(billSheetCsv()), 'csv', []);
		if ('error' in sheet) throw new Error(sheet.error);
		await createBills(
			site,
			sheet.rows.map((r) => r.bill),
			owner
		);
		expect(await stored(site)).toEqual({ bills: BILL_ROWS, audited: BILL_ROWS });
	});
});

describe('a tariff sheet import killed part-way', () => {
	const stored = async (utility: string) => {
		const [row] = await db
			.select({ tariffs: count(tariffs.id), versions: count(tariffVersions.id) })
			.from(tariffs)
			.leftJoin(tariffVersions, eq(tariffVersions.tariffId, tariffs.id))
			.where(eq(tariffs.utility, utility));
		return row;
	};

	it('stores none of the tariffs when killed after 30 of its 60', async () => {
		const utility = `Invented Utility ${tag}`;
		const trip = row(TARIFF_ROWS / 2, 'meta');
		const held = await killAt({ kind: 'tariffs', workspaceId, utility, actor: owner, trip });
		expect(held).toEqual(heldAfterInsertInto(tariffVersions));
		expect(await stored(utility)).toEqual({ tariffs: 0, versions: 0 });

		const sheet = await parseTariffSheet(new TextEncoder().encode(tariffSheetCsv(utility)), 'csv');
		await importTariffs(sheet.rows, workspaceId, owner);
		expect(await stored(utility)).toEqual({ tariffs: TARIFF_ROWS, versions: TARIFF_ROWS });
	});
});

describe('an equipment list import killed part-way', () => {
	it('keeps the old list when killed after the old list was removed and the new one inserted', async () => {
		const site = await freshSite('Equipment');
		const [baseline] = await db.select().from(scenarios).where(eq(scenarios.siteId, site.id));
		const revision = await saveDevices(site, baseline!, baseline!.revision, pumps('Old pump', 3), owner);
		const scenario = { ...baseline!, revision };
		const list = async () =>
			(
				await db
					.select({ spec: devices.spec })
					.from(devices)
					.where(eq(devices.scenarioId, scenario.id))
					.orderBy(asc(devices.position))
			).map((d) => d.spec.name);
		const revisionNow = async () =>
			(await db.select().from(scenarios).where(eq(scenarios.id, scenario.id)))[0]!.revision;

		const held = await killAt({ kind: 'equipment', site, scenario, actor: owner, trip: row(0, 'name', 2) });
		expect(held).toEqual(heldAfterInsertInto(devices));
		expect(await list()).toEqual(['Old pump 1', 'Old pump 2', 'Old pump 3']);
		expect(await revisionNow()).toBe(revision);

		await saveDevices(site, scenario, revision, pumps('Replacement pump', 50), owner);
		expect(await list()).toHaveLength(50);
		expect(await revisionNow()).toBe(revision + 1);
	});
});
