import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { tariffSchema } from '$lib/calc';
import { client, db } from '$lib/server/db';
import { memberships, tariffs } from '$lib/server/db/schema';
import { findTariff } from '$lib/server/tariffs/tariff.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { POST } from '../../src/routes/api/v1/tariffs/from-urdb/+server';
import { actions } from '../../src/routes/tariffs/open-data/+page.server';
import { makeUser } from './fixtures';

// One rate of the open rate database through POST /api/v1/tariffs/from-urdb and the import page's actions,
// against the real PostgreSQL of `npm test`. The rates are the public samples of tests/fixtures/urdb/ (their
// labels changed per run where they are saved, so runs and other tests never meet); people are invented.
const tag = `urdb-${Date.now()}`;
const ORIGIN = 'http://127.0.0.1';
const URL_API = new URL('/api/v1/tariffs/from-urdb', ORIGIN);
const fixture = (name: string) => readFileSync(`tests/fixtures/urdb/${name}`, 'utf8');
const rs1 = () => JSON.parse(fixture('fpl-rs1-2015.json'));
const people: Record<string, SessionUser> = {};
let wsA = '';
let ip = 0;

beforeAll(async () => {
	for (const name of ['owner', 'editor', 'viewer'])
		people[name] = await makeUser(`${name}-${tag}@example.org`, name);
	people.admin = await makeUser(`admin-${tag}@example.org`, 'admin', { isAdmin: true });
	wsA = await createWorkspace(`A ${tag}`, people.owner!.id);
	await db.insert(memberships).values([
		{ workspaceId: wsA, userId: people.editor!.id, role: 'editor' },
		{ workspaceId: wsA, userId: people.viewer!.id, role: 'viewer' }
	]);
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

/** The event the endpoint sees for an anonymous caller from its own address (each test's own budget). */
function apiEvent(init: RequestInit & { duplex?: 'half' }, address = `10.19.0.${++ip}`) {
	const request = new Request(URL_API, { method: 'POST', ...init });
	return { locals: {}, params: {}, url: URL_API, request, getClientAddress: () => address } as never;
}

async function post(body: unknown) {
	const res = await POST(apiEvent({ body: typeof body === 'string' ? body : JSON.stringify(body) }));
	return { status: res.status, body: await res.json() };
}

/** RS-1 with its tiers counted in kWh per kW of demand, which Runrate cannot price: refused with notes. */
function kwhPerKwRate() {
	const rate = rs1();
	const periods = rate.energyratestructure as Array<Array<Record<string, unknown>>>;
	return {
		...rate,
		energyratestructure: periods.map((tiers) => tiers.map((tier) => ({ ...tier, unit: 'kWh/kW' })))
	};
}

describe('POST /api/v1/tariffs/from-urdb', () => {
	it('answers FPL RS-1 with a tariff the tariff schema accepts, its provenance and its comments named (200)', async () => {
		const { status, body } = await post(rs1());
		expect(status).toBe(200);
		expect(tariffSchema.safeParse(body.tariff).success).toBe(true);
		// rate + adj per kWh, the first tier to 1,000 kWh (tests/fixtures/urdb/README.md, after NREL's parsers).
		expect(body.tariff.energyCharges[0].tiers[0].uptoKwh).toBe(1000);
		expect(body.meta).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service',
			sector: 'Residential',
			label: '5550d6fd5457a3187e8b4567',
			startDate: '2015-06-01',
			endDate: '2015-08-31'
		});
		// The rate's free-text comments are named, never silently dropped.
		expect(body.notes.map((note: { field: string }) => note.field)).toEqual(['energycomments']);
	});

	it('unwraps the database API answer of one rate: Georgia Power TOU-REO (200)', async () => {
		const { status, body } = await post(JSON.parse(fixture('georgia-power-tou-reo-2013.json')));
		expect(status).toBe(200);
		expect(body.tariff.energyCharges[0].type).toBe('tou');
		expect(body.meta.label).toBe('539f6d9eec4f024411ecb875');
	});

	it('answers malformed JSON with 400 and a sentence', async () => {
		const { status, body } = await post('{"label": "x",');
		expect(status).toBe(400);
		expect(body).toEqual({ error: 'invalid_json', message: 'The body is not valid JSON.' });
	});

	it('answers a declared 100 MB body with 413 without reading it', async () => {
		let pulled = 0;
		const stream = new ReadableStream({
			pull(controller) {
				pulled++;
				controller.enqueue(new Uint8Array(1024 * 1024));
				if (pulled === 100) controller.close();
			}
		});
		const res = await POST(
			apiEvent({ body: stream, duplex: 'half', headers: { 'content-length': String(100 * 1024 * 1024) } })
		);
		expect(res.status).toBe(413);
		expect((await res.json()).message).toBe('The body is over 2 MB.');
		expect(pulled).toBeLessThan(5);
	});

	it('stops reading an undeclared body past 2 MB (413)', async () => {
		let pulled = 0;
		const stream = new ReadableStream({
			pull(controller) {
				pulled++;
				controller.enqueue(new Uint8Array(512 * 1024).fill(32));
				if (pulled === 200) controller.close();
			}
		});
		const res = await POST(apiEvent({ body: stream, duplex: 'half' }));
		expect(res.status).toBe(413);
		expect(pulled).toBeLessThan(10);
	});

	it.each([
		['no rate in items', { items: [] }, '"items" holds no rate. Send the answer for one rate.'],
		['two rates in items', { items: [{}, {}] }, '"items" holds 2 rates; this import takes one at a time.']
	])('answers %s with 422 and a message saying so', async (_, body, message) => {
		const answer = await post(body);
		expect(answer).toEqual({ status: 422, body: { error: 'invalid_rate', message } });
	});

	it.each([
		[
			'a schedule month of 23 hours',
			(r: ReturnType<typeof rs1>) => (r.energyweekdayschedule[0] = r.energyweekdayschedule[0].slice(1)),
			{
				path: 'energyweekdayschedule.0',
				message: 'Weekday energy schedule, January: Each month must have 24 hours'
			}
		],
		[
			'a schedule of 11 months',
			(r: ReturnType<typeof rs1>) => r.energyweekendschedule.pop(),
			{ path: 'energyweekendschedule', message: 'Weekend energy schedule: A schedule must have 12 months' }
		],
		[
			'a period index out of range',
			(r: ReturnType<typeof rs1>) => (r.energyweekdayschedule[5][13] = 1),
			{
				path: 'energyweekdayschedule.5.13',
				message:
					'Weekday energy schedule, June, 13:00–14:00: Period 1 is not in the energy rate structure (it has 1)'
			}
		],
		[
			'a negative rate',
			(r: ReturnType<typeof rs1>) => (r.energyratestructure[0][0].rate = -0.07531),
			{
				path: 'energyratestructure.0.0.rate',
				message: 'Energy rate structure, period 1, tier 1: Rate must be zero or more'
			}
		],
		[
			'a NaN-like string',
			(r: ReturnType<typeof rs1>) => (r.energyratestructure[0][1].rate = 'NaN'),
			{
				path: 'energyratestructure.0.1.rate',
				message: 'Energy rate structure, period 1, tier 2: Rate must be a number'
			}
		],
		[
			'an Infinity-like string',
			(r: ReturnType<typeof rs1>) => (r.fixedmonthlycharge = 'Infinity'),
			{ path: 'fixedmonthlycharge', message: 'Fixed monthly charge: Fixed monthly charge must be a number' }
		]
	])('answers %s with 422 and the problem in words, saying where', async (_, spoil, issue) => {
		const rate = rs1();
		spoil(rate);
		const { status, body } = await post(rate);
		expect(status).toBe(422);
		expect(body).toEqual({
			error: 'invalid_rate',
			message: 'This rate has problems, so Runrate did not read it.',
			issues: [issue]
		});
	});

	it('refuses a rate it cannot price exactly with 422 and the notes, no tariff', async () => {
		const rate = kwhPerKwRate();
		const { status, body } = await post(rate);
		expect(status).toBe(422);
		expect(body.message).toBe('This rate cannot be priced exactly by Runrate');
		expect(body.tariff).toBeUndefined();
		expect(body.notes.map((n: { field: string }) => n.field)).toContain('energyratestructure');
	});

	it('answers 429 once an anonymous client passes the calculation API budget (60 a minute)', async () => {
		const statuses: number[] = [];
		for (let i = 0; i < 60; i++) statuses.push((await POST(apiEvent({ body: '{}' }, '10.19.255.1'))).status);
		expect(new Set(statuses)).toEqual(new Set([422]));
		const last = await POST(apiEvent({ body: '{}' }, '10.19.255.1'));
		expect(last.status).toBe(429);
		expect(last.headers.get('retry-after')).toBe('60');
	});
});

/** The event a form action sees for `who` posting `fields` (a File where one is uploaded). */
function formEvent(who: string | null, action: string, fields: Record<string, string | File>) {
	const body = new FormData();
	for (const [key, value] of Object.entries(fields)) body.set(key, value);
	const url = new URL(`/tariffs/open-data?/${action}`, ORIGIN);
	return {
		locals: { user: who ? people[who] : undefined },
		params: {},
		url,
		request: new Request(url, { method: 'POST', body }),
		getClientAddress: () => '10.19.1.1'
	} as never;
}

/** Runs an action: its failure (status, data), its redirect (status, location), or the guard's error status. */
async function act(name: 'read' | 'save', who: string | null, fields: Record<string, string | File>) {
	try {
		const out = (await actions[name](formEvent(who, name, fields))) as { status?: number; data?: unknown };
		return { status: out?.status ?? 200, data: (out?.data ?? out) as Record<string, unknown> };
	} catch (thrown) {
		const { status, location } = thrown as { status?: number; location?: string };
		if (status === undefined) throw thrown;
		return { status, location, data: {} as Record<string, unknown> };
	}
}

/** FPL RS-1 under a label of this run, so saves here never meet other runs or tests. */
const rs1Labelled = (label: string) => JSON.stringify({ ...rs1(), label });

describe('the import page saves through the tariff service', () => {
	it('reads a pasted rate and shows its preview, nothing saved', async () => {
		const label = `${tag}-read`;
		const read = await act('read', 'viewer', { json: rs1Labelled(label) });
		expect(read.status).toBe(200);
		expect(read.data.preview).toMatchObject({
			kind: 'converted',
			provenance: { label, startDate: '2015-06-01' }
		});
		expect(await db.select().from(tariffs).where(eq(tariffs.urdbLabel, label))).toEqual([]);
	});

	it('saves a private tariff with the label, the source, the dates and the chosen time zone', async () => {
		const label = `${tag}-private`;
		const saved = await act('save', 'editor', {
			json: rs1Labelled(label),
			owner: wsA,
			timezone: 'America/New_York'
		});
		expect(saved.status).toBe(303);
		const id = /\/tariffs\/([\w-]+)\?published=1$/.exec(saved.location!)![1]!;
		const found = await findTariff(id);
		expect(found!.tariff).toMatchObject({
			workspaceId: wsA,
			urdbLabel: label,
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service',
			customerClass: 'residential',
			country: 'US',
			currency: 'USD',
			timezone: 'America/New_York',
			holidays: null
		});
		expect(found!.versions).toHaveLength(1);
		expect(found!.versions[0]).toMatchObject({
			number: 1,
			effectiveFrom: '2015-06-01',
			effectiveTo: '2015-08-31',
			source: 'https://openei.org/apps/USURDB/rate/view/5550d6fd5457a3187e8b4567'
		});
		expect(tariffSchema.parse(found!.versions[0]!.structure).energyCharges).toHaveLength(1);

		// Reading it again shows where the person's library holds it; someone outside the workspace sees none.
		const readAgain = await act('read', 'viewer', { json: rs1Labelled(label) });
		expect(readAgain.data.copies).toEqual([{ id, name: 'RS-1 Residential Service', isPublic: false }]);
		expect((await act('read', 'admin', { json: rs1Labelled(label) })).data.copies).toEqual([]);

		// The same label in the same workspace: a message and a link to the one there, no second copy.
		const again = await act('save', 'owner', {
			json: rs1Labelled(label),
			owner: wsA,
			timezone: 'America/Chicago'
		});
		expect(again.status).toBe(409);
		expect(again.data.existing).toEqual({ id, name: 'RS-1 Residential Service' });
		expect(String((again.data.errors as Record<string, string>).json)).toContain('already in this workspace');
		const rows = await db
			.select({ id: tariffs.id })
			.from(tariffs)
			.where(and(eq(tariffs.urdbLabel, label), eq(tariffs.workspaceId, wsA)));
		expect(rows).toEqual([{ id }]);
	});

	it('refuses a viewer (403), a non-member (404) and a caller signed out (401), saving nothing', async () => {
		const label = `${tag}-refused`;
		const fields = { json: rs1Labelled(label), owner: wsA, timezone: 'America/New_York' };
		expect((await act('save', 'viewer', fields)).status).toBe(403);
		expect((await act('save', 'admin', fields)).status).toBe(404);
		expect((await act('save', null, fields)).status).toBe(401);
		expect((await act('save', 'editor', { ...fields, owner: 'public' })).status).toBe(403);
		expect(await db.select().from(tariffs).where(eq(tariffs.urdbLabel, label))).toEqual([]);
	});

	it('lets an admin save a public tariff once per label', async () => {
		const label = `${tag}-public`;
		const fields = { json: rs1Labelled(label), owner: 'public', timezone: 'America/New_York' };
		const saved = await act('save', 'admin', fields);
		expect(saved.status).toBe(303);
		const again = await act('save', 'admin', fields);
		expect(again.status).toBe(409);
		expect(String((again.data.errors as Record<string, string>).json)).toContain(
			'already in the public library'
		);
		const rows = await db
			.select({ ws: tariffs.workspaceId })
			.from(tariffs)
			.where(eq(tariffs.urdbLabel, label));
		expect(rows).toEqual([{ ws: null }]);
	});

	it('needs a time zone, and reads an uploaded .json file', async () => {
		const label = `${tag}-file`;
		const file = new File([rs1Labelled(label)], 'rate.json', { type: 'application/json' });
		const missing = await act('save', 'editor', { file, json: '', owner: wsA, timezone: '' });
		expect(missing.status).toBe(400);
		expect(Object.keys(missing.data.errors as object)).toEqual(['timezone']);
		const saved = await act('save', 'editor', { file, json: '', owner: wsA, timezone: 'America/Phoenix' });
		expect(saved.status).toBe(303);
	});

	it('answers bad JSON, a wrong file and a refused rate at their fields, saving nothing', async () => {
		const bad = await act('read', 'editor', { json: '{"label": ' });
		expect(bad.status).toBe(400);
		expect(bad.data.errors).toEqual({ json: expect.stringContaining('not valid JSON') });
		const wrongFile = await act('read', 'editor', { file: new File(['x'], 'rate.csv'), json: '' });
		expect(wrongFile.data.errors).toEqual({ file: 'The file must end in .json.' });
		const label = `${tag}-demand`;
		const refusedRate = JSON.stringify({ ...kwhPerKwRate(), label });
		const refused = await act('save', 'editor', {
			json: refusedRate,
			owner: wsA,
			timezone: 'America/New_York'
		});
		expect(refused.status).toBe(422);
		expect(refused.data.errors).toEqual({ json: 'This rate cannot be priced exactly by Runrate' });
		expect(await db.select().from(tariffs).where(eq(tariffs.urdbLabel, label))).toEqual([]);
	});
});
