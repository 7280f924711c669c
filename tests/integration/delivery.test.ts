import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import { airDesignSchema, scenarioDelivery, siteWaterSchema } from '$lib/calc';
import { deliveryDevice } from '$lib/compare/delivery-device';
import { buildComparison } from '$lib/server/compare/build';
import { client, db } from '$lib/server/db';
import { scenarios, sites, type DeviceSpec } from '$lib/server/db/schema';
import { FARM_DESIGN, FARM_WATER } from '$lib/server/exports/water-air.fixture';
import { loadDeliveries } from '$lib/server/sites/delivery';
import { saveDevices } from '$lib/server/sites/equipment.service';
import {
	changeScenario,
	createScenario,
	findScenario,
	listScenarios
} from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { createTariff } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// What each scenario delivers, loaded for many scenarios at once, against the core's own figures.
// People, site, devices and design are invented.
const tag = `delivery-${Date.now()}`;
let owner: SessionUser;
let site: SiteRow;
let baselineId = '';
let proposalId = '';
let goneId = '';

const bigPump = {
	name: 'Large in-tank pump',
	category: 'water-pump',
	power: { watts: 550 },
	schedule: { type: 'always' },
	inWater: true,
	waterLpm: 380
} as DeviceSpec;
const smallPump = {
	...bigPump,
	name: 'Small in-tank pump',
	power: { watts: 90 },
	waterLpm: 60
} as DeviceSpec;
const airPumps = {
	name: 'Air pump',
	category: 'air-pump',
	quantity: 2,
	power: { watts: 45 },
	schedule: { type: 'always' },
	airLpm: 62,
	fromAirDesign: true
} as DeviceSpec;

const design = airDesignSchema.parse(FARM_DESIGN);
const water = siteWaterSchema.parse(FARM_WATER);

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Owner');
	const ws = await createWorkspace(`Delivery ${tag}`, owner.id);
	const tariffId = await createTariff(
		{
			meta: tariffMeta(`Demo Utility ${tag}`, 'Flat rate'),
			version: versionMeta('2026-01-01'),
			structure: flat(0.1),
			workspaceId: null
		},
		owner
	);
	site = await makeSite(ws, owner, `Farm ${tag}`, { tariffId });
	// The site form and the designer write these in their own slices; here straight into the columns.
	await db.update(sites).set({ water }).where(eq(sites.id, site.id));
	site = { ...site, water };
	const [baseline] = await listScenarios(site.id);
	baselineId = baseline!.id;
	await saveDevices(site, baseline!, baseline!.revision, [bigPump], owner);
	proposalId = await createScenario(
		site,
		{ name: 'Small pump and air-lifts', description: null },
		null,
		owner
	);
	await db.update(scenarios).set({ airDesign: design }).where(eq(scenarios.id, proposalId));
	const proposal = (await findScenario(proposalId))!;
	await saveDevices(site, proposal, proposal.revision, [smallPump, airPumps], owner);
	goneId = await createScenario(site, { name: 'Deleted one', description: null }, null, owner);
	await changeScenario(site, (await findScenario(goneId))!, { kind: 'delete' }, owner);
});

afterAll(async () => {
	await client.end();
});

describe('loading what scenarios deliver', () => {
	it('gives, for many scenarios at once, the core’s figures for each', async () => {
		const loaded = await loadDeliveries([baselineId, proposalId]);
		expect(loaded.get(baselineId)).toEqual(scenarioDelivery([deliveryDevice(bigPump)], null, water));
		expect(loaded.get(proposalId)).toEqual(
			scenarioDelivery([smallPump, airPumps].map(deliveryDevice), design, water)
		);
		// The baseline's water is its pump's: 380 L/min through 9,500 L of tanks is 2.4 turnovers an hour.
		expect(loaded.get(baselineId)?.waterLpm).toBeCloseTo(380, 6);
		expect(loaded.get(baselineId)?.turnoversPerHour).toBeCloseTo((380 * 60) / 9500, 6);
		expect(loaded.get(baselineId)?.mainsDevicesInWater).toBe(1);
		expect(loaded.get(proposalId)?.oxygenSuppliedGramsPerHour).not.toBeNull();
	});

	it('leaves out deleted and unknown scenarios, and answers an empty list without a query', async () => {
		const loaded = await loadDeliveries([goneId, '00000000-0000-4000-8000-000000000000', baselineId]);
		expect([...loaded.keys()]).toEqual([baselineId]);
		expect((await loadDeliveries([])).size).toBe(0);
	});

	it('puts the same figures in the comparison of those scenarios', async () => {
		const event = {
			locals: { user: owner },
			url: new URL('http://127.0.0.1/api/v1/compare'),
			request: new Request('http://127.0.0.1/api/v1/compare')
		} as unknown as RequestEvent;
		const built = await buildComparison(event, {
			scenarios: [baselineId, proposalId],
			baseline: baselineId,
			start: '2027-01',
			horizonYears: 10,
			discountPercent: 5,
			escalationPercent: 2,
			emissionKgPerKwh: 0,
			emissionSource: ''
		});
		if (!built.ok) throw new Error(built.message);
		const loaded = await loadDeliveries([baselineId, proposalId]);
		expect(built.comparison.report.scenarios.map((s) => s.delivery)).toEqual([
			loaded.get(baselineId),
			loaded.get(proposalId)
		]);
		expect(built.comparison.stored[1]?.airDesign).toEqual(design);
	});
});
