// Loads the invented demo data from data/ idempotently: fixed ids and upserts, so a second run adds nothing.
import { readFileSync } from 'node:fs';
import bcrypt from 'bcryptjs';
import { sql } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';
import {
	devices,
	memberships,
	bills,
	scenarios,
	sites,
	tariffs,
	tariffVersions,
	users,
	workspaces
} from '../src/lib/server/db/schema';
import type { DeviceSpec } from '../src/lib/server/db/schema';
import type { AirDesign, OneOffCost } from '../src/lib/calc';

type DemoPeople = {
	password: string;
	users: { id: string; email: string; name: string; isAdmin: boolean }[];
	workspaces: {
		id: string;
		name: string;
		members: { userId: string; role: 'owner' | 'editor' | 'viewer' }[];
	}[];
};

type DemoTariffs = {
	tariffs: (Omit<typeof tariffs.$inferInsert, 'revision'> & {
		id: string;
		versions: (Omit<typeof tariffVersions.$inferInsert, 'tariffId'> & { id: string })[];
	})[];
};

type DemoSites = {
	workspaceId: string;
	sites: (Omit<typeof sites.$inferInsert, 'workspaceId'> & {
		id: string;
		scenarios: {
			id: string;
			name: string;
			description: string;
			isBaseline: boolean;
			status: 'installed' | 'proposed';
			oneOffCosts: OneOffCost[];
			/** The air and water designer's design, kept with the scenario (the demo farm's air-lifts). */
			airDesign?: AirDesign | null;
			devices: DeviceSpec[];
		}[];
		/** Invented bills, entered with the site. */
		bills?: { periodFrom: string; periodTo: string; kwh: number; amount: number; notes: string }[];
	})[];
};

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');
const people: DemoPeople = JSON.parse(readFileSync('data/demo-people.json', 'utf8'));
const library: DemoTariffs = JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8'));
const demoSites: DemoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8'));

const client = postgres(url, { max: 1, onnotice: () => {} });
const db = drizzle(client);
const passwordHash = await bcrypt.hash(people.password, 11);

await db.transaction(async (tx) => {
	for (const u of people.users) {
		await tx
			.insert(users)
			.values({ ...u, passwordHash, emailVerified: new Date('2027-01-01T00:00:00Z') })
			.onConflictDoUpdate({ target: users.id, set: { name: u.name, isAdmin: u.isAdmin, email: u.email } });
	}
	for (const ws of people.workspaces) {
		await tx
			.insert(workspaces)
			.values({ id: ws.id, name: ws.name })
			.onConflictDoUpdate({ target: workspaces.id, set: { name: ws.name } });
		for (const m of ws.members)
			await tx
				.insert(memberships)
				.values({ workspaceId: ws.id, userId: m.userId, role: m.role })
				.onConflictDoUpdate({ target: [memberships.workspaceId, memberships.userId], set: { role: m.role } });
	}
	// The public demo library. Published versions never change, so existing ones are left as they are.
	const curator = people.users.find((u) => u.isAdmin);
	for (const { versions, ...t } of library.tariffs) {
		await tx
			.insert(tariffs)
			.values({ ...t, workspaceId: null, revision: versions.length, createdBy: curator?.id })
			.onConflictDoNothing();
		for (const v of versions)
			await tx
				.insert(tariffVersions)
				.values({ ...v, tariffId: t.id, publishedBy: curator?.id, publishedByName: curator?.name })
				.onConflictDoNothing();
	}
	// Demo sites: created once; what a person changes in them afterwards is theirs to keep.
	for (const { scenarios: list, bills: demoBills = [], ...site } of demoSites.sites) {
		const created = await tx
			.insert(sites)
			.values({ ...site, workspaceId: demoSites.workspaceId })
			.onConflictDoNothing()
			.returning({ id: sites.id });
		if (!created.length) continue;
		for (const [position, { devices: specs, ...scenario }] of list.entries()) {
			await tx.insert(scenarios).values({ ...scenario, siteId: site.id, position });
			if (specs.length)
				await tx
					.insert(devices)
					.values(specs.map((spec, i) => ({ scenarioId: scenario.id, position: i, spec })));
		}
		if (demoBills.length) await tx.insert(bills).values(demoBills.map((b) => ({ ...b, siteId: site.id })));
	}
});

const [{ n }] = (await db.execute(sql`select count(*)::int as n from "user"`)) as unknown as [{ n: number }];
console.log(
	`[seed] demo data loaded (${people.users.length} demo people, ${people.workspaces.length} workspaces, ${library.tariffs.length} public tariffs, ${demoSites.sites.length} sites; ${n} users in all)`
);
await client.end();
