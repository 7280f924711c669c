import fc from 'fast-check';
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_WS, signInWithPassword } from './helpers';

// Hostile JSON against the JSON endpoints: random values, boundary numbers, NaN-like strings, deep
// nesting, long and unicode strings, wrong types. The answer is never a 500 and never a stack trace.
const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; scenarios: { id: string }[] }[];
};
const site = demoSites.sites[0]!;

const nasty = fc.oneof(
	fc.constantFrom(
		1e308,
		-1e308,
		-0,
		Number.MAX_SAFE_INTEGER + 2,
		'NaN',
		'Infinity',
		'-0',
		'1e999',
		'',
		'\u0000',
		'💧'.repeat(500)
	),
	fc.string({ maxLength: 3000 }),
	fc.double(),
	fc.integer()
);
const deep = (depth: number): unknown => (depth === 0 ? 1 : { a: [deep(depth - 1)] });
const body = fc.oneof(
	fc.anything({ maxDepth: 4, withNullPrototype: false }),
	fc.dictionary(
		fc.constantFrom(
			'period',
			'tariff',
			'equipment',
			'scenarios',
			'periodFrom',
			'periodTo',
			'kwh',
			'amount',
			'devices',
			'expectedRevision',
			'name',
			'temperatureC',
			'waterFlow',
			'demand',
			'points'
		),
		nasty
	),
	fc.constant(deep(200))
);

const ENDPOINTS = [
	['POST', '/api/v1/calculate'],
	['POST', '/api/v1/compare'],
	['POST', '/api/v1/pumping'],
	['POST', '/api/v1/airlift'],
	['POST', '/api/v1/aeration'],
	['POST', `/api/v1/workspaces/${DEMO_WS.id}/air-pumps`],
	['POST', '/api/v1/sites'],
	['POST', `/api/v1/sites/${site.id}/bills`],
	['POST', `/api/v1/sites/${site.id}/scenarios`],
	['PUT', `/api/v1/scenarios/${site.scenarios[0]!.id}/equipment`],
	['POST', '/api/v1/tariffs'],
	['POST', '/api/v1/tariffs/from-urdb']
] as const;

test('hostile JSON never gets a 500 or a stack trace from any JSON endpoint', async ({ page }) => {
	test.setTimeout(120_000);
	// An editor's requests reach validation. 25 runs × 11 endpoints stay well inside a member's 600 a minute.
	await signInWithPassword(page, 'editor@example.org');
	for (const [method, path] of ENDPOINTS) {
		await fc.assert(
			fc.asyncProperty(body, async (data) => {
				const res = await page.request.fetch(path, {
					method,
					headers: { 'content-type': 'application/json' },
					data: JSON.stringify(data)
				});
				const text = await res.text();
				expect(res.status(), `${method} ${path}`).toBeLessThan(500);
				expect(text).not.toMatch(/\n\s+at .+\(.+:\d+:\d+\)/);
				if (res.status() === 400) expect(JSON.parse(text)).toHaveProperty('message');
			}),
			{ numRuns: 25, seed: 20261202 }
		);
	}
});

// Values JavaScript holds and PostgreSQL cannot store, found by the form fuzz: each is refused with a
// field path instead of failing at the database.
test('U+0000 in text and revisions past a database integer are refused with field paths', async ({
	page
}) => {
	await signInWithPassword(page, 'editor@example.org');
	const scenario = site.scenarios[0]!.id;
	const listed = await page.request.get(`/api/v1/scenarios/${scenario}/equipment`);
	const { revision } = (await listed.json()) as { revision: number };
	const cases: [string, string, unknown, string][] = [
		[
			'PUT',
			`/api/v1/scenarios/${scenario}/equipment`,
			{
				expectedRevision: revision,
				devices: [{ name: 'Pump\u0000', power: { watts: 100 }, schedule: { type: 'always' } }]
			},
			'devices.0.name'
		],
		[
			'PUT',
			`/api/v1/scenarios/${scenario}/equipment`,
			{ expectedRevision: 2 ** 31, devices: [] },
			'expectedRevision'
		],
		[
			'POST',
			'/api/v1/calculate',
			{
				period: { start: '2027-01', months: 1 },
				timezone: 'America/Chicago',
				tariff: { currency: 'USD', energyCharges: [{ label: 'Energy\u0000', type: 'flat', perKwh: 0.1 }] },
				equipment: [{ name: 'Pump', power: { watts: 100 }, schedule: { type: 'always' } }]
			},
			'tariff.energyCharges.0.label'
		]
	];
	for (const [method, path, data, field] of cases) {
		const res = await page.request.fetch(path, { method, data });
		expect(res.status(), `${method} ${path} ${field}`).toBe(400);
		const body = (await res.json()) as { issues?: { path: string }[] };
		expect(body.issues?.map((issue) => issue.path)).toContain(field);
	}
});
