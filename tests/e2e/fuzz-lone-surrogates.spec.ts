import fc from 'fast-check';
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { parse } from 'devalue';
import { DEMO_WS, inventedTariff, signInWithPassword } from './helpers';

// Issue 14, item 11: a lone UTF-16 surrogate ("\uD800", half of an emoji) in a site name, device name
// or charge label was a 500 (PostgreSQL's jsonb refuses it). Each stored text field now refuses it
// beside the field, in words, through the JSON API and the forms that carry JSON.
const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; scenarios: { id: string }[] }[];
};
const site = demoSites.sites[0]!;
const scenario = site.scenarios[0]!.id;
const MESSAGE = /broken character/;

/** Ordinary text with one lone surrogate somewhere in it. */
const withLoneSurrogate = fc
	.tuple(
		fc.string({ maxLength: 20 }),
		fc.integer({ min: 0xd800, max: 0xdfff }).map((unit) => String.fromCharCode(unit)),
		fc.string({ maxLength: 20 })
	)
	.map(([before, half, after]) => `Pond ${before}${half}${after}`.slice(0, 60))
	.filter((text) => /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(text));

const device = (name: string) => ({ name, power: { watts: 100 }, schedule: { type: 'always' } });

/** Each case: the request that carries `text` in a stored field, and the field's path in the answer. */
const CASES: [string, string, (text: string, revision: number) => unknown, string][] = [
	[
		'POST',
		'/api/v1/sites',
		(t) => ({ workspaceId: DEMO_WS.id, name: t, country: 'US', currency: 'USD', timezone: 'UTC' }),
		'name'
	],
	[
		'PUT',
		`/api/v1/scenarios/${scenario}/equipment`,
		(t, r) => ({ expectedRevision: r, devices: [device(t)] }),
		'devices.0.name'
	],
	['PATCH', `/api/v1/scenarios/${scenario}`, (t) => ({ name: t }), 'name'],
	[
		'POST',
		'/api/v1/calculate',
		(t) => ({
			period: { start: '2027-01', months: 1 },
			timezone: 'UTC',
			tariff: { currency: 'USD', energyCharges: [{ label: t, type: 'flat', perKwh: 0.1 }] },
			equipment: [device('Pump')]
		}),
		'tariff.energyCharges.0.label'
	],
	[
		'POST',
		'/api/v1/tariffs',
		(t) => {
			const tariff = inventedTariff('Invented Power', 'Farm');
			tariff.structure.energyCharges[0]!.label = t;
			return { workspaceId: DEMO_WS.id, ...tariff };
		},
		'structure.energyCharges.0.label'
	],
	[
		'POST',
		`/api/v1/sites/${site.id}/bills`,
		(t) => ({ periodFrom: '2026-01-01', periodTo: '2026-01-31', kwh: 100, amount: 20, notes: t }),
		'notes'
	]
];

test('a lone surrogate in a stored text field of the JSON API is refused at the field, never a 500', async ({
	page
}) => {
	test.setTimeout(120_000);
	await signInWithPassword(page, 'editor@example.org');
	const listed = await page.request.get(`/api/v1/scenarios/${scenario}/equipment`);
	const { revision } = (await listed.json()) as { revision: number };
	for (const [method, path, bodyOf, field] of CASES) {
		await fc.assert(
			fc.asyncProperty(withLoneSurrogate, async (text) => {
				// JSON.stringify writes a lone surrogate as its \uXXXX escape, as a hostile client would.
				const res = await page.request.fetch(path, {
					method,
					headers: { 'content-type': 'application/json' },
					data: JSON.stringify(bodyOf(text, revision))
				});
				expect(res.status(), `${method} ${path}`).toBe(400);
				const { issues } = (await res.json()) as { issues: { path: string; message: string }[] };
				expect(issues.find((i) => i.path === field)?.message, `${method} ${path}`).toMatch(MESSAGE);
			}),
			{ numRuns: 8, seed: 20261203 }
		);
	}
});

test('a lone surrogate in the tariff editor’s JSON field is refused beside the field, never a 500', async ({
	page,
	baseURL
}) => {
	await signInWithPassword(page, 'editor@example.org');
	const tariff = inventedTariff('Invented Power', 'Farm \uD83D');
	const res = await page.request.post('/tariffs/new', {
		headers: { origin: baseURL!, 'x-sveltekit-action': 'true' },
		form: { owner: DEMO_WS.id, payload: JSON.stringify(tariff) }
	});
	const result = (await res.json()) as { type: string; status: number; data: string };
	expect(result.type).toBe('failure');
	expect(result.status).toBe(400);
	const data = parse(result.data) as { issues: { path: string; message: string }[] };
	expect(data.issues).toEqual([{ path: 'meta.name', message: expect.stringMatching(MESSAGE) }]);
});
