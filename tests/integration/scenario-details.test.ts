import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RequestEvent } from '@sveltejs/kit';
import { client } from '$lib/server/db';
import type { DeviceSpec } from '$lib/server/db/schema';
import { buildComparison } from '$lib/server/compare/build';
import { listDevices, saveDevices } from '$lib/server/sites/equipment.service';
import {
	createScenario,
	findScenario,
	listScenarios,
	patchScenario
} from '$lib/server/sites/scenario.service';
import type { SiteRow } from '$lib/server/sites/site.service';
import { createTariff } from '$lib/server/tariffs/tariff.service';
import { PICK_A_TARIFF } from '$lib/server/tariffs/usable';
import { siteTrail } from '$lib/server/workspaces/audit';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// Issue 17, points 2 and 5, against the real PostgreSQL of `npm test`. People, sites and tariffs are invented.
const tag = `details-${Date.now()}`;
let owner: SessionUser;
let site: SiteRow;
let baselineId = '';
let foreignTariff = '';

const pump: DeviceSpec = {
	name: 'Main water pump',
	category: 'water-pump',
	power: { watts: 1500 },
	schedule: { type: 'always' },
	purchaseCost: 900
} as DeviceSpec;
const blower: DeviceSpec = {
	name: 'Air pump',
	category: 'air-pump',
	power: { watts: 60 },
	schedule: { type: 'always' }
} as DeviceSpec;

const eventFor = (user: SessionUser) =>
	({
		locals: { user },
		url: new URL('http://127.0.0.1/api/v1/compare'),
		request: new Request('http://127.0.0.1/api/v1/compare')
	}) as unknown as RequestEvent;

const access = async (scenarioId: string) => ({
	site,
	scenario: (await findScenario(scenarioId))!,
	user: owner,
	viaGrant: false
});

beforeAll(async () => {
	owner = await makeUser(`owner-${tag}@example.org`, 'Owner');
	const other = await makeUser(`other-${tag}@example.org`, 'Other owner');
	const ws = await createWorkspace(`Details ${tag}`, owner.id);
	const otherWs = await createWorkspace(`Other ${tag}`, other.id);
	const publicId = await createTariff(
		{
			meta: tariffMeta(`Demo Utility ${tag}`, 'Flat rate'),
			version: versionMeta('2026-01-01'),
			structure: flat(0.1),
			workspaceId: null
		},
		owner
	);
	foreignTariff = await createTariff(
		{
			meta: tariffMeta(`Other Valley Power ${tag}`, 'Private rate'),
			version: versionMeta('2026-01-01'),
			structure: flat(0.2),
			workspaceId: otherWs
		},
		other
	);
	site = await makeSite(ws, owner, `Hatchery ${tag}`, { tariffId: publicId });
	const [baseline] = await listScenarios(site.id);
	baselineId = baseline!.id;
	await saveDevices(site, baseline!, baseline!.revision, [pump, blower], owner);
});

afterAll(async () => {
	await client.end();
});

describe('the change trail of an equipment save', () => {
	it('records nothing when the list comes back untouched from the database', async () => {
		const before = (await siteTrail(site.id)).length;
		const scenario = (await findScenario(baselineId))!;
		// What the page sends back: the stored specs as jsonb returned them (keys reordered).
		const stored = (await listDevices(baselineId)).map((d) => d.spec);
		await saveDevices(site, scenario, scenario.revision, stored, owner);
		expect(await siteTrail(site.id)).toHaveLength(before);
	});

	it('records one event for the one device changed, with each field’s old and new value', async () => {
		const before = (await siteTrail(site.id)).length;
		const scenario = (await findScenario(baselineId))!;
		const stored = (await listDevices(baselineId)).map((d) => d.spec);
		const changed = stored.map((d) =>
			d.name === 'Main water pump'
				? {
						...d,
						power: { watts: 90 },
						schedule: { type: 'windows', windows: [{ start: '06:00', end: '18:00' }] }
					}
				: d
		) as DeviceSpec[];
		await saveDevices(site, scenario, scenario.revision, changed, owner);
		const trail = await siteTrail(site.id);
		expect(trail).toHaveLength(before + 1);
		const [latest] = trail;
		expect(latest?.summary).toBe(
			`Equipment of "What is installed now": Main water pump: power 1,500 W → 90 W; schedule Always on → On 06:00–18:00, every day`
		);
		expect(Object.keys(latest?.changes ?? {}).sort()).toEqual(['power', 'schedule']);
		expect(latest?.changes?.power).toEqual({ from: { watts: 1500 }, to: { watts: 90 } });
	});
});

describe('a scenario’s details through the API', () => {
	let proposal = '';
	beforeAll(async () => {
		proposal = await createScenario(
			site,
			{ name: 'Small pump plus an air-lift', description: null },
			baselineId,
			owner
		);
	});

	it('saves status and one-off costs against the revision, and records each field changed', async () => {
		const scenario = (await findScenario(proposal))!;
		expect(scenario.status).toBe('proposed');
		const refused = await patchScenario(await access(proposal), {
			expectedRevision: scenario.revision,
			status: 'installed',
			oneOffCosts: [{ label: 'Trench and outdoor circuit', amount: 2500, note: 'Electrician’s quote' }]
		});
		expect(refused).toBeNull();
		const saved = (await findScenario(proposal))!;
		expect(saved).toMatchObject({ status: 'installed', revision: scenario.revision + 1 });
		expect(saved.oneOffCosts).toEqual([
			{ label: 'Trench and outdoor circuit', amount: 2500, note: 'Electrician’s quote' }
		]);
		const [event] = await siteTrail(site.id);
		expect(event?.summary).toBe(
			'Scenario "Small pump plus an air-lift": status a proposal (bought now) → installed (already paid for); one-off costs none → Trench and outdoor circuit $2,500.00'
		);
		expect(Object.keys(event?.changes ?? {}).sort()).toEqual(['oneOffCosts', 'status']);
	});

	it('refuses a stale revision and writes nothing', async () => {
		const scenario = (await findScenario(proposal))!;
		const refused = await patchScenario(await access(proposal), {
			expectedRevision: scenario.revision - 1,
			name: 'Renamed by a stale copy'
		});
		expect(refused).toEqual({ conflict: scenario.revision });
		expect((await findScenario(proposal))!.name).toBe('Small pump plus an air-lift');
	});

	it('ties each bad one-off cost to its field, in words, and takes at most 50', async () => {
		const refused = await patchScenario(await access(proposal), {
			oneOffCosts: [{ label: '', amount: 'lots' }]
		});
		expect(refused).toEqual({
			issues: [
				{ path: 'oneOffCosts.0.label', message: 'Label must not be empty' },
				{ path: 'oneOffCosts.0.amount', message: 'Amount must be a number' }
			]
		});
		const many = Array.from({ length: 51 }, (_, i) => ({ label: `Cost ${i}`, amount: 1 }));
		expect(await patchScenario(await access(proposal), { oneOffCosts: many })).toEqual({
			issues: [{ path: 'oneOffCosts', message: 'A scenario holds at most 50 one-off costs' }]
		});
	});

	it('refuses another workspace’s private tariff, in the same words as an unknown one', async () => {
		const refused = await patchScenario(await access(proposal), { tariff: { tariffId: foreignTariff } });
		expect(refused).toEqual({ issues: [{ path: 'tariff.tariffId', message: PICK_A_TARIFF }] });
	});

	it('counts the one-off cost in the comparison’s capital', async () => {
		const scenario = (await findScenario(proposal))!;
		await patchScenario(await access(proposal), { expectedRevision: scenario.revision, status: 'proposed' });
		const built = await buildComparison(eventFor(owner), {
			scenarios: [baselineId, proposal],
			baseline: baselineId,
			start: '2027-01',
			horizonYears: 10,
			discountPercent: 5,
			escalationPercent: 2,
			emissionKgPerKwh: 0,
			emissionSource: ''
		});
		if (!built.ok) throw new Error(built.message);
		const [installed, proposed] = built.comparison.report.result.scenarios;
		// The baseline is installed: no capital. The proposal buys its copied devices (one pump at $900) now
		// and pays the $2,500 one-off cost in year 0.
		expect(installed?.capitalCost).toBe(0);
		expect(proposed?.capitalCost).toBe(900 + 2500);
		expect(built.comparison.report.assumptions.join(' ')).toContain(
			'“Small pump plus an air-lift” is priced on'
		);
	});
});
