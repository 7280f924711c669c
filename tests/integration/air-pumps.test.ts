import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, db } from '$lib/server/db';
import { memberships } from '$lib/server/db/schema';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { listAirPumps } from '$lib/server/workspaces/air-pumps';
import { exportWorkspace } from '$lib/server/workspaces/export';
import * as listRoute from '../../src/routes/api/v1/workspaces/[workspaceId]/air-pumps/+server';
import * as pumpRoute from '../../src/routes/api/v1/workspaces/[workspaceId]/air-pumps/[pumpId]/+server';
import { actions } from '../../src/routes/w/[workspaceId]/air-pumps/+page.server';
import { makeUser } from './fixtures';

// A workspace's own air pumps through the API routes and the page's form actions, against the real
// PostgreSQL of `npm test`. People, workspaces and pumps are invented.
const tag = `air-pumps-${Date.now()}`;
const ORIGIN = 'http://127.0.0.1';
const people: Record<string, SessionUser> = {};
let wsA = '';
let wsB = '';

/** A "60 L/min class" linear pump: 68 L/min at 9.7 kPa, 62 at 13.8, 51 at 20.7 (AIR-AND-WATER.md's sizing table). */
const SIXTY_CLASS = {
	name: 'Invented linear pump 60',
	points: [
		{ pressureKPa: 9.7, airLpm: 68 },
		{ pressureKPa: 13.8, airLpm: 62 },
		{ pressureKPa: 20.7, airLpm: 51 }
	],
	inputWatts: 51
};

beforeAll(async () => {
	for (const name of ['owner', 'editor', 'viewer', 'outsider'])
		people[name] = await makeUser(`${name}-${tag}@example.org`, name);
	wsA = await createWorkspace(`A ${tag}`, people.owner!.id);
	wsB = await createWorkspace(`B ${tag}`, people.outsider!.id);
	await db.insert(memberships).values([
		{ workspaceId: wsA, userId: people.editor!.id, role: 'editor' },
		{ workspaceId: wsA, userId: people.viewer!.id, role: 'viewer' }
	]);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

type Params = { workspaceId: string; pumpId?: string };

/** The request event a route sees for `who` calling `method` with a JSON body. */
function apiEvent(who: string, method: string, params: Params, body?: unknown) {
	const path = `/api/v1/workspaces/${params.workspaceId}/air-pumps${params.pumpId ? `/${params.pumpId}` : ''}`;
	const url = new URL(path, ORIGIN);
	const init: RequestInit = { method };
	if (body !== undefined) {
		init.body = JSON.stringify(body);
		init.headers = { 'content-type': 'application/json' };
	}
	return { locals: { user: people[who] }, params, url, request: new Request(url, init) } as never;
}

/** Runs a handler and answers its status and JSON, whether it returned or threw the guard's error. */
async function call(handler: (event: never) => Promise<Response> | Response, event: never) {
	try {
		const res = await handler(event);
		const text = await res.text();
		return { status: res.status, body: text ? JSON.parse(text) : null };
	} catch (thrown) {
		const status = (thrown as { status?: number }).status;
		if (status === undefined) throw thrown;
		return { status, body: null };
	}
}

function formEvent(who: string, workspaceId: string, fields: Record<string, string>) {
	const body = new FormData();
	for (const [key, value] of Object.entries(fields)) body.set(key, value);
	const url = new URL(`/w/${workspaceId}/air-pumps`, ORIGIN);
	return {
		locals: { user: people[who] },
		params: { workspaceId },
		url,
		request: new Request(url, { method: 'POST', body })
	} as never;
}

describe("a workspace's air pumps through the API", () => {
	let pumpId = '';

	it('an editor creates one, a viewer lists it, an editor replaces it and deletes it', async () => {
		const created = await call(listRoute.POST, apiEvent('editor', 'POST', { workspaceId: wsA }, SIXTY_CLASS));
		expect(created.status).toBe(201);
		expect(created.body).toMatchObject({ ...SIXTY_CLASS, wireToAirPercent: 25 });
		pumpId = created.body.id;

		const listed = await call(listRoute.GET, apiEvent('viewer', 'GET', { workspaceId: wsA }));
		expect(listed.status).toBe(200);
		expect(listed.body.airPumps).toEqual([{ id: pumpId, ...SIXTY_CLASS, wireToAirPercent: 25 }]);
		// The workspace's export carries its pumps with everything else it holds.
		expect((await exportWorkspace(wsA))?.airPumps.map((p) => p.pump.name)).toEqual([SIXTY_CLASS.name]);

		const changed = {
			...SIXTY_CLASS,
			name: 'Invented linear pump 60, checked',
			inputWatts: null,
			wireToAirPercent: 22
		};
		const put = await call(pumpRoute.PUT, apiEvent('editor', 'PUT', { workspaceId: wsA, pumpId }, changed));
		expect(put.status).toBe(200);
		expect(put.body).toEqual({ id: pumpId, ...changed });
		expect((await listAirPumps(wsA)).map((p) => p.pump.name)).toEqual(['Invented linear pump 60, checked']);

		const removed = await call(pumpRoute.DELETE, apiEvent('editor', 'DELETE', { workspaceId: wsA, pumpId }));
		expect(removed.status).toBe(204);
		expect(await listAirPumps(wsA)).toEqual([]);
		const again = await call(pumpRoute.GET, apiEvent('editor', 'GET', { workspaceId: wsA, pumpId }));
		expect(again.status).toBe(404);
	});

	it('refuses a viewer every write with 403 and leaves the pump as it was', async () => {
		const created = await call(listRoute.POST, apiEvent('owner', 'POST', { workspaceId: wsA }, SIXTY_CLASS));
		pumpId = created.body.id;
		const writes = [
			call(listRoute.POST, apiEvent('viewer', 'POST', { workspaceId: wsA }, SIXTY_CLASS)),
			call(
				pumpRoute.PUT,
				apiEvent('viewer', 'PUT', { workspaceId: wsA, pumpId }, { ...SIXTY_CLASS, name: 'x' })
			),
			call(pumpRoute.DELETE, apiEvent('viewer', 'DELETE', { workspaceId: wsA, pumpId }))
		];
		expect((await Promise.all(writes)).map((answer) => answer.status)).toEqual([403, 403, 403]);
		expect((await listAirPumps(wsA)).map((p) => p.pump.name)).toEqual([SIXTY_CLASS.name]);
	});

	it("answers 404 to another workspace's member, and to a pump asked for through the wrong workspace", async () => {
		const outsider = [
			call(listRoute.GET, apiEvent('outsider', 'GET', { workspaceId: wsA })),
			call(pumpRoute.GET, apiEvent('outsider', 'GET', { workspaceId: wsA, pumpId })),
			call(pumpRoute.DELETE, apiEvent('outsider', 'DELETE', { workspaceId: wsA, pumpId })),
			// The outsider's own workspace, naming A's pump: not found there.
			call(pumpRoute.PUT, apiEvent('outsider', 'PUT', { workspaceId: wsB, pumpId }, SIXTY_CLASS)),
			call(pumpRoute.DELETE, apiEvent('outsider', 'DELETE', { workspaceId: wsB, pumpId }))
		];
		expect((await Promise.all(outsider)).map((answer) => answer.status)).toEqual([404, 404, 404, 404, 404]);
		expect(await listAirPumps(wsA)).toHaveLength(1);
		expect(await listAirPumps(wsB)).toEqual([]);
	});

	it('answers bad points with field paths and worded messages', async () => {
		const falling = {
			...SIXTY_CLASS,
			points: [
				{ pressureKPa: 13.8, airLpm: 62 },
				{ pressureKPa: 9.7, airLpm: 68 }
			]
		};
		const cases: [unknown, { path: string; message: string }][] = [
			[
				falling,
				{ path: 'points.1.pressureKPa', message: 'Each pressure must be higher than the one before' }
			],
			[
				{ ...SIXTY_CLASS, points: [{ pressureKPa: 10, airLpm: 60 }] },
				{ path: 'points', message: 'Flow against pressure needs at least 2 entries' }
			],
			[
				{ ...SIXTY_CLASS, points: [{ pressureKPa: -1, airLpm: 60 }, { pressureKPa: 5 }] },
				{ path: 'points.0.pressureKPa', message: 'Pressure must be zero or more' }
			],
			[
				{ ...SIXTY_CLASS, name: '' },
				{ path: 'name', message: 'Pump name must not be empty' }
			]
		];
		for (const [body, issue] of cases) {
			const answer = await call(listRoute.POST, apiEvent('editor', 'POST', { workspaceId: wsA }, body));
			expect(answer.status).toBe(400);
			expect(answer.body.issues).toContainEqual(issue);
		}
		expect(await listAirPumps(wsA)).toHaveLength(1);
	});
});

describe("the air-pump page's form actions", () => {
	it('creates a pump from psi, converted to kPa', async () => {
		const answer = await actions.create(
			formEvent('editor', wsA, {
				name: 'Invented psi pump',
				pressureUnit: 'psi',
				'pressure.0': '1',
				'airLpm.0': '40',
				'pressure.1': '',
				'airLpm.1': '',
				'pressure.2': '2',
				'airLpm.2': '30',
				inputWatts: '',
				wireToAirPercent: '25'
			})
		);
		expect(answer).toMatchObject({ action: 'create', ok: true });
		const stored = (await listAirPumps(wsA)).find((p) => p.pump.name === 'Invented psi pump')!;
		// 1 psi = 6.894757 kPa (NIST SP 811, B.8: 1 lbf/in² = 6.894757e3 Pa).
		expect(stored.pump.points.map((p) => p.pressureKPa)).toEqual([
			expect.closeTo(6.894757, 5),
			expect.closeTo(13.789515, 5)
		]);
		expect(stored.pump.inputWatts).toBeNull();
	});

	it('puts each problem under the box it is about, in the unit typed, and keeps the values', async () => {
		const fields = {
			name: 'Invented bad pump',
			pressureUnit: 'psi',
			'pressure.0': '2',
			'airLpm.0': '40',
			'pressure.1': '100',
			'airLpm.1': 'lots',
			'pressure.3': '1',
			'airLpm.3': ''
		};
		const answer = (await actions.create(formEvent('editor', wsA, fields))) as unknown as {
			status: number;
			data: { errors: Record<string, string>; values: Record<string, string> };
		};
		expect(answer.status).toBe(400);
		expect(answer.data.errors).toEqual({
			'pressure.1': 'Pressure must be at most 43.5 psi',
			'airLpm.1': 'Air flow must be a number',
			'airLpm.3': 'Air flow is required'
		});
		expect(answer.data.values).toMatchObject(fields);
	});

	it('refuses a viewer with 403', async () => {
		const refused = await actions
			.create(formEvent('viewer', wsA, { name: 'x', pressureUnit: 'kPa' }))
			.catch((thrown: { status: number }) => thrown.status);
		expect(refused).toBe(403);
	});
});
