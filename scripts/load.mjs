// npm run load — 50 connections for 30 s (LOAD_SECONDS) against the production build on loopback, on
// every hot route: POST /api/v1/calculate with a 100-device time-of-use scenario; the sites dashboard of
// the demo workspace and of a generated adviser's workspace (200 sites × 3 scenarios × 30 devices,
// scripts/bench/workspace-200.ts); one of its site pages; the comparison of its three scenarios; and the
// comparison workbook of the demo pair. Everything runs on a throwaway PostgreSQL with the demo data;
// the app runs on both cores (scripts/cluster.mjs). Prints requests per second and p50/p95/p99 latency
// per route, each after LOAD_WARMUP (3) unmeasured seconds. All data is invented.
import autocannon from 'autocannon';
import { chmodSync, mkdtempSync, readFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { freePort, log, runOrThrow, startService } from './lib.mjs';
import { calculation, people, signIn } from './load-requests.mjs';
import { migrateSeedAndStartStandIns, runThenCleanUp, standInEnv } from './local-services.mjs';

const SECONDS = Number(process.env.LOAD_SECONDS ?? 30);
const CONNECTIONS = Number(process.env.LOAD_CONNECTIONS ?? 50);
const WARM_UP = Number(process.env.LOAD_WARMUP ?? 3);
const work = mkdtempSync(join(tmpdir(), 'runrate-load-'));
// PostgreSQL's tools run as Debian's postgres user when this runs as root: they must reach the folder
// (when they cannot, pg.sh keeps the cluster in ~postgres instead; `pg.sh drop` removes it either way).
chmodSync(work, 0o755);
const children = [];
let pgEnv;

const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8'));

const quantile = (sorted, q) =>
	Math.round((sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? 0) * 10) / 10;

async function hammer(name, options) {
	// Unmeasured first: a route's figures are then its steady state, not the JIT warming up or the first
	// views pricing what the stored results do not hold yet (both show in the first seconds).
	if (WARM_UP > 0) await autocannon({ connections: CONNECTIONS, duration: WARM_UP, ...options });
	const latencies = [];
	const instance = autocannon({ connections: CONNECTIONS, duration: SECONDS, ...options });
	instance.on('response', (_client, _status, _bytes, ms) => latencies.push(ms));
	const result = await instance;
	latencies.sort((a, b) => a - b);
	const errors = result.errors + result.timeouts + result.non2xx;
	return {
		route: name,
		requests: result.requests.total,
		perSecond: Math.round(result.requests.average),
		p50: quantile(latencies, 0.5),
		p95: quantile(latencies, 0.95),
		p99: quantile(latencies, 0.99),
		errors
	};
}

async function main() {
	const [pgPort, smtpPort, viewPort, s3Port, appPort] = await Promise.all(
		Array.from({ length: 5 }, freePort)
	);
	pgEnv = { PGDATA: join(work, 'pg'), PGPORT: String(pgPort) };
	const buildDir = join('.test-build', basename(work));
	const env = {
		DATABASE_URL: `postgres://postgres@127.0.0.1:${pgPort}/runrate`,
		AUTH_SECRET: 'load-test-only-secret-0123456789abcdef',
		...standInEnv({ smtpPort, mailViewPort: viewPort, s3Port, s3Dir: join(work, 's3') }),
		RUNRATE_BUILD_DIR: buildDir
	};
	await runOrThrow('bash', ['scripts/pg.sh', 'start'], { env: pgEnv });
	children.push(await migrateSeedAndStartStandIns(env));
	log('load', 'generating the 200-site workspace');
	const { output } = await runOrThrow('npx', ['tsx', 'scripts/bench/workspace-200.ts'], { env, quiet: true });
	const generated = JSON.parse(output.split('\n').findLast((line) => line.startsWith('{')));
	log('load', 'building the production bundle');
	await runOrThrow('npx', ['vite', 'build', '--logLevel', 'error'], { env });
	const base = `http://127.0.0.1:${appPort}`;
	const workers = Number(process.env.WORKERS ?? availableParallelism());
	children.push(
		await startService('app', 'node', ['scripts/cluster.mjs'], {
			env: {
				...env,
				WORKERS: String(workers),
				HOST: '127.0.0.1',
				PORT: String(appPort),
				ORIGIN: base,
				NODE_ENV: 'production',
				MEMBER_REQUESTS_PER_MINUTE: '100000000'
			},
			ready: /Listening on \d+ workers/
		})
	);
	const cookie = await signIn(base, 'owner@example.org');
	const headers = { cookie, 'content-type': 'application/json' };
	const ws = people.workspaces[0].id;
	const pair = demoSites.sites[0].scenarios.map((s) => s.id).join(',');
	const routes = [
		[
			'POST /api/v1/calculate (100 devices, TOU)',
			{ url: `${base}/api/v1/calculate`, method: 'POST', headers, body: JSON.stringify(calculation()) }
		],
		['GET /w/:workspace/sites (dashboard, signed in)', { url: `${base}/w/${ws}/sites`, headers: { cookie } }],
		[
			'GET /w/:workspace/sites (dashboard, 200 sites)',
			{ url: `${base}/w/${generated.workspaceId}/sites`, headers: { cookie } }
		],
		[
			'GET /sites/:site (site page, 3 × 30 devices)',
			{ url: `${base}/sites/${generated.firstSite}`, headers: { cookie } }
		],
		[
			'GET /api/v1/compare (3 × 30 devices)',
			{ url: `${base}/api/v1/compare?scenarios=${generated.firstScenarios}`, headers: { cookie } }
		],
		[
			'GET /api/v1/compare/export.xlsx (2 demo scenarios)',
			{ url: `${base}/api/v1/compare/export.xlsx?scenarios=${pair}`, headers: { cookie } }
		]
	];
	log(
		'load',
		`${CONNECTIONS} connections, ${SECONDS} s per route, ${workers} app workers on ${availableParallelism()} cores`
	);
	// LOAD_ROUTES=calculate,export runs only the routes whose name holds one of those words.
	const only = process.env.LOAD_ROUTES?.split(',');
	const rows = [];
	for (const [name, options] of routes)
		if (!only || only.some((word) => name.includes(word))) rows.push(await hammer(name, options));
	console.log(
		'\n| route | requests | req/s | p50 ms | p95 ms | p99 ms | errors |\n|---|---|---|---|---|---|---|'
	);
	for (const r of rows)
		console.log(
			`| ${r.route} | ${r.requests} | ${r.perSecond} | ${r.p50} | ${r.p95} | ${r.p99} | ${r.errors} |`
		);
	return rows.every((r) => r.errors === 0) ? 0 : 1;
}

await runThenCleanUp(main, {
	children,
	pgEnv: () => pgEnv,
	folders: [work, join('.test-build', basename(work))]
});
