import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import {
	auditEvents,
	billAttachments,
	bills,
	devices,
	memberships,
	scenarios,
	sites,
	users,
	workspaces
} from '$lib/server/db/schema';
import { createSite } from '$lib/server/sites/site.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { exportWorkspace } from '$lib/server/workspaces/export';
import {
	deletionDate,
	purgeDeletedWorkspaces,
	restoreWorkspace,
	scheduleWorkspaceDeletion
} from '$lib/server/workspaces/deletion';
import { deleteAccount } from '$lib/server/accounts/deletion';
import { makeUser, siteInput } from './fixtures';

// Against the real PostgreSQL that `npm test` starts; every row here is invented test data.
const tag = `own-${Date.now()}`;
const DAY = 24 * 60 * 60 * 1000;

/** A user with a password hash, which the export must leave out. */
const person = (name: string) =>
	makeUser(`${name}-${tag}@example.org`, `${name} (invented)`, { passwordHash: 'not-a-real-hash' });

const siteWithAddress = (name: string) => siteInput(name, { address: '1 Test Lane, example.org' });

/** A workspace with one site, its baseline scenario holding one device, and one bill with an attachment. */
async function stockedWorkspace(owner: { id: string; name: string | null; email: string }, label: string) {
	const ws = await createWorkspace(`${label} ${tag}`, owner.id);
	const siteId = await createSite(ws, siteWithAddress(`${label} pond ${tag}`), owner);
	const [scenario] = await db
		.select({ id: scenarios.id })
		.from(scenarios)
		.where(eq(scenarios.siteId, siteId));
	await db
		.insert(devices)
		.values({ scenarioId: scenario!.id, position: 0, spec: { name: `${label} pump` } as never });
	const [bill] = await db
		.insert(bills)
		.values({ siteId, periodFrom: '2026-01-01', periodTo: '2026-01-31', kwh: 500, amount: 80 })
		.returning({ id: bills.id });
	await db.insert(billAttachments).values({
		billId: bill!.id,
		storageKey: `test/${label}-${tag}`,
		contentType: 'application/pdf',
		bytes: 1234,
		fileName: `${label}-january.pdf`
	});
	return { ws, siteId };
}

let owner = { id: '', email: '', name: null as string | null };

beforeAll(async () => {
	owner = await person('owner');
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('the workspace export', () => {
	it('holds the site, scenario, device and bill of the workspace, and nothing of another one', async () => {
		const mine = await stockedWorkspace(owner, 'Alder');
		const other = await stockedWorkspace(owner, 'Birch');
		const data = await exportWorkspace(mine.ws);
		expect(data).not.toBeNull();
		expect(data!.format).toBe('runrate-workspace-export');
		expect(data!.version).toBe(1);
		expect(data!.workspace).toEqual({ id: mine.ws, name: `Alder ${tag}` });
		expect(data!.members).toEqual([{ name: owner.name, email: owner.email, role: 'owner' }]);
		expect(data!.sites.map((s) => s.id)).toEqual([mine.siteId]);
		const site = data!.sites[0]!;
		expect(site.scenarios[0]!.devices.map((d) => d.spec)).toEqual([{ name: 'Alder pump' }]);
		expect(site.bills[0]!.attachments).toMatchObject([{ fileName: 'Alder-january.pdf', bytes: 1234 }]);
		expect(site.usage).toEqual({ count: 0, first: null, last: null, kWh: 0 });
		expect(data!.auditEvents.length).toBeGreaterThan(0);

		const text = JSON.stringify(data);
		expect(text).not.toContain(other.ws);
		expect(text).not.toContain(other.siteId);
		expect(text).not.toContain('Birch');
		expect(text).not.toContain('not-a-real-hash');
		expect(text).not.toContain('storageKey');
	});
});

describe('deleting a workspace', () => {
	it('keeps it through the grace period, then the purge removes it with its sites', async () => {
		const { ws, siteId } = await stockedWorkspace(owner, 'Cedar');
		const now = new Date('2030-01-01T00:00:00Z');
		const deleteAfter = await scheduleWorkspaceDeletion(ws, now);
		expect(deleteAfter.getTime()).toBe(now.getTime() + 7 * DAY);
		expect((await deletionDate(ws))?.getTime()).toBe(deleteAfter.getTime());

		expect(await purgeDeletedWorkspaces(new Date(deleteAfter.getTime() - 1000))).not.toContain(ws);
		expect(await db.select().from(sites).where(eq(sites.id, siteId))).toHaveLength(1);

		expect(await purgeDeletedWorkspaces(new Date(deleteAfter.getTime() + 1000))).toContain(ws);
		expect(await db.select().from(workspaces).where(eq(workspaces.id, ws))).toHaveLength(0);
		expect(await db.select().from(sites).where(eq(sites.id, siteId))).toHaveLength(0);
	});

	it('can be called off: restoring clears the date and the purge leaves it', async () => {
		const { ws } = await stockedWorkspace(owner, 'Dogwood');
		await scheduleWorkspaceDeletion(ws, new Date('2020-01-01T00:00:00Z'));
		await restoreWorkspace(ws);
		expect(await deletionDate(ws)).toBeNull();
		expect(await purgeDeletedWorkspaces(new Date('2040-01-01T00:00:00Z'))).not.toContain(ws);
		expect(await db.select().from(workspaces).where(eq(workspaces.id, ws))).toHaveLength(1);
	});
});

describe('deleting an account', () => {
	it('is refused for the last owner of a workspace others use, naming it', async () => {
		const lead = await person('lead');
		const helper = await person('helper');
		const ws = await createWorkspace(`Shared ${tag}`, lead.id);
		await db.insert(memberships).values({ workspaceId: ws, userId: helper.id, role: 'editor' });
		expect(await deleteAccount(lead.id)).toEqual({ deleted: false, blockers: [`Shared ${tag}`] });
		expect(await db.select().from(users).where(eq(users.id, lead.id))).toHaveLength(1);
	});

	it('removes the user and their sole-member workspace, keeps shared ones, and keeps audit names', async () => {
		const leaver = await person('leaver');
		const partner = await person('partner');
		const solo = await stockedWorkspace(leaver, 'Elm');
		const shared = await createWorkspace(`Partnership ${tag}`, partner.id);
		await db.insert(memberships).values({ workspaceId: shared, userId: leaver.id, role: 'owner' });
		const sharedSite = await createSite(shared, siteWithAddress(`Shared field ${tag}`), leaver);

		const result = await deleteAccount(leaver.id);
		expect(result).toEqual({ deleted: true, workspacesRemoved: [solo.ws] });
		expect(await db.select().from(users).where(eq(users.id, leaver.id))).toHaveLength(0);
		expect(await db.select().from(workspaces).where(eq(workspaces.id, solo.ws))).toHaveLength(0);
		expect(await db.select().from(sites).where(eq(sites.id, solo.siteId))).toHaveLength(0);
		expect(await db.select().from(memberships).where(eq(memberships.workspaceId, shared))).toEqual([
			expect.objectContaining({ userId: partner.id, role: 'owner' })
		]);
		const trail = await db.select().from(auditEvents).where(eq(auditEvents.siteId, sharedSite));
		expect(trail.length).toBeGreaterThan(0);
		expect(trail.every((a) => a.userId === null && a.userName === leaver.name)).toBe(true);
	});
});
