import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { airDesignSchema, TYPICAL_AIR_PUMPS, type AirDesign } from '$lib/calc';
import { client, db } from '$lib/server/db';
import { memberships, type DeviceSpec } from '$lib/server/db/schema';
import { requireScenarioAccess } from '$lib/server/guard';
import { saveAirDesign } from '$lib/server/sites/air-design.service';
import { listDevices, saveDevices } from '$lib/server/sites/equipment.service';
import { findScenario, listScenarios } from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { siteTrail } from '$lib/server/workspaces/audit';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { PUT } from '../../src/routes/api/v1/scenarios/[scenarioId]/air-design/+server';
import { makeSite, makeUser } from './fixtures';

// Issue 18, "Add to scenario", against the real PostgreSQL of `npm test`. People and sites are invented.
const tag = `air-${Date.now()}`;
const people: Record<'owner' | 'viewer' | 'outsider', SessionUser> = {} as never;
let site: SiteRow;
let scenarioId = '';
let otherScenarioId = '';

const heater: DeviceSpec = {
	name: 'Tank heater',
	category: 'heater',
	power: { watts: 300 },
	schedule: { type: 'always' }
} as DeviceSpec;

/** The worked example of issue 18 (20 L/min, 0.3 m lift, 0.7 m submergence, 25 mm, 30 %), `count` of them. */
const design = (count: number): AirDesign =>
	airDesignSchema.parse({
		airlifts: [
			{
				name: 'Grow bed riser',
				count,
				riserInnerDiameter: 25,
				riserInnerDiameterUnit: 'mm',
				submergence: 0.7,
				submergenceUnit: 'm',
				lift: 0.3,
				liftUnit: 'm',
				waterFlow: 20,
				waterFlowUnit: 'lpm'
			}
		],
		pump: TYPICAL_AIR_PUMPS[0]!.pump,
		pumpSource: { kind: 'typical', id: TYPICAL_AIR_PUMPS[0]!.id }
	});

const eventFor = (user: SessionUser, id: string, body: unknown = {}) =>
	({
		locals: { user },
		params: { scenarioId: id },
		url: new URL(`http://127.0.0.1/api/v1/scenarios/${id}/air-design`),
		request: new Request(`http://127.0.0.1/api/v1/scenarios/${id}/air-design`, {
			method: 'PUT',
			headers: { 'content-type': 'application/json' },
			body: JSON.stringify(body)
		})
	}) as unknown as RequestEvent;

async function statusOf(run: () => unknown): Promise<number> {
	try {
		const answer = await run();
		return answer instanceof Response ? answer.status : 200;
	} catch (e) {
		return (e as { status: number }).status;
	}
}

const access = async (id = scenarioId) => ({
	site,
	scenario: (await findScenario(id))!,
	user: people.owner,
	viaGrant: false
});

beforeAll(async () => {
	people.owner = await makeUser(`owner-${tag}@example.org`, 'Owner');
	people.viewer = await makeUser(`viewer-${tag}@example.org`, 'Viewer');
	people.outsider = await makeUser(`outsider-${tag}@example.org`, 'Outsider');
	const ws = await createWorkspace(`Air ${tag}`, people.owner.id);
	const otherWs = await createWorkspace(`Other ${tag}`, people.outsider.id);
	await db.insert(memberships).values({ workspaceId: ws, userId: people.viewer.id, role: 'viewer' });
	site = await makeSite(ws, people.owner, `Hatchery ${tag}`);
	const [baseline] = await listScenarios(site.id);
	scenarioId = baseline!.id;
	await saveDevices(site, baseline!, baseline!.revision, [heater], people.owner);
	const otherSite = await makeSite(otherWs, people.outsider, `Other farm ${tag}`);
	otherScenarioId = (await listScenarios(otherSite.id))[0]!.id;
});

afterAll(async () => {
	await client.end();
});

describe('Add to scenario', () => {
	it('keeps the design and puts its pumps in the list as one always-on row, recorded in the trail', async () => {
		const before = await access();
		const saved = await saveAirDesign(before, before.scenario.revision, design(2));
		expect(saved.ok).toBe(true);
		if (!saved.ok) return;
		expect(saved.revision).toBe(before.scenario.revision + 1);
		const pump = saved.result.pump!;
		const list = (await listDevices(scenarioId)).map((d) => d.spec);
		expect(list.map((d) => d.name)).toEqual(['Tank heater', pump.pumpName]);
		expect(list[1]).toMatchObject({
			category: 'air-pump',
			quantity: pump.count,
			power: { watts: pump.wattsEach },
			schedule: { type: 'always' },
			airLpm: pump.flowEachLpm,
			inWater: false,
			fromAirDesign: true
		});
		const stored = await findScenario(scenarioId);
		expect(stored?.airDesign).toEqual(design(2));
		expect(stored?.revision).toBe(saved.revision);
		const [latest] = await siteTrail(site.id);
		expect(latest?.summary).toMatch(new RegExp(`^Air design saved: ${pump.count} × .+, [\\d.,]+ W each$`));
	});

	it('replaces its row on a second save: never two rows of the design', async () => {
		const now = await access();
		const saved = await saveAirDesign(now, now.scenario.revision, design(6));
		expect(saved.ok).toBe(true);
		const list = (await listDevices(scenarioId)).map((d) => d.spec);
		expect(list.filter((d) => d.fromAirDesign)).toHaveLength(1);
		expect(list).toHaveLength(2);
		expect((await findScenario(scenarioId))?.airDesign?.airlifts[0]?.count).toBe(6);
	});

	it('refuses a stale revision and writes nothing', async () => {
		const now = await access();
		const before = (await listDevices(scenarioId)).map((d) => d.spec);
		const refused = await saveAirDesign(now, now.scenario.revision - 1, design(1));
		expect(refused).toEqual({ ok: false, conflict: now.scenario.revision });
		expect((await listDevices(scenarioId)).map((d) => d.spec)).toEqual(before);
		expect((await findScenario(scenarioId))?.revision).toBe(now.scenario.revision);
	});

	it('refuses a pump source the workspace does not have', async () => {
		const now = await access();
		const foreign = { ...design(1), pumpSource: { kind: 'workspace' as const, id: crypto.randomUUID() } };
		const refused = await saveAirDesign(now, now.scenario.revision, foreign);
		expect(refused).toMatchObject({ ok: false, issues: [{ path: 'pumpSource' }] });
	});

	it('lets a viewer read but not save, and another workspace neither (API and guard alike)', async () => {
		const body = { expectedRevision: 0, design: design(1) };
		expect(
			await statusOf(() => requireScenarioAccess(eventFor(people.viewer, scenarioId), scenarioId, 'viewer'))
		).toBe(200);
		expect(await statusOf(() => PUT(eventFor(people.viewer, scenarioId, body) as never))).toBe(403);
		expect(await statusOf(() => PUT(eventFor(people.outsider, scenarioId, body) as never))).toBe(404);
		expect(await statusOf(() => PUT(eventFor(people.owner, otherScenarioId, body) as never))).toBe(404);
		expect((await findScenario(otherScenarioId))?.airDesign ?? null).toBeNull();
	});
});
