import type { APIRequestContext, Page } from '@playwright/test';
import { gzipSync } from 'node:zlib';
import { PAIR, publicTariff, SCENARIO, SITE, ws } from './access-routes';

// The browser's share of each main page: which JavaScript a first visit must download before the page
// can answer (the scripts the server's HTML names), and how many bytes that is gzipped. Used by the
// budget check (js-budgets.spec.ts) and, on demand, by the throttled timing (PAGE_TIMES=1).

/** The main pages, by the name the budgets and the README use; `signedIn` pages are the demo owner's. */
export const MAIN_PAGES: { name: string; path: string; signedIn: boolean }[] = [
	{ name: 'Quick estimate (home)', path: '/', signedIn: false },
	{ name: 'Sign in', path: '/signin', signedIn: false },
	{ name: 'Sign up', path: '/signup', signedIn: false },
	{ name: 'Air and water designer', path: '/air', signedIn: false },
	{ name: 'Workspace', path: ws, signedIn: true },
	{ name: 'Sites dashboard', path: `${ws}/sites`, signedIn: true },
	{ name: 'Site', path: `/sites/${SITE}`, signedIn: true },
	{ name: 'Scenario', path: `/sites/${SITE}/scenarios/${SCENARIO}`, signedIn: true },
	{ name: 'Compare', path: `/compare?${PAIR}`, signedIn: true },
	{ name: 'Which tariff', path: `/sites/${SITE}/cheapest`, signedIn: true },
	{ name: 'Usage', path: `/sites/${SITE}/usage`, signedIn: true },
	{ name: 'Bills', path: `/sites/${SITE}/bills`, signedIn: true },
	{ name: 'Cost justification', path: `/sites/${SITE}/justification`, signedIn: true },
	{ name: 'Tariff library', path: '/tariffs', signedIn: true },
	{ name: 'Tariff', path: `/tariffs/${publicTariff}`, signedIn: true },
	{ name: 'Open-data import', path: '/tariffs/open-data', signedIn: true }
];

/** The targets of issue 20: the scenario page at most 150 kB gzipped, every other page 100 kB. */
export const targetBytes = (name: string) => (name === 'Scenario' ? 150 : 100) * 1024;

/**
 * The same-origin scripts the page's response names: SvelteKit's modulepreload links (in the Link header
 * or the HTML) and the entry its inline script imports. Read from the response, not the live document,
 * where later dynamic imports add links, so the set does not depend on timing.
 */
async function namedScripts(page: Page, path: string): Promise<string[]> {
	const response = await page.goto(path);
	if (!response?.ok()) throw new Error(`${path} answered ${response?.status()}`);
	const html = await response.text();
	const preloads = [...html.matchAll(/<link\b[^>]*>/g)]
		.map((m) => m[0])
		.filter((tag) => /\brel="modulepreload"/.test(tag))
		.map((tag) => /\bhref="([^"]+)"/.exec(tag)?.[1] ?? '');
	const linked = [...(response.headers()['link'] ?? '').matchAll(/<([^>]+)>;[^,]*rel="?modulepreload/g)];
	const entries = [...html.matchAll(/import\("([^"]+\.js)"\)/g)];
	const origin = new URL(response.url()).origin;
	return [...preloads, ...linked.map((m) => m[1]!), ...entries.map((m) => m[1]!)]
		.filter(Boolean)
		.map((href) => new URL(href, response.url()).href)
		.filter((url) => url.startsWith(origin));
}

/** A static import in the bundle's minified modules (`from"./x.js"`, `import"./x.js"`); not `import(…)`. */
const STATIC_IMPORT = /\b(?:from|import)\s*"(\.{1,2}\/[^"]+\.js)"/g;

/**
 * The JavaScript a first visit to `path` must download before the page can run: the scripts its response
 * names and every module they import statically (SvelteKit's preload list can miss a shared chunk; the
 * browser fetches it all the same). Each is counted gzipped with node:zlib at level 9, as the server's
 * precompressed .gz files are. Scripts a page imports later, with import(), are not counted.
 */
export async function firstLoad(
	page: Page,
	request: APIRequestContext,
	path: string
): Promise<{ scripts: string[]; bytes: number }> {
	const gzipped = new Map<string, number>();
	const queue = await namedScripts(page, path);
	while (queue.length) {
		const url = queue.pop()!;
		if (gzipped.has(url)) continue;
		const body = await fetchBody(request, url);
		gzipped.set(url, gzipSync(body, { level: 9 }).length);
		for (const m of body.toString('utf8').matchAll(STATIC_IMPORT)) queue.push(new URL(m[1]!, url).href);
	}
	return { scripts: [...gzipped.keys()].sort(), bytes: [...gzipped.values()].reduce((a, b) => a + b, 0) };
}

/** Scripts' size gzipped (level 9), for those a page fetched later. */
export async function gzippedBytes(request: APIRequestContext, urls: string[]): Promise<number> {
	let total = 0;
	for (const url of urls) total += gzipSync(await fetchBody(request, url), { level: 9 }).length;
	return total;
}

async function fetchBody(request: APIRequestContext, url: string): Promise<Buffer> {
	const response = await request.get(url);
	if (!response.ok()) throw new Error(`${url} answered ${response.status()}`);
	return response.body();
}

/** Bytes in kB (1 kB = 1,024 bytes) with one decimal, as the README's table gives them. */
export const kB = (bytes: number) => (bytes / 1024).toFixed(1);
