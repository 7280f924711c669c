/**
 * An adviser's workspace at scale, generated for benchmarks and never committed: 200 sites × 3 scenarios ×
 * 30 devices (SITES, SCENARIOS, DEVICES change that), each site on one of the demo library's public tariffs,
 * owned by the demo owner. Everything is invented ("Bench site 001 (generated)", example.org people).
 *
 *   DATABASE_URL=… npx tsx scripts/bench/workspace-200.ts   → prints the workspace's id as JSON
 *
 * `npm run load` calls `generateWorkspace` on its throwaway database. Ids are fixed (derived from the
 * numbers), so a second run replaces the workspace instead of adding another.
 */
import { eq } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';
import { devices, memberships, scenarios, sites, workspaces } from '../../src/lib/server/db/schema';
import type { DeviceSpec } from '../../src/lib/server/db/schema';

export interface Generated {
	workspaceId: string;
	siteIds: string[];
	/** Per site, its scenarios' ids, the baseline first. */
	scenarioIds: string[][];
}

const OWNER = 'demo-user-owner';
const WORKSPACE = '0d3e5c1a-6f2b-4c1e-9a57-5e1fbe000200';
// The demo library's public tariffs (data/demo-tariffs.json), with a time zone and state that suit each.
const TARIFFS = [
	{ id: '7a1c0000-0000-4000-8000-000000000100', timezone: 'America/Boise', region: 'ID' },
	{ id: '7a1c0000-0000-4000-8000-000000000300', timezone: 'America/Boise', region: 'ID' },
	{ id: '7a1c0000-0000-4000-8000-000000000400', timezone: 'America/Denver', region: 'UT' },
	{ id: '7a1c0000-0000-4000-8000-000000000500', timezone: 'America/Chicago', region: 'WI' },
	{ id: '7a1c0000-0000-4000-8000-000000000600', timezone: 'America/Chicago', region: 'MN' },
	{ id: '7a1c0000-0000-4000-8000-000000000700', timezone: 'America/Chicago', region: 'WI' },
	{ id: '7a1c0000-0000-4000-8000-000000000900', timezone: 'America/Los_Angeles', region: 'WA' }
];
const SCHEDULES: DeviceSpec['schedule'][] = [
	{ type: 'always' },
	{ type: 'hours', hoursPerDay: 14 },
	{ type: 'windows', windows: [{ start: '06:00', end: '20:00' }] },
	{ type: 'cycle', onMinutes: 15, offMinutes: 45 }
];
const KINDS = [
	{ name: 'Water pump', category: 'water-pump', watts: 180 },
	{ name: 'Air pump', category: 'air-pump', watts: 45 },
	{ name: 'Grow light', category: 'lighting', watts: 320 },
	{ name: 'Heater', category: 'heater', watts: 500 },
	{ name: 'UV steriliser', category: 'uv', watts: 40 }
] as const;

/** A fixed UUID from a kind digit and a number: the same site or scenario gets the same id every run. */
const idOf = (kind: number, n: number) => `be0${kind}0000-0000-4000-8000-${n.toString(16).padStart(12, '0')}`;

function deviceList(site: number, scenario: number, count: number): DeviceSpec[] {
	return Array.from({ length: count }, (_, i) => {
		const kind = KINDS[(site + i) % KINDS.length]!;
		return {
			name: `${kind.name} ${i + 1}`,
			category: kind.category,
			quantity: 1 + ((i + scenario) % 3),
			// The proposed scenarios use a little less: what an adviser's alternatives would look like.
			power: { watts: Math.round(kind.watts * (1 - 0.1 * scenario) + ((site * 7 + i * 13) % 60)) },
			schedule: SCHEDULES[(i + site) % SCHEDULES.length]!
		} as DeviceSpec;
	});
}

/** Writes the workspace (replacing an earlier one with the same id) and returns its ids. */
export async function generateWorkspace(
	url: string,
	size = { sites: 200, scenarios: 3, devices: 30 }
): Promise<Generated> {
	const client = postgres(url, { max: 1, onnotice: () => {} });
	const db = drizzle(client);
	const out: Generated = { workspaceId: WORKSPACE, siteIds: [], scenarioIds: [] };
	try {
		await db.transaction(async (tx) => {
			await tx.delete(workspaces).where(eq(workspaces.id, WORKSPACE));
			await tx.insert(workspaces).values({ id: WORKSPACE, name: 'Bench advisory practice (generated)' });
			await tx.insert(memberships).values({ workspaceId: WORKSPACE, userId: OWNER, role: 'owner' });
			const siteRows: (typeof sites.$inferInsert)[] = [];
			const scenarioRows: (typeof scenarios.$inferInsert)[] = [];
			const deviceRows: (typeof devices.$inferInsert)[] = [];
			for (let s = 1; s <= size.sites; s++) {
				const tariff = TARIFFS[s % TARIFFS.length]!;
				const siteId = idOf(1, s);
				out.siteIds.push(siteId);
				siteRows.push({
					id: siteId,
					workspaceId: WORKSPACE,
					name: `Bench site ${String(s).padStart(3, '0')} (generated)`,
					address: 'Generated for a benchmark (invented)',
					timezone: tariff.timezone,
					country: 'US',
					region: tariff.region,
					tariffId: tariff.id,
					currency: 'USD'
				});
				const ids: string[] = [];
				for (let c = 0; c < size.scenarios; c++) {
					const scenarioId = idOf(2, s * 10 + c);
					ids.push(scenarioId);
					scenarioRows.push({
						id: scenarioId,
						siteId,
						name: c === 0 ? 'As installed' : `Alternative ${c}`,
						isBaseline: c === 0,
						status: c === 0 ? 'installed' : 'proposed',
						position: c
					});
					deviceList(s, c, size.devices).forEach((spec, position) =>
						deviceRows.push({ scenarioId, position, spec })
					);
				}
				out.scenarioIds.push(ids);
			}
			// In chunks: one statement's parameters stay well under PostgreSQL's 65,535.
			for (let i = 0; i < siteRows.length; i += 500)
				await tx.insert(sites).values(siteRows.slice(i, i + 500));
			for (let i = 0; i < scenarioRows.length; i += 1000)
				await tx.insert(scenarios).values(scenarioRows.slice(i, i + 1000));
			for (let i = 0; i < deviceRows.length; i += 2000)
				await tx.insert(devices).values(deviceRows.slice(i, i + 2000));
		});
	} finally {
		await client.end();
	}
	return out;
}

if (import.meta.url === `file://${process.argv[1]}`) {
	const url = process.env.DATABASE_URL;
	if (!url) throw new Error('DATABASE_URL is not set');
	const size = {
		sites: Number(process.env.SITES ?? 200),
		scenarios: Number(process.env.SCENARIOS ?? 3),
		devices: Number(process.env.DEVICES ?? 30)
	};
	const started = performance.now();
	const made = await generateWorkspace(url, size);
	console.log(
		JSON.stringify({
			workspaceId: made.workspaceId,
			sites: made.siteIds.length,
			firstSite: made.siteIds[0],
			firstScenarios: made.scenarioIds[0]?.join(','),
			ms: Math.round(performance.now() - started)
		})
	);
}
