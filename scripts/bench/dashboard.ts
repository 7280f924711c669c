/**
 * Server work per view, measured in-process: the sites dashboard, a site page and the comparison of two
 * demo scenarios (JSON and workbook), for the demo workspace and a generated one of 200 sites × 3 scenarios
 * × 30 devices (workspace-200.ts). Each view is the route's own load or handler, loaded through Vite as the
 * app loads it, and timed by this process's CPU time (process.cpuUsage: user + system, the app's share;
 * PostgreSQL's own CPU is not in it) and by wall-clock. "cold": the stored results are deleted before each
 * view; "warm": they are there.
 *
 *   npx tsx scripts/bench/dashboard.ts [checkout]   (default: this checkout; another one, e.g. main's code
 *                                                    extracted with `git archive`, measures the "before")
 *
 * It starts a throwaway PostgreSQL of its own (scripts/pg.sh, a free port), migrates and seeds it.
 */
import { mkdtempSync, chmodSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import postgres from 'postgres';
import { createServer } from 'vite';
import { freePort, run, runOrThrow, tsNode } from '../lib.mjs';
import { generateWorkspace } from './workspace-200';
import { median } from './growth';

const checkout = resolve(process.argv[2] ?? process.cwd());
const VIEWS = Number(process.env.VIEWS ?? 30);
const WARM_UP = 5;
const OWNER = {
	id: 'demo-user-owner',
	email: 'owner@example.org',
	name: 'Rowan Tiller (demo owner)',
	isAdmin: false
};
const DEMO_WORKSPACE = '0d3e5c1a-6f2b-4c1e-9a57-5e1f00000001';
const DEMO_SITE = '5e7e0000-0000-4000-8000-000000000002';
const DEMO_PAIR = '5c0e0000-0000-4000-8000-000000000101,5c0e0000-0000-4000-8000-000000000102';

type Loaded = (event: unknown) => Promise<unknown>;

const eventFor = (path: string, params: Record<string, string>) => {
	const url = new URL(`http://127.0.0.1${path}`);
	return {
		locals: { user: OWNER },
		params,
		url,
		request: new Request(url),
		route: { id: path },
		getClientAddress: () => '127.0.0.1',
		setHeaders: () => {},
		depends: () => {},
		parent: async () => ({}),
		cookies: { get: () => undefined, getAll: () => [], set: () => {}, delete: () => {} },
		fetch
	};
};

/** Median CPU and wall milliseconds per view; `before` runs untimed ahead of each view (a cold start). */
async function measure(view: () => Promise<unknown>, before?: () => Promise<unknown>) {
	for (let i = 0; i < WARM_UP; i++) {
		await before?.();
		await view();
	}
	const cpu: number[] = [];
	const wall: number[] = [];
	for (let i = 0; i < VIEWS; i++) {
		await before?.();
		const usage = process.cpuUsage();
		const start = performance.now();
		const answer = await view();
		wall.push(performance.now() - start);
		const spent = process.cpuUsage(usage);
		cpu.push((spent.user + spent.system) / 1000);
		if (answer instanceof Response && !answer.ok) throw new Error(`HTTP ${answer.status}`);
		if (answer instanceof Response) await answer.arrayBuffer();
	}
	return { cpu: median(cpu), wall: median(wall) };
}

const work = mkdtempSync(join(tmpdir(), 'runrate-bench-dashboard-'));
chmodSync(work, 0o755);
const pgEnv = { PGDATA: join(work, 'pg'), PGPORT: String(await freePort()) };
const url = `postgres://postgres@127.0.0.1:${pgEnv.PGPORT}/runrate`;
const env = { DATABASE_URL: url, AUTH_SECRET: 'bench-only-secret-not-for-production-0123456789' };
Object.assign(process.env, env, { TZ: 'UTC', LOG_LEVEL: 'warn' });
const drop = () => run('bash', ['scripts/pg.sh', 'drop'], { env: pgEnv, quiet: true });
for (const signal of ['SIGINT', 'SIGTERM'] as const)
	process.on(signal, () => void drop().then(() => process.exit(1)));
try {
	await runOrThrow('bash', ['scripts/pg.sh', 'start'], { env: pgEnv });
	await runOrThrow(...tsNode('scripts/migrate.ts'), { env });
	await runOrThrow(...tsNode('scripts/seed.ts'), { env });
	const big = await generateWorkspace(url);
	const sql = postgres(url, { max: 1, onnotice: () => {} });
	// SvelteKit's plugin takes the working folder as Vite's root: the checkout measured.
	process.chdir(checkout);
	const vite = await createServer({
		root: checkout,
		configFile: join(checkout, 'vite.config.ts'),
		server: { middlewareMode: true, hmr: false, watch: null },
		appType: 'custom',
		logLevel: 'warn'
	});
	const route = async (file: string, name = 'load') => (await vite.ssrLoadModule(file))[name] as Loaded;
	const dashboard = await route('/src/routes/w/[workspaceId]/sites/+page.server.ts');
	const sitePage = await route('/src/routes/sites/[siteId]/+page.server.ts');
	const compareJson = await route('/src/routes/api/v1/compare/+server.ts', 'GET');
	const workbook = await route('/src/routes/api/v1/compare/export.xlsx/+server.ts', 'GET');
	const stored = existsSync(join(checkout, 'src/lib/server/sites/stored-results.ts'));
	const clear = () => sql`delete from priced_result`;

	const views: [string, () => Promise<unknown>][] = [
		[
			'dashboard, demo workspace (4 sites)',
			() => dashboard(eventFor(`/w/${DEMO_WORKSPACE}/sites`, { workspaceId: DEMO_WORKSPACE }))
		],
		['site page, demo (3 scenarios)', () => sitePage(eventFor(`/sites/${DEMO_SITE}`, { siteId: DEMO_SITE }))],
		[
			'compare JSON, 2 demo scenarios',
			() => compareJson(eventFor(`/api/v1/compare?scenarios=${DEMO_PAIR}`, {}))
		],
		[
			'compare workbook, 2 demo scenarios',
			() => workbook(eventFor(`/api/v1/compare/export.xlsx?scenarios=${DEMO_PAIR}`, {}))
		],
		[
			'dashboard, 200 sites × 3 × 30',
			() => dashboard(eventFor(`/w/${big.workspaceId}/sites`, { workspaceId: big.workspaceId }))
		],
		[
			'compare JSON, 6 generated scenarios × 30',
			() =>
				compareJson(
					eventFor(
						`/api/v1/compare?scenarios=${[...big.scenarioIds[0]!, ...big.scenarioIds[1]!].join(',')}`,
						{}
					)
				)
		],
		[
			'site page, generated (3 × 30)',
			() => sitePage(eventFor(`/sites/${big.siteIds[0]}`, { siteId: big.siteIds[0]! }))
		]
	];
	console.log(
		`checkout ${checkout} (${stored ? 'stored results' : 'recomputed on every view'}); ${VIEWS} views each, medians`
	);
	console.log(
		`${'view'.padEnd(38)} ${'cold CPU'.padStart(9)} ${'cold wall'.padStart(10)} ${'warm CPU'.padStart(9)} ${'warm wall'.padStart(10)}`
	);
	// ONLY=dashboard measures only the views whose label contains it (a profile of one view, say).
	for (const [label, view] of views.filter(([l]) => l.includes(process.env.ONLY ?? ''))) {
		// PHASE=warm skips the cold views (a profile of the warm path, say).
		const cold = process.env.PHASE === 'warm' ? { cpu: NaN, wall: NaN } : await measure(view, clear);
		const warm = await measure(view);
		const ms = (n: number) => `${n.toFixed(2)} ms`.padStart(10);
		console.log(`${label.padEnd(38)} ${ms(cold.cpu)} ${ms(cold.wall)} ${ms(warm.cpu)} ${ms(warm.wall)}`);
	}
	await vite.close();
	await sql.end();
} finally {
	await drop();
}
process.exit(0);
