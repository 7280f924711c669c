import { expect, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_WS, signInWithPassword } from './helpers';

// Invented sites made through the site API for the tests that need one of their own, so the demo
// sites stay as the other tests see them; and the signed-in API callers that make them.

/** The invented demo library's first tariff (public). */
export const PUBLIC_TARIFF = (
	JSON.parse(readFileSync('data/demo-tariffs.json', 'utf8')) as { tariffs: { id: string }[] }
).tariffs[0]!.id;

/** The invented demo sites and their scenarios. */
export const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; name: string; scenarios: { id: string; name: string }[] }[];
};

/** A signed-in person's API requests, with the Origin header the API's form-free writes expect. */
export type Caller = { request: APIRequestContext; headers: { origin: string } };

/** Signs `page` in as `email` and returns its requests as a caller. */
export async function callerOn(
	page: Page,
	email: string,
	baseURL: string,
	password?: string
): Promise<Caller> {
	await signInWithPassword(page, email, password);
	return { request: page.request, headers: { origin: baseURL } };
}

/** A caller in a browser context of its own: signed in as `email`, or signed out when it is null. */
export async function callerAs(
	browser: Browser,
	email: string | null,
	baseURL: string,
	password?: string
): Promise<Caller> {
	const page = await (await browser.newContext({ baseURL })).newPage();
	if (email === null) return { request: page.request, headers: { origin: baseURL } };
	return callerOn(page, email, baseURL, password);
}

/** The body of POST /api/v1/sites: an invented site in the demo workspace named "`name` <now> (invented)". */
export const siteBody = (name: string, more: Record<string, unknown> = {}) => ({
	workspaceId: DEMO_WS.id,
	name: `${name} ${Date.now()} (invented)`,
	timezone: 'America/Chicago',
	country: 'US',
	currency: 'USD',
	...more
});

/** Makes an invented site (see `siteBody`) and returns its id. */
export async function createSite(
	{ request, headers }: { request: APIRequestContext; headers?: Record<string, string> },
	name: string,
	more: Record<string, unknown> = {}
): Promise<string> {
	const created = await request.post('/api/v1/sites', { headers, data: siteBody(name, more) });
	expect(created.status()).toBe(201);
	return (await created.json()).id as string;
}

/** The id of a site's baseline scenario. */
export async function baselineOf(request: APIRequestContext, siteId: string): Promise<string> {
	const list = await (await request.get(`/api/v1/sites/${siteId}/scenarios`)).json();
	return (list.scenarios as { id: string; isBaseline: boolean }[]).find((s) => s.isBaseline)!.id;
}
