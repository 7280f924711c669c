import fc from 'fast-check';
// SvelteKit's own encoding of an action's result (what use:enhance's deserialize reads).
import { parse } from 'devalue';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { expect, test, type APIRequestContext, type APIResponse } from '@playwright/test';
import { readdirSync, readFileSync } from 'node:fs';
import { inventedTariff, signInWithPassword } from './helpers';

// Hostile form posts against every form action, as use:enhance sends them: each post starts from values
// the action accepts and swaps some for random and boundary ones (huge numbers, negative zero, NaN-like
// and empty strings, control characters, long unicode, a file where text belongs), adds random fields,
// and for uploads sends random files and sheets. The answer is never a 500 and never a stack trace; a
// refusal is a 4xx whose errors are keyed by field.
//
// The demo data stays whole for the specs that run after this one: every action that changes or deletes
// something aims at objects made here (a workspace of the owner's and a site, scenario, bill and private
// tariff in it). The exceptions are written beside their targets.

const OWNER = 'owner@example.org';
const OWNER_ID = 'demo-user-owner';
/** Long enough to be looked up, and no invitation has it. */
const NO_INVITATION = 'fuzz-no-such-invitation-token-0000';
const PASSWORD = 'fuzz password 123';
const WORKSPACE_NAME = 'Fuzz throwaway workspace (invented)';
const publicTariff = (
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string }[] }
).tariffs[0]!.id;

/** FPL RS-1 (a public record of the open rate database, tests/fixtures/urdb/) under a label of this run. */
const URDB_RATE = JSON.stringify({
	...JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8')),
	label: `fuzz-${Date.now()}`
});

let owner: APIRequestContext;
let admin: APIRequestContext;
const made = { workspace: '', site: '', scenario: '', bill: '', tariff: '', airPump: '' };
const sheets = { bills: '', equipment: '', tariffs: '', xlsx: [] as Buffer[] };

type Entry = [string, string | FilePart];
type FilePart = { name: string; mimeType: string; bytes: Uint8Array };
type Target = {
	path: () => string;
	/** The fields the action reads, each with a value it accepts (undefined: usually left out). */
	fields: () => Record<string, string | undefined>;
	/** The field an upload action reads its file from, and a sheet it accepts. */
	file?: { field: string; sheet: () => string };
	/** Makes a post harmless where a random value could do real damage (see each use). */
	tame?: (entries: Entry[]) => Entry[];
	/** Fewer posts where each one is slow. */
	runs?: number;
	/** Posted by the platform admin (admin@example.org) instead of the owner: an admin-only action. */
	admin?: boolean;
};

/** No value is a deliverable address: a valid one would send mail and spend the per-client sign-in,
 * sign-up, mail-link and invitation budgets that sign-in.spec, workspace.spec and sites.spec need. */
const noAddress = (entries: Entry[]): Entry[] =>
	entries.map(([k, v]) => [k, typeof v === 'string' ? v.replaceAll('@', '＠') : v]);

/** An air design the action accepts (invented pump table), sent against a stale revision. */
const FUZZ_DESIGN = {
	airlifts: [
		{
			name: 'Fuzz air-lift (invented)',
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
	pump: {
		name: 'Fuzz pump (invented)',
		points: [
			{ pressureKPa: 0, airLpm: 60 },
			{ pressureKPa: 20, airLpm: 30 }
		]
	}
};
const ws = () => `/w/${made.workspace}`;
const site = () => `/sites/${made.site}`;
const bill = () => ({
	periodFrom: '2025-03-01',
	periodTo: '2025-03-31',
	kwh: '1200',
	amount: '180.5',
	peakKw: '',
	lineItems: 'Energy | 170.50\nCustomer charge | 10',
	notes: 'Invented by the fuzz test',
	confirmOverlap: 'yes'
});
/** An air pump's data sheet as its form posts it; `points` names the rows together (too few, too many). */
const pumpFields = () => ({
	name: 'Fuzz air pump (invented)',
	pressureUnit: 'psi',
	'pressure.0': '1',
	'airLpm.0': '70',
	'pressure.1': '2',
	'airLpm.1': '62',
	'pressure.2': '3',
	'airLpm.2': '50',
	inputWatts: '45',
	wireToAirPercent: '25',
	points: undefined
});
const siteFields = () => ({
	name: 'Fuzz site (invented)',
	address: 'Fuzz Lane, Example County (invented)',
	timezone: 'America/Chicago',
	country: 'US',
	region: 'IL',
	supplyVolts: '240',
	supplyPhases: '1',
	tariffId: made.tariff,
	tariffVersion: '1',
	currency: 'USD',
	notes: '',
	// The site's water: one tank whose temperature varies by month (invented).
	altitudeM: '250',
	'tanks.0.id': 'fuzztank1',
	'tanks.0.name': 'Fuzz grow-out (invented)',
	'tanks.0.volume': '1000',
	'tanks.0.volumeUnit': 'L',
	'tanks.0.depth': '1.2',
	'tanks.0.depthUnit': 'm',
	'tanks.0.water': 'fresh',
	'tanks.0.salinityGPerKg': '',
	// Read only while the months are off (a swapped switch): then it is the one temperature.
	'tanks.0.temperatureC': '18',
	'tanks.0.byMonth': 'on',
	...Object.fromEntries(
		Array.from({ length: 12 }, (_, m) => [`tanks.0.monthlyTemperatureC.${m}`, String(14 + (m % 6))])
	),
	'tanks.0.fishKg': '40',
	'tanks.0.feedKgPerDay': '0.8',
	'tanks.0.proteinPercent': '40'
});

// In the order they run: the scenario import before the scenario can be deleted, a bill's update before
// its delete, the workspace's deletion, then its restore.
const TARGETS: Record<string, Target> = {
	'/sites/[siteId]/scenarios/[scenarioId]/import': {
		path: () => `${site()}/scenarios/${made.scenario}/import`,
		fields: () => ({
			intent: 'import',
			mode: 'replace',
			skipRefused: 'on',
			expectedRevision: '0',
			'map.name': undefined,
			'map.watts': undefined
		}),
		file: { field: 'sheet', sheet: () => sheets.equipment }
	},
	// A stale revision: the details are checked in full and then refused as changed by someone else.
	'/sites/[siteId]/scenarios/[scenarioId]?/details': {
		path: () => `${site()}/scenarios/${made.scenario}?/details`,
		fields: () => ({
			revision: '0',
			name: 'Fuzz scenario (invented)',
			description: 'Invented by the fuzz test',
			status: 'proposed',
			tariffId: '',
			'oneOffCosts.0.label': 'Fuzz trench (invented)',
			'oneOffCosts.0.amount': '250',
			'oneOffCosts.0.note': ''
		})
	},
	// A stale revision: the design is checked in full and then refused as changed by someone else.
	'/sites/[siteId]/scenarios/[scenarioId]?/airDesign': {
		path: () => `${site()}/scenarios/${made.scenario}?/airDesign`,
		fields: () => ({ revision: '0', design: JSON.stringify(FUZZ_DESIGN) })
	},
	'/sites/[siteId]/bills?/add': { path: () => `${site()}/bills?/add`, fields: bill },
	'/sites/[siteId]/bills?/import': {
		path: () => `${site()}/bills?/import`,
		fields: () => ({}),
		file: { field: 'sheet', sheet: () => sheets.bills }
	},
	'/sites/[siteId]/bills/[billId]?/update': {
		path: () => `${site()}/bills/${made.bill}?/update`,
		fields: () => ({ ...bill(), expectedRevision: '0' })
	},
	// The first post deletes the throwaway bill; the rest find it gone (404).
	'/sites/[siteId]/bills/[billId]?/delete': {
		path: () => `${site()}/bills/${made.bill}?/delete`,
		fields: () => ({})
	},
	'/sites/[siteId]/usage?/import': {
		path: () => `${site()}/usage?/import`,
		fields: () => ({}),
		file: { field: 'file', sheet: () => 'timestamp,kWh,seconds\n2026-01-01T00:00:00Z,1.5,900' },
		// Each upload is read in a worker thread of its own, which takes most of a second to start.
		runs: 10
	},
	'/sites/[siteId]/edit': {
		path: () => `${site()}/edit`,
		fields: () => ({ ...siteFields(), revision: '0' })
	},
	'/sites/[siteId]?/share': {
		path: () => `${site()}?/share`,
		fields: () => ({ email: 'guest@example.org', role: 'viewer' }),
		tame: noAddress
	},
	'/sites/[siteId]?/unshare': { path: () => `${site()}?/unshare`, fields: () => ({ userId: OWNER_ID }) },
	'/sites/[siteId]?/create': {
		path: () => `${site()}?/create`,
		fields: () => ({ name: 'Fuzz scenario', description: 'Invented', fromId: made.scenario })
	},
	'/sites/[siteId]?/baseline': {
		path: () => `${site()}?/baseline`,
		fields: () => ({ scenarioId: made.scenario })
	},
	'/sites/[siteId]?/archive': {
		path: () => `${site()}?/archive`,
		fields: () => ({ scenarioId: made.scenario, undo: undefined })
	},
	'/sites/[siteId]?/delete': {
		path: () => `${site()}?/delete`,
		fields: () => ({ scenarioId: made.scenario, undo: undefined, confirm: 'yes' })
	},
	'/w/[workspaceId]/sites/new': { path: () => `${ws()}/sites/new`, fields: siteFields },
	// Pumps of the throwaway workspace; valid posts add pumps until its 100 are reached (then 409).
	'/w/[workspaceId]/air-pumps?/create': {
		path: () => `${ws()}/air-pumps?/create`,
		fields: () => pumpFields()
	},
	'/w/[workspaceId]/air-pumps?/update': {
		path: () => `${ws()}/air-pumps?/update`,
		fields: () => ({ ...pumpFields(), pumpId: made.airPump })
	},
	// The first valid post deletes the throwaway pump; the rest find it gone (404).
	'/w/[workspaceId]/air-pumps?/delete': {
		path: () => `${ws()}/air-pumps?/delete`,
		fields: () => ({ pumpId: made.airPump })
	},
	// The public tariff is only read; its copies land in the throwaway workspace.
	'/tariffs/[tariffId]?/copy': {
		path: () => `/tariffs/${publicTariff}?/copy`,
		fields: () => ({ workspaceId: made.workspace })
	},
	'/tariffs/[tariffId]/edit': {
		path: () => `/tariffs/${made.tariff}/edit`,
		fields: () => ({ payload: JSON.stringify(submission()) })
	},
	'/tariffs/new': {
		path: () => '/tariffs/new',
		fields: () => ({ owner: made.workspace, payload: JSON.stringify(submission()) })
	},
	// The admin's bulk import: a valid post queues a job that reads the (hostile) file and reports on it.
	'/admin/urdb-import?/start': {
		path: () => '/admin/urdb-import?/start',
		fields: () => ({
			sectors: 'Residential',
			utilityContains: 'Fuzz Utility (invented)',
			timezone: 'America/Chicago',
			uploadId: undefined,
			parts: undefined,
			fileName: undefined
		}),
		file: { field: 'file', sheet: () => '[]' },
		admin: true,
		runs: 15
	},
	'/tariffs/import': {
		path: () => '/tariffs/import',
		fields: () => ({ owner: made.workspace, intent: 'import' }),
		file: { field: 'sheet', sheet: () => sheets.tariffs }
	},
	// The first valid save imports the sample into the throwaway workspace; the rest meet its label (409).
	'/tariffs/open-data?/read': {
		path: () => '/tariffs/open-data?/read',
		fields: () => ({ json: URDB_RATE }),
		file: { field: 'file', sheet: () => URDB_RATE }
	},
	'/tariffs/open-data?/save': {
		path: () => '/tariffs/open-data?/save',
		fields: () => ({
			json: URDB_RATE,
			owner: made.workspace,
			timezone: 'America/New_York',
			effectiveFrom: undefined
		})
	},
	// Valid names make workspaces of the owner's; nothing in the demo workspace changes.
	'/workspaces?/create': {
		path: () => '/workspaces?/create',
		fields: () => ({ name: 'Fuzz workspace (invented)' })
	},
	'/w/[workspaceId]?/rename': { path: () => `${ws()}?/rename`, fields: () => ({ name: WORKSPACE_NAME }) },
	'/w/[workspaceId]?/invite': {
		path: () => `${ws()}?/invite`,
		fields: () => ({ email: 'invitee@example.org', role: 'viewer' }),
		tame: noAddress
	},
	// The owner is the throwaway workspace's only member: demoting or removing them is refused (409).
	'/w/[workspaceId]?/changeRole': {
		path: () => `${ws()}?/changeRole`,
		fields: () => ({ userId: OWNER_ID, role: 'viewer' })
	},
	'/w/[workspaceId]?/remove': { path: () => `${ws()}?/remove`, fields: () => ({ userId: OWNER_ID }) },
	'/w/[workspaceId]?/revoke': {
		path: () => `${ws()}?/revoke`,
		fields: () => ({ invitationId: '00000000-0000-4000-8000-000000000000' })
	},
	'/w/[workspaceId]?/leave': { path: () => `${ws()}?/leave`, fields: () => ({}) },
	'/w/[workspaceId]?/delete': {
		path: () => `${ws()}?/delete`,
		fields: () => ({ confirmName: WORKSPACE_NAME })
	},
	'/w/[workspaceId]?/restore': { path: () => `${ws()}?/restore`, fields: () => ({}) },
	// Never the owner's own address (not as the accepted value, and noAddress leaves none among the
	// hostile ones), so the owner's account is never deleted.
	'/account?/delete': {
		path: () => '/account?/delete',
		fields: () => ({ confirmEmail: 'not-the-owner@example.org' }),
		tame: noAddress
	},
	'/signin?/password': {
		path: () => '/signin?/password',
		fields: () => ({ email: OWNER, password: PASSWORD, next: '/workspaces' }),
		tame: noAddress
	},
	'/signin?/link': {
		path: () => '/signin?/link',
		fields: () => ({ email: OWNER, next: '/workspaces' }),
		tame: noAddress
	},
	'/signup': {
		path: () => '/signup',
		fields: () => ({ name: 'Fuzz Grower', email: 'new@example.org', password: PASSWORD, confirm: PASSWORD }),
		tame: noAddress
	},
	'/forgot': { path: () => '/forgot', fields: () => ({ email: OWNER }), tame: noAddress },
	'/reset': {
		path: () => '/reset',
		fields: () => ({ token: 'fuzz-no-such-reset-token-0000', password: PASSWORD, confirm: PASSWORD })
	},
	'/signup/confirm': {
		path: () => '/signup/confirm',
		fields: () => ({ token: 'fuzz-no-such-confirmation-token-0000', password: PASSWORD })
	},
	'/invite/[token]?/accept': { path: () => `/invite/${NO_INVITATION}?/accept`, fields: () => ({}) },
	// Its passwords never match: a valid join spends the per-client sign-up budget other specs need.
	'/invite/[token]?/join': {
		path: () => `/invite/${NO_INVITATION}?/join`,
		fields: () => ({ name: 'Fuzz Grower', password: PASSWORD, confirm: PASSWORD }),
		tame: (entries) => entries.map(([k, v]) => [k, k === 'confirm' && typeof v === 'string' ? `${v}≠` : v])
	}
};
const SKIPPED: Record<string, string> = {
	'/signout': 'it ends the owner’s session, which every later post needs',
	'/account?/signOutEverywhere': 'it ends every session of the owner, which every later post needs'
};

/** Every form action under src/routes: `route?/name`, or `route` for a default action. */
function formActions(dir = 'src/routes', prefix = ''): string[] {
	const entries = readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name));
	const route = prefix || '/';
	const here = entries.some((e) => e.name === '+page.server.ts')
		? actionNames(`${dir}/+page.server.ts`).map((name) => (name === 'default' ? route : `${route}?/${name}`))
		: [];
	return [
		...here,
		...entries
			.filter((e) => e.isDirectory())
			.flatMap((e) =>
				formActions(`${dir}/${e.name}`, /^\(.*\)$/.test(e.name) ? prefix : `${prefix}/${e.name}`)
			)
	];
}

function actionNames(file: string): string[] {
	const source = readFileSync(file, 'utf8');
	if (!source.includes('export const actions')) return [];
	const block = /export const actions = \{\n([\s\S]*?)\n\} satisfies Actions;/.exec(source)?.[1];
	if (!block) throw new Error(`${file}: cannot read the action names of its \`export const actions\``);
	return [...block.matchAll(/^\t(\w+)\s*:/gm)].map((m) => m[1]!);
}

// Hostile values: boundary numbers, NaN-like and empty strings, control characters, long and unicode
// text, injection-shaped text; and values some check accepts (ids of the objects made here, dates,
// roles), so a post can pass one check with a value meant for another.
const nasty = () =>
	fc.oneof(
		fc.constantFrom('1e308', '-1e308', '-0', '0', '-1', '9007199254740993', '0.1e-400', '1e999', '0x1F'),
		fc.constantFrom('NaN', 'Infinity', '-Infinity', '', ' ', '\u0000', 'a\u0000b', '\u202e\ufeff', '1,5'),
		fc.constantFrom('null', '[]', '{}', '__proto__', 'constructor', '=1+1', "'; drop table x; --", '\r\n'),
		fc.constantFrom('💧'.repeat(500), 'é'.repeat(5000), 'x'.repeat(100_000), JSON.stringify(deep(200))),
		fc.string({ maxLength: 3000 }),
		fc.string({ unit: 'binary', maxLength: 200 }),
		fc.string({ unit: fc.constantFrom('\u0000', '\u001f', '\u007f', '\u2028', '\ud800', 'a'), maxLength: 8 }),
		fc.double().map(String),
		fc.integer().map(String),
		fc.uuid()
	);
const plausible = () =>
	fc.constantFrom(
		...['2026-01-01', '2026-01-31', '2024-02-29', '2026-02-29', '0000-01-01', '9999-12-31', '1970-01-01'],
		...['12.5', '100000000', '2147483648', 'owner', 'editor', 'viewer', 'yes', 'on', 'append', 'import'],
		...['public', 'America/Chicago', 'Etc/GMT+14', 'US', 'CA', 'ID', 'USD', 'Energy | 1e308\nDemand ; -0'],
		...[made.workspace, made.site, made.scenario, made.bill, made.tariff, OWNER_ID, WORKSPACE_NAME]
	);
function deep(depth: number): unknown {
	return depth === 0 ? 1 : { a: [deep(depth - 1)] };
}
const hostile = () => fc.oneof({ weight: 3, arbitrary: nasty() }, { weight: 1, arbitrary: plausible() });

/** The tariff editor's JSON with one value swapped for a hostile one, so it reaches the tariff schema. */
const hostilePayload = () =>
	fc
		.tuple(
			fc.nat(),
			fc.oneof(
				nasty(),
				fc.double(),
				fc.integer(),
				fc.constantFrom(null, 2 ** 31, 1e15),
				fc.anything({ maxDepth: 2 })
			)
		)
		.map(([at, value]) => {
			const copy = submission();
			const slots: [Record<string, unknown>, string][] = [];
			const walk = (node: unknown) => {
				if (node && typeof node === 'object')
					for (const [key, child] of Object.entries(node)) {
						slots.push([node as Record<string, unknown>, key]);
						walk(child);
					}
			};
			walk(copy);
			const [parent, key] = slots[at % slots.length]!;
			parent[key] = value;
			return JSON.stringify(copy);
		});

/** A CSV of the template's header, some of its example rows and rows of hostile cells. */
const csvOf = (template: string) => {
	const [header = '', ...examples] = template.trim().split(/\r?\n/);
	const width = header.split(',').length;
	const cell = hostile().map((v) => `"${v.slice(0, 500).replaceAll('"', '""')}"`);
	return fc
		.tuple(fc.subarray(examples), fc.array(fc.array(cell, { maxLength: width + 1 }), { maxLength: 4 }))
		.map(([kept, rows]) => [header, ...kept, ...rows.map((r) => r.join(','))].join('\n'));
};
/** A file as an upload sends it: sheets under sheet names, and random bytes under any name. */
const fileOf = (sheet: string): fc.Arbitrary<FilePart> => {
	const named = (names: string[], bytes: fc.Arbitrary<Uint8Array>) =>
		fc.record({ name: fc.constantFrom(...names), mimeType: fc.constantFrom('text/csv', ''), bytes });
	return fc.oneof(
		named(
			['fuzz.csv', 'FUZZ.CSV', '💧.csv'],
			csvOf(sheet).map((s) => new TextEncoder().encode(s))
		),
		named(['fuzz.xlsx'], fc.constantFrom(...sheets.xlsx)),
		named(
			['fuzz.csv', 'fuzz.xlsx', 'fuzz.xml', 'fuzz.pdf', 'fuzz', ''],
			fc.oneof(
				fc.uint8Array({ maxLength: 4096 }),
				fc.uint8Array({ maxLength: 2048 }).map((b) => new Uint8Array([0x50, 0x4b, 0x03, 0x04, ...b])),
				fc.constant(new TextEncoder().encode(`<?xml version="1.0"?><feed>${'<entry>'.repeat(5000)}</feed>`)),
				fc.constant(new Uint8Array(0))
			)
		)
	);
};

const asFile = (sheet: string): FilePart => ({
	name: 'fuzz.csv',
	mimeType: 'text/csv',
	bytes: new TextEncoder().encode(sheet)
});

/**
 * A post: the target's accepted values with one (or up to three) swapped for hostile ones (a file where text
 * belongs, in a multipart post) and maybe one left out, a few random fields, all in shuffled order.
 */
function bodyOf(target: Target) {
	const upload = target.file;
	const accepted = target.fields();
	const names = [...Object.keys(accepted), ...(upload ? [upload.field] : [])];
	const keep = (field: string): fc.Arbitrary<string | FilePart | undefined> =>
		field === upload?.field
			? fc.oneof(fc.constant(asFile(upload.sheet())), fileOf(upload.sheet()))
			: fc.constant(accepted[field]);
	const swap = (field: string): fc.Arbitrary<string | FilePart> =>
		field === 'payload'
			? fc.oneof(hostile(), hostilePayload())
			: upload
				? fc.oneof({ weight: 4, arbitrary: hostile() }, { weight: 1, arbitrary: fileOf('') })
				: hostile();
	const name = fc.oneof(
		fc.string({ maxLength: 30 }),
		fc.constantFrom('__proto__', 'constructor', '', 'a'.repeat(1000), ...names)
	);
	return fc
		.record({
			kept: fc.record(Object.fromEntries(names.map((f) => [f, keep(f)]))),
			swapped: fc.record(Object.fromEntries(names.map((f) => [f, swap(f)]))),
			// Mostly one field at a time, so the others' checks pass and the hostile value goes all the way.
			which: names.length
				? fc.oneof(
						{ weight: 3, arbitrary: fc.constantFrom(...names).map((n) => [n]) },
						{ weight: 1, arbitrary: fc.subarray(names, { maxLength: Math.min(3, names.length) }) }
					)
				: fc.constant<string[]>([]),
			dropped: fc.subarray(names, { maxLength: Math.min(1, names.length) }),
			extra: fc.array(fc.tuple(name, hostile()), { maxLength: 3 }),
			multipart: fc.boolean()
		})
		.chain(({ kept, swapped, which, dropped, extra, multipart }) => {
			const entries: Entry[] = [...extra];
			for (const field of names) {
				const value = which.includes(field)
					? swapped[field]
					: dropped.includes(field)
						? undefined
						: kept[field];
				if (value !== undefined) entries.push([field, value]);
			}
			return fc.shuffledSubarray(entries, { minLength: entries.length }).map((shuffled) => ({
				entries: target.tame ? target.tame(shuffled) : shuffled,
				multipart: !!upload || multipart
			}));
		});
}

async function post(
	path: string,
	entries: Entry[],
	multipart: boolean,
	origin: string,
	as = owner
): Promise<APIResponse> {
	const headers = { origin, 'x-sveltekit-action': 'true' };
	if (!multipart) {
		const form = new URLSearchParams(entries.map(([k, v]) => [k, typeof v === 'string' ? v : v.name]));
		return as.post(path, {
			headers: { ...headers, 'content-type': 'application/x-www-form-urlencoded' },
			data: form.toString(),
			maxRedirects: 0
		});
	}
	const form = new FormData();
	for (const [k, v] of entries)
		form.append(
			k,
			typeof v === 'string' ? v : new File([new Uint8Array(v.bytes)], v.name, { type: v.mimeType })
		);
	return as.post(path, { headers, multipart: form, maxRedirects: 0 });
}

// A stack frame ("    at fn (file:1:2)"), an error naming a source file, or a dependency's path.
const LEAKS = [
	/(?:^|\n|\\n)\s+at \S+/,
	/\bat [^\s()]+ \([^()]*:\d+:\d+\)/,
	/Error:[^"]*?\/[\w.@-]+\.[cm]?[jt]s\b/,
	/node_modules/
];

test.beforeAll(async ({ browser, baseURL }) => {
	// Its own user agent: the per-client budgets of this spec's posts stay apart from the other specs'.
	const context = await browser.newContext({ baseURL, userAgent: 'runrate-fuzz-forms' });
	await signInWithPassword(await context.newPage(), OWNER);
	owner = context.request;
	const adminContext = await browser.newContext({ baseURL, userAgent: 'runrate-fuzz-forms' });
	await signInWithPassword(await adminContext.newPage(), 'admin@example.org');
	admin = adminContext.request;
	const created = await owner.post('/workspaces?/create', {
		form: { name: WORKSPACE_NAME },
		headers: { origin: baseURL!, 'x-sveltekit-action': 'true' }
	});
	made.workspace = /\/w\/([\w-]+)/.exec(((await created.json()) as { location: string }).location)![1]!;
	const tariff = await owner.post('/api/v1/tariffs', {
		data: { workspaceId: made.workspace, ...submission() }
	});
	expect(tariff.status()).toBe(201);
	made.tariff = (await tariff.json()).id;
	const newSite = await owner.post('/api/v1/sites', {
		data: {
			workspaceId: made.workspace,
			name: 'Fuzz site (invented)',
			timezone: 'America/Chicago',
			country: 'US',
			currency: 'USD'
		}
	});
	expect(newSite.status()).toBe(201);
	made.site = (await newSite.json()).id;
	const scenario = await owner.post(`/api/v1/sites/${made.site}/scenarios`, {
		data: { name: 'Fuzz scenario' }
	});
	expect(scenario.status()).toBe(201);
	made.scenario = (await scenario.json()).id;
	const billed = await owner.post(`/api/v1/sites/${made.site}/bills`, {
		data: { periodFrom: '2025-01-01', periodTo: '2025-01-31', kwh: 1200, amount: 180 }
	});
	expect(billed.status()).toBe(201);
	made.bill = (await billed.json()).id;
	const pump = await owner.post(`/api/v1/workspaces/${made.workspace}/air-pumps`, {
		data: {
			name: 'Fuzz throwaway pump (invented)',
			points: [
				{ pressureKPa: 10, airLpm: 60 },
				{ pressureKPa: 20, airLpm: 45 }
			]
		}
	});
	expect(pump.status()).toBe(201);
	made.airPump = (await pump.json()).id;
	sheets.bills = await (await owner.get(`${site()}/bills/template.csv`)).text();
	sheets.equipment = await (
		await owner.get(`${site()}/scenarios/${made.scenario}/import/template.csv`)
	).text();
	sheets.tariffs = await (await owner.get('/tariffs/import/template.csv')).text();
	sheets.xlsx = (
		await Promise.all([sheets.bills, sheets.equipment, sheets.tariffs].map(hostileWorkbooks))
	).flat();
});

/**
 * Real workbooks of a template: its header over cells of every kind (huge, negative zero, dates, errors,
 * formulas), and its example rows with U+0000 in the first or last cell, written as a sheet writes it
 * (_x0000_) and read back as the character.
 */
async function hostileWorkbooks(template: string): Promise<Buffer[]> {
	const [header = [], ...examples] = Papa.parse<string[]>(template.trim()).data;
	const cells = [
		1e308,
		-0,
		-1,
		new Date(-8.64e15),
		{ formula: '1/0' },
		{ error: '#N/A' },
		'💧'.repeat(300),
		true
	];
	const hostileRows = [0, 1, 2, 3, 4].map((row) => cells.map((_, i) => cells[(i + row) % cells.length]));
	const withNul = (at: number) =>
		examples.map((row) => row.map((cell, i) => (i === at ? `${cell}_x0000_` : cell)));
	return Promise.all(
		[hostileRows, withNul(0), withNul(header.length - 1)].map(async (rows) => {
			const book = new ExcelJS.Workbook();
			book.addWorksheet('Fuzz').addRows([header, ...rows]);
			return Buffer.from(await book.xlsx.writeBuffer());
		})
	);
}

test('every form action in the tree has a fuzz target, so a new action cannot be forgotten', () => {
	const found = formActions();
	expect(found.length).toBeGreaterThan(30);
	expect(found.filter((a) => !(a in TARGETS) && !(a in SKIPPED))).toEqual([]);
	expect(Object.keys(TARGETS).filter((a) => !found.includes(a))).toEqual([]);
});

test('hostile form posts never get a 500 or a stack trace, and refusals are 4xx keyed by field', async ({
	baseURL
}) => {
	// A budget of work (about 875 posts, sheet uploads among them), not a speed claim: on a busy 2-core
	// machine the posts took past two minutes and the rest failed as "Test ended". A hung post still fails
	// on its own request timeout.
	test.setTimeout(600_000);
	const problems: string[] = [];
	const unkeyed = new Set<string>();
	for (const [action, target] of Object.entries(TARGETS)) {
		const fields = [...Object.keys(target.fields()), ...(target.file ? [target.file.field] : [])];
		const out = await fc.check(
			fc.asyncProperty(bodyOf(target), async ({ entries, multipart }) => {
				const res = await post(target.path(), entries, multipart, baseURL!, target.admin ? admin : owner);
				const text = await res.text();
				expect(res.status(), 'HTTP status').toBeLessThan(500);
				for (const leak of LEAKS) expect(text).not.toMatch(leak);
				if (!(res.headers()['content-type'] ?? '').startsWith('application/json')) return;
				// use:enhance gets every outcome as JSON; a refusal carries its own status.
				const result = JSON.parse(text) as { type: string; status?: number; data?: string };
				if (result.type !== 'failure') return;
				expect(result.status, 'failure status').toBeGreaterThanOrEqual(400);
				expect(result.status, 'failure status').toBeLessThan(500);
				const data = parse(result.data!) as { errors?: object; issues?: { path?: unknown }[] };
				if (data.errors) {
					// A key names a field as the form names it ("oneOffCosts.0.amount") or by its first part.
					const stray = Object.keys(data.errors).filter(
						(k) => k !== 'form' && !fields.includes(k) && !fields.includes(k.split('.')[0]!)
					);
					expect(stray, 'error keys that name no field of the form').toEqual([]);
				} else if (!data.issues?.every((i) => typeof i.path === 'string'))
					unkeyed.add(`${action}: ${Object.keys(data).join(', ')}`);
			}),
			{ numRuns: target.runs ?? 25, seed: 20261202, endOnFailure: true }
		);
		if (out.failed)
			problems.push(
				`${action}: ${String(out.errorInstance).split('\n').slice(0, 6).join(' ')}\n  with ${shown(out.counterexample?.[0])}`
			);
	}
	// Refusals shaped otherwise (a sheet-wide message, a chosen owner): listed for a reader, not failed.
	if (unkeyed.size) console.log(`Refusals without errors keyed by field:\n  ${[...unkeyed].join('\n  ')}`);
	expect(problems).toEqual([]);
});

/** A failing post, short enough to read: long values cut, files by name and size. */
function shown(body: { entries: Entry[]; multipart: boolean } | undefined): string {
	if (!body) return '';
	const cut = (text: string) =>
		JSON.stringify(text.length > 80 ? `${text.slice(0, 80)}…(${text.length})` : text);
	const parts = body.entries.map(
		([k, v]) => `${cut(k)}=${typeof v === 'string' ? cut(v) : `<file ${cut(v.name)}, ${v.bytes.length} B>`}`
	);
	return `${body.multipart ? 'multipart' : 'urlencoded'} ${parts.join(' ')}`;
}

/** The tariff editor's payload (the API's body without workspaceId), invented. */
const submission = () => ({
	...inventedTariff('Fuzz test utility (invented)', 'Fuzz private tariff'),
	expectedRevision: 0
});
