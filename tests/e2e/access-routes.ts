import { expect, type APIRequestContext } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_WS, inventedTariff } from './helpers';

// Every route that exists, with the status each kind of caller gets: the access matrix checks them all,
// and the accessibility gate checks every page among them. 303 = sent to sign-in. The guest is a person
// the owner shared one site with (the hatchery, as a viewer); they belong to no workspace, so they
// cannot add tariffs either.
export type Who = 'anonymous' | 'viewer' | 'editor' | 'owner' | 'outsider' | 'admin' | 'guest';
export const WHO: Who[] = ['anonymous', 'viewer', 'editor', 'owner', 'outsider', 'admin', 'guest'];

export const publicTariff = (
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string }[] }
).tariffs[0]!.id;
export const ws = `/w/${DEMO_WS.id}`;
const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; scenarios: { id: string }[] }[];
};
export const SITE = demoSites.sites[0]!.id;
export const SCENARIO = demoSites.sites[0]!.scenarios[0]!.id;
export const OTHER_SITE = demoSites.sites[1]!.id;
export const PAIR = `scenarios=${SCENARIO},${demoSites.sites[0]!.scenarios[1]!.id}`;
let privateTariff = '';
/** A scenario of a site made for this test, which editors and owners delete and bring back. */
let throwaway = '';
/** A bill of the demo site and its attached PDF (invented), made for this test. */
let bill = '';
let attachment = '';
/** An air pump of the demo workspace (invented), made for this test. */
let airPump = '';
const airPumpsApi = `/api/v1/workspaces/${DEMO_WS.id}/air-pumps`;

export type Route = {
	method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
	path: () => string;
	form?: Record<string, string>;
	json?: unknown;
	expect: number[];
};
// Expected statuses in WHO order: anonymous, viewer, editor, owner, outsider, admin, guest.
// Payloads are harmless: invalid or a no-op past the guard, so a 400 proves the guard let the caller through.
const bad = { name: '', email: 'bad', role: 'nope', userId: '', invitationId: 'x', confirmName: 'wrong' };
export const routes: Route[] = [
	{ method: 'GET', path: () => '/workspaces', expect: [303, 200, 200, 200, 200, 200, 200] },
	{ method: 'GET', path: () => ws, expect: [303, 200, 200, 200, 404, 404, 404] },
	{
		method: 'GET',
		path: () => '/w/00000000-0000-4000-8000-000000000000',
		expect: [303, 404, 404, 404, 404, 404, 404]
	},
	{ method: 'GET', path: () => '/w/not-a-uuid', expect: [303, 404, 404, 404, 404, 404, 404] },
	...['rename', 'invite', 'changeRole', 'remove', 'revoke', 'delete'].map((action) => ({
		method: 'POST' as const,
		path: () => `${ws}?/${action}`,
		form: bad,
		expect: [401, 403, 403, 400, 404, 404, 404]
	})),
	{
		method: 'POST',
		path: () => '/workspaces?/create',
		form: { name: '' },
		expect: [401, 400, 400, 400, 400, 400, 400]
	},
	// The tariff library: public tariffs are open to all; private ones to their workspace; only admins edit public ones.
	{ method: 'GET', path: () => '/tariffs', expect: [200, 200, 200, 200, 200, 200, 200] },
	{ method: 'GET', path: () => `/tariffs/${publicTariff}`, expect: [200, 200, 200, 200, 200, 200, 200] },
	{ method: 'GET', path: () => `/tariffs/${privateTariff}`, expect: [404, 200, 200, 200, 404, 404, 404] },
	{
		method: 'GET',
		path: () => `/api/v1/tariffs/${privateTariff}`,
		expect: [404, 200, 200, 200, 404, 404, 404]
	},
	{
		method: 'GET',
		path: () => `/api/v1/tariffs/${privateTariff}/versions/1`,
		expect: [404, 200, 200, 200, 404, 404, 404]
	},
	{
		method: 'GET',
		path: () => `/api/v1/tariffs/${privateTariff}/urdb.json`,
		expect: [404, 200, 200, 200, 404, 404, 404]
	},
	{
		method: 'GET',
		path: () => `/api/v1/tariffs/${publicTariff}/urdb.json`,
		expect: [200, 200, 200, 200, 200, 200, 200]
	},
	{ method: 'GET', path: () => '/tariffs/new', expect: [303, 403, 200, 200, 200, 200, 403] },
	{ method: 'GET', path: () => '/tariffs/import', expect: [303, 403, 200, 200, 200, 200, 403] },
	// One rate of the open rate database: anyone signed in may read one (the API reads one for anybody); a
	// save is for the chosen workspace's editors, or admins for the public library.
	{ method: 'GET', path: () => '/tariffs/open-data', expect: [303, 403, 200, 200, 200, 200, 403] },
	{
		method: 'POST',
		path: () => '/tariffs/open-data?/read',
		form: { json: '' },
		expect: [401, 400, 400, 400, 400, 400, 400]
	},
	{
		method: 'POST',
		path: () => '/tariffs/open-data?/save',
		form: { owner: DEMO_WS.id, json: '' },
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => '/tariffs/open-data?/save',
		form: { owner: 'public', json: '' },
		expect: [401, 403, 403, 403, 403, 400, 403]
	},
	{
		method: 'POST',
		path: () => '/api/v1/tariffs/from-urdb',
		json: {},
		expect: [422, 422, 422, 422, 422, 422, 422]
	},
	{ method: 'GET', path: () => `/tariffs/${publicTariff}/edit`, expect: [303, 403, 403, 403, 403, 200, 403] },
	{
		method: 'GET',
		path: () => `/tariffs/${privateTariff}/edit`,
		expect: [303, 403, 200, 200, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => `/tariffs/${privateTariff}/edit`,
		form: { payload: '{}' },
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => `/tariffs/${publicTariff}/edit`,
		form: { payload: '{}' },
		expect: [401, 403, 403, 403, 403, 400, 403]
	},
	{
		method: 'PUT',
		path: () => `/api/v1/tariffs/${privateTariff}`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'PUT',
		path: () => `/api/v1/tariffs/${publicTariff}`,
		json: {},
		expect: [401, 403, 403, 403, 403, 400, 403]
	},
	{
		method: 'POST',
		path: () => '/api/v1/tariffs',
		json: { workspaceId: DEMO_WS.id },
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => '/api/v1/tariffs',
		json: { workspaceId: null },
		expect: [401, 403, 403, 403, 403, 400, 403]
	},
	// The bulk import of open rate database rates: platform admins only, on every door.
	{ method: 'GET', path: () => '/admin/urdb-import', expect: [303, 403, 403, 403, 403, 200, 403] },
	{
		method: 'POST',
		path: () => '/admin/urdb-import?/start',
		form: { none: '' },
		expect: [401, 403, 403, 403, 403, 400, 403]
	},
	...['', '/status'].map((tail) => ({
		method: 'GET' as const,
		path: () => `/admin/urdb-import/00000000-0000-4000-8000-000000000000${tail}`,
		expect: [303, 403, 403, 403, 403, 404, 403]
	})),
	{
		method: 'PUT',
		// Part 999 is past the last part an upload has: the guard lets the admin through to a 404.
		path: () => '/admin/urdb-import/uploads/00000000-0000-4000-8000-000000000000/999',
		json: {},
		expect: [401, 403, 403, 403, 403, 404, 403]
	},
	// The workspace's own air pumps: viewers read, editors write.
	{ method: 'GET', path: () => `${ws}/air-pumps`, expect: [303, 200, 200, 200, 404, 404, 404] },
	...['create', 'update', 'delete'].map((action) => ({
		method: 'POST' as const,
		path: () => `${ws}/air-pumps?/${action}`,
		form: { name: '', pressureUnit: 'kPa', pumpId: 'x' },
		expect: [401, 403, 400, 400, 404, 404, 404]
	})),
	{ method: 'GET', path: () => airPumpsApi, expect: [401, 200, 200, 200, 404, 404, 404] },
	{ method: 'POST', path: () => airPumpsApi, json: {}, expect: [401, 403, 400, 400, 404, 404, 404] },
	{ method: 'GET', path: () => `${airPumpsApi}/${airPump}`, expect: [401, 200, 200, 200, 404, 404, 404] },
	{
		method: 'PUT',
		path: () => `${airPumpsApi}/${airPump}`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'DELETE',
		path: () => `${airPumpsApi}/00000000-0000-4000-8000-000000000000`,
		expect: [401, 403, 404, 404, 404, 404, 404]
	},
	// Sites, scenarios and equipment (a demo site of the owner's workspace).
	{ method: 'GET', path: () => `${ws}/sites`, expect: [303, 200, 200, 200, 404, 404, 404] },
	{ method: 'GET', path: () => `${ws}/sites/new`, expect: [303, 403, 200, 200, 404, 404, 404] },
	{
		method: 'POST',
		path: () => `${ws}/sites/new`,
		form: { name: '' },
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{ method: 'GET', path: () => `/sites/${SITE}`, expect: [303, 200, 200, 200, 404, 404, 200] },
	// The cost justification reads like the site page: viewers and the site's guest too.
	{ method: 'GET', path: () => `/sites/${SITE}/justification`, expect: [303, 200, 200, 200, 404, 404, 200] },
	{ method: 'GET', path: () => `/sites/${SITE}/edit`, expect: [303, 403, 200, 200, 404, 404, 403] },
	{
		method: 'POST',
		path: () => `/sites/${SITE}/edit`,
		form: { name: '' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'GET',
		path: () => `/sites/${OTHER_SITE}/scenarios/${SCENARIO}`,
		expect: [303, 404, 404, 404, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}?/details`,
		form: { name: '' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	// The air and water designer: public on its own page; on a scenario, saving needs an editor.
	{ method: 'GET', path: () => '/air', expect: [200, 200, 200, 200, 200, 200, 200] },
	{
		method: 'POST',
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}?/airDesign`,
		form: { revision: '0', design: '{}' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/api/v1/scenarios/${SCENARIO}/air-design`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'PUT',
		path: () => `/api/v1/scenarios/${SCENARIO}/air-design`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	// The machine API of sites, scenarios and single devices.
	{ method: 'GET', path: () => `/api/v1/sites/${SITE}`, expect: [401, 200, 200, 200, 404, 404, 200] },
	{
		method: 'PUT',
		path: () => `/api/v1/sites/${SITE}`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{ method: 'GET', path: () => `/api/v1/scenarios/${SCENARIO}`, expect: [401, 200, 200, 200, 404, 404, 200] },
	{
		method: 'PATCH',
		path: () => `/api/v1/scenarios/${SCENARIO}`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'PATCH',
		path: () => `/api/v1/scenarios/${SCENARIO}`,
		json: { restored: true },
		expect: [401, 403, 409, 409, 404, 404, 403]
	},
	{
		method: 'POST',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment/0`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'GET',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment/999`,
		expect: [401, 404, 404, 404, 404, 404, 404]
	},
	{
		method: 'PUT',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment/0`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'DELETE',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment/0`,
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'DELETE',
		path: () => `/api/v1/scenarios/${throwaway}`,
		expect: [401, 403, 200, 200, 404, 404, 404]
	},
	{
		method: 'PATCH',
		path: () => `/api/v1/scenarios/${throwaway}`,
		json: { restored: true },
		expect: [401, 403, 200, 200, 404, 404, 404]
	},
	// Bills, their files and metered usage of the demo site.
	...['bills', 'bills/template.csv', 'usage', 'cheapest'].map((page) => ({
		method: 'GET' as const,
		path: () => `/sites/${SITE}/${page}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	})),
	// The cheapest-tariff report and workbook of a demo scenario's coming year.
	...['cheapest/report', 'cheapest/export.xlsx'].map((page) => ({
		method: 'GET' as const,
		path: () => `/sites/${SITE}/${page}?scenario=${SCENARIO}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	})),
	...['bills?/add', 'bills?/import', 'usage?/import'].map((action) => ({
		method: 'POST' as const,
		path: () => `/sites/${SITE}/${action}`,
		form: { none: '' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	})),
	{ method: 'GET', path: () => `/sites/${SITE}/bills/${bill}`, expect: [303, 200, 200, 200, 404, 404, 200] },
	{
		method: 'GET',
		path: () => `/sites/${OTHER_SITE}/bills/${bill}`,
		expect: [303, 404, 404, 404, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => `/sites/${SITE}/bills/${bill}?/update`,
		form: { kwh: 'x' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/sites/${SITE}/bills/${bill}/attachments/${attachment}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'GET',
		path: () => `/sites/${OTHER_SITE}/bills/${bill}/attachments/${attachment}`,
		expect: [303, 404, 404, 404, 404, 404, 404]
	},
	{ method: 'GET', path: () => `/api/v1/sites/${SITE}/bills`, expect: [401, 200, 200, 200, 404, 404, 200] },
	{
		method: 'POST',
		path: () => `/api/v1/sites/${SITE}/bills`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	...['', '/reconciliation'].map((tail) => ({
		method: 'GET' as const,
		path: () => `/api/v1/sites/${SITE}/bills/${bill}${tail}`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	})),
	{
		method: 'PUT',
		path: () => `/api/v1/sites/${SITE}/bills/${bill}`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'POST',
		path: () => `/api/v1/sites/${SITE}/bills/${bill}/attachment`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{ method: 'GET', path: () => `/api/v1/sites/${SITE}/usage`, expect: [401, 200, 200, 200, 404, 404, 200] },
	{
		method: 'POST',
		path: () => `/api/v1/sites/${SITE}/usage`,
		json: {},
		expect: [401, 403, 415, 415, 404, 404, 403]
	},
	// The workspace's own data, and the account.
	{ method: 'GET', path: () => `${ws}/export.json`, expect: [303, 403, 403, 200, 404, 404, 404] },
	{
		method: 'POST',
		path: () => `${ws}?/restore`,
		form: { none: '' },
		expect: [401, 403, 403, 200, 404, 404, 404]
	},
	{ method: 'GET', path: () => '/account', expect: [303, 200, 200, 200, 200, 200, 200] },
	{
		method: 'POST',
		path: () => '/account?/delete',
		form: { confirmEmail: 'wrong' },
		expect: [401, 400, 400, 400, 400, 400, 400]
	},
	// Public pages and the anonymous calculation API: open to everyone.
	...[
		'/',
		'/rules',
		'/health',
		'/forgot',
		'/signup/sent',
		'/signin/check-email',
		'/signin/problem',
		'/tariffs/formats',
		'/tariffs/import/template.csv'
	].map((page) => ({
		method: 'GET' as const,
		path: () => page,
		expect: [200, 200, 200, 200, 200, 200, 200]
	})),
	...['/signin', '/signup'].map((page) => ({
		method: 'GET' as const,
		path: () => page,
		// Someone already signed in is sent on to their workspaces.
		expect: [200, 303, 303, 303, 303, 303, 303]
	})),
	// Sign-in's landing sends everyone on (to sign-in, or to their sites); the welcome after a kept estimate
	// reads its site through the guard.
	{ method: 'GET', path: () => '/signin/landing', expect: [303, 303, 303, 303, 303, 303, 303] },
	{ method: 'GET', path: () => `/signup/welcome?site=${SITE}`, expect: [303, 200, 200, 200, 404, 404, 200] },
	...['/reset?token=x', '/signup/confirm?token=x', '/invite/not-a-real-invitation-token-000'].map((page) => ({
		method: 'GET' as const,
		path: () => page,
		expect: [200, 200, 200, 200, 200, 200, 200]
	})),
	...['/api/v1/calculate', '/api/v1/pumping', '/api/v1/airlift', '/api/v1/aeration'].map((api) => ({
		method: 'POST' as const,
		path: () => api,
		json: {},
		expect: [400, 400, 400, 400, 400, 400, 400]
	})),
	{
		method: 'POST',
		path: () => `/sites/${SITE}/bills/${bill}/attachments`,
		// A plain form post without a file goes back to the bill page, which shows why.
		form: { none: '' },
		expect: [401, 403, 303, 303, 404, 404, 403]
	},
	// Comparisons of scenarios the caller may read, and their exports.
	{ method: 'GET', path: () => '/compare', expect: [303, 200, 200, 200, 200, 200, 200] },
	...['/compare', '/compare/report'].map((page) => ({
		method: 'GET' as const,
		path: () => `${page}?${PAIR}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	})),
	...['/api/v1/compare', '/api/v1/compare/export.csv', '/api/v1/compare/export.xlsx'].map((api) => ({
		method: 'GET' as const,
		path: () => `${api}?${PAIR}`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	})),
	...['equipment.csv', 'equipment.xlsx', 'import/template.csv'].map((file) => ({
		method: 'GET' as const,
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}/${file}`,
		expect: [303, 200, 200, 200, 404, 404, 200]
	})),
	{
		method: 'GET',
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}/import`,
		expect: [303, 403, 200, 200, 404, 404, 403]
	},
	{
		method: 'POST',
		path: () => `/sites/${SITE}/scenarios/${SCENARIO}/import`,
		form: { intent: 'check' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	...['create', 'baseline', 'archive', 'delete', 'share', 'unshare'].map((action) => ({
		method: 'POST' as const,
		path: () => `/sites/${SITE}?/${action}`,
		form: { name: '', scenarioId: 'x', email: 'bad', userId: '' },
		expect: [401, 403, 400, 400, 404, 404, 403]
	})),
	{
		method: 'GET',
		path: () => `/api/v1/sites?workspaceId=${DEMO_WS.id}`,
		expect: [401, 200, 200, 200, 404, 404, 404]
	},
	{
		method: 'POST',
		path: () => '/api/v1/sites',
		json: { workspaceId: DEMO_WS.id },
		expect: [401, 403, 400, 400, 404, 404, 404]
	},
	{
		method: 'GET',
		path: () => `/api/v1/sites/${SITE}/scenarios`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'POST',
		path: () => `/api/v1/sites/${SITE}/scenarios`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'PUT',
		path: () => `/api/v1/scenarios/${SCENARIO}/equipment`,
		json: {},
		expect: [401, 403, 400, 400, 404, 404, 403]
	},
	{
		method: 'GET',
		path: () => `/api/v1/scenarios/${SCENARIO}/results`,
		expect: [401, 200, 200, 200, 404, 404, 200]
	},
	{
		method: 'POST',
		path: () => `/api/v1/scenarios/${SCENARIO}/results`,
		json: {},
		expect: [401, 400, 400, 400, 404, 404, 400]
	},
	{
		method: 'POST',
		path: () => `/tariffs/${privateTariff}?/copy`,
		form: { workspaceId: DEMO_WS.id },
		expect: [404, 403, 303, 303, 404, 404, 404]
	},
	// A confirmation link with no such token: refused beside the form for everyone.
	{
		method: 'POST',
		path: () => '/signup/confirm',
		form: { token: 'matrix-no-such-confirmation-token', password: 'not the password' },
		expect: [400, 400, 400, 400, 400, 400, 400]
	},
	// Last: they end the caller's sessions. Auth.js answers with its own redirect.
	{
		method: 'POST',
		path: () => '/account?/signOutEverywhere',
		form: { none: '' },
		expect: [401, 302, 302, 302, 302, 302, 302]
	},
	{ method: 'POST', path: () => '/signout', form: { none: '' }, expect: [302, 302, 302, 302, 302, 302, 302] }
];

/** Addresses that answer with a file, JSON or a health check rather than a page a person reads. */
const NOT_A_PAGE = /^\/api\/|^\/health$|\.(csv|xlsx|json)$|\/attachments\//;

/** The GET rows that answer with a page (HTML), for checks of the pages themselves. */
export const pageRoutes = (): Route[] =>
	routes.filter((r) => r.method === 'GET' && !NOT_A_PAGE.test(new URL(r.path(), 'http://x').pathname));

/** The ids `makeFixtures` made, for checks that look for them in an answer. */
export const fixtures = () => ({ privateTariff, throwaway, bill, attachment });

/**
 * What the routes above need beyond the demo data, made by the owner: a private tariff of the demo
 * workspace, a throwaway site and scenario, and a bill of the demo site with a PDF attached (all invented).
 */
export async function makeFixtures(owner: APIRequestContext, baseURL: string) {
	const res = await owner.post('/api/v1/tariffs', {
		data: {
			workspaceId: DEMO_WS.id,
			...inventedTariff('Matrix test utility (invented)', 'Private matrix tariff')
		}
	});
	expect(res.status()).toBe(201);
	privateTariff = (await res.json()).id;
	const site = await owner.post('/api/v1/sites', {
		data: {
			workspaceId: DEMO_WS.id,
			name: 'Matrix test site (invented)',
			timezone: 'America/Chicago',
			country: 'US',
			currency: 'USD'
		}
	});
	expect(site.status()).toBe(201);
	const made = await owner.post(`/api/v1/sites/${(await site.json()).id}/scenarios`, {
		data: { name: 'Matrix throwaway' }
	});
	expect(made.status()).toBe(201);
	throwaway = (await made.json()).id;
	const billed = await owner.post(`/api/v1/sites/${SITE}/bills`, {
		data: { periodFrom: '2026-01-01', periodTo: '2026-01-31', kwh: 1200, amount: 180, confirmOverlap: true }
	});
	expect(billed.status()).toBe(201);
	bill = (await billed.json()).id;
	const pdf = Buffer.from('%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n');
	const attached = await owner.post(`/api/v1/sites/${SITE}/bills/${bill}/attachment`, {
		// A multipart post is a form post: SvelteKit's origin check wants the origin.
		headers: { origin: baseURL },
		multipart: { file: { name: 'invented-bill.pdf', mimeType: 'application/pdf', buffer: pdf } }
	});
	expect(attached.status()).toBe(201);
	attachment = (await attached.json()).id;
	const pump = await owner.post(airPumpsApi, {
		data: {
			name: 'Matrix test pump (invented)',
			points: [
				{ pressureKPa: 10, airLpm: 60 },
				{ pressureKPa: 20, airLpm: 45 }
			]
		}
	});
	expect(pump.status()).toBe(201);
	airPump = (await pump.json()).id;
}
