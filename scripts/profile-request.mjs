// node scripts/profile-request.mjs [anonymous|member|dashboard] — where a request's CPU goes.
//
// Expects the production bundle (`npm run build`; RUNRATE_BUILD_DIR to read another folder). Starts a
// throwaway PostgreSQL with the demo data and the stand-ins (as load.mjs does), then ONE app process
// under `node --cpu-prof`, and drives POST /api/v1/calculate (load.mjs's 100-device body) with
// autocannon: 3 s of warm-up, then PROFILE_SECONDS (10) at PROFILE_CONNECTIONS (25). SIGINT ends the
// app, which writes its profile. Prints the CPU per request (utime+stime from /proc/PID/stat over the
// measured run, divided by its requests) and the top PROFILE_TOP (20) self-time entries of that run
// by function+file, and by package. PROFILE_OUT=<file> keeps the .cpuprofile (Chrome DevTools opens it).
//
// anonymous (default): no cookie, each request from one of 1,000 addresses (X-Forwarded-For, which
// the app trusts here only: ADDRESS_HEADER), so the per-client limit (60 a minute) is not what is
// measured. member: signed in as the demo owner, members' limit lifted as in load.mjs. dashboard: the
// demo owner's GET /w/:workspace/sites (the sites dashboard, server-rendered), signed in the same way.
// CPU time, not latency: other work on the machine inflates it far less (some: shared caches and
// cores), so the load average is printed with it; compare builds side by side, at the same moment.
import autocannon from 'autocannon';
import { execFileSync } from 'node:child_process';
import { chmodSync, copyFileSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { selfTimes } from './cpu-profile.mjs';
import { freePort, log, runOrThrow, startService } from './lib.mjs';
import { calculation, people, signIn } from './load-requests.mjs';
import { migrateSeedAndStartStandIns, runThenCleanUp, standInEnv } from './local-services.mjs';

const AS = process.argv[2] ?? 'anonymous';
const SECONDS = Number(process.env.PROFILE_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.PROFILE_CONNECTIONS ?? 25);
const TOP = Number(process.env.PROFILE_TOP ?? 20);
const TICK_MS = 1000 / Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }));
const work = mkdtempSync(join(tmpdir(), 'runrate-profile-'));
chmodSync(work, 0o755); // PostgreSQL's tools run as the postgres user when this runs as root (load.mjs).
const children = [];
/** Preloaded into the app: SIGUSR2 ends it with process.exit, which also writes the profile. */
const EXIT_ON_USR2 = 'data:text/javascript,process.on("SIGUSR2",()=>process.exit(0))';
let pgEnv;

/** The process's CPU time so far (user + system), in ms. */
function cpuMs(pid) {
	const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
	return (Number(fields[11]) + Number(fields[12])) * TICK_MS;
}

const loadAverage = () => readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ');
const nowUs = () => Number(process.hrtime.bigint() / 1000n);
const round = (x, digits = 2) => Number(x.toFixed(digits));

/** autocannon's options for the mode: the body, and a cookie or rotating addresses. */
function requestOptions(base, cookie) {
	if (AS === 'dashboard')
		return { url: base, requests: [{ path: `/w/${people.workspaces[0].id}/sites`, headers: { cookie } }] };
	const headers = { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) };
	let n = 0;
	const setupRequest = (req) => {
		if (cookie) return req;
		n = (n + 1) % 1000;
		return { ...req, headers: { ...req.headers, 'x-forwarded-for': `10.0.${n >> 8}.${n & 255}` } };
	};
	const body = JSON.stringify(calculation());
	return {
		url: base,
		requests: [{ path: '/api/v1/calculate', method: 'POST', headers, body, setupRequest }]
	};
}

async function main() {
	if (!['anonymous', 'member', 'dashboard'].includes(AS))
		throw new Error('usage: profile-request.mjs [anonymous|member|dashboard]');
	const [pgPort, smtpPort, viewPort, s3Port, appPort] = await Promise.all(
		Array.from({ length: 5 }, freePort)
	);
	pgEnv = { PGDATA: join(work, 'pg'), PGPORT: String(pgPort) };
	const env = {
		DATABASE_URL: `postgres://postgres@127.0.0.1:${pgPort}/runrate`,
		AUTH_SECRET: 'profile-only-secret-0123456789abcdef',
		...standInEnv({ smtpPort, mailViewPort: viewPort, s3Port, s3Dir: join(work, 's3') })
	};
	await runOrThrow('bash', ['scripts/pg.sh', 'start'], { env: pgEnv });
	children.push(await migrateSeedAndStartStandIns(env));
	const base = `http://127.0.0.1:${appPort}`;
	const build = resolve(process.env.RUNRATE_BUILD_DIR || 'build', 'index.js');
	const app = await startService(
		'app',
		'node',
		['--cpu-prof', `--cpu-prof-dir=${join(work, 'prof')}`, '--import', EXIT_ON_USR2, build],
		{
			env: {
				...env,
				HOST: '127.0.0.1',
				PORT: String(appPort),
				ORIGIN: base,
				NODE_ENV: 'production',
				MEMBER_REQUESTS_PER_MINUTE: '100000000',
				...(AS === 'anonymous' ? { ADDRESS_HEADER: 'x-forwarded-for', XFF_DEPTH: '1' } : {})
			},
			ready: /Listening on/
		}
	);
	children.push(app);
	const cookie = AS === 'anonymous' ? undefined : await signIn(base, 'owner@example.org');
	const options = { connections: CONNECTIONS, ...requestOptions(base, cookie) };
	log(
		'profile',
		`${AS}: warm-up 3 s, then ${SECONDS} s at ${CONNECTIONS} connections; load ${loadAverage()}`
	);
	await autocannon({ ...options, duration: 3 });
	const [cpuBefore, fromUs] = [cpuMs(app.pid), nowUs()];
	const result = await autocannon({ ...options, duration: SECONDS });
	const [cpuAfter, toUs] = [cpuMs(app.pid), nowUs()];
	const loadAfter = loadAverage();
	const exited = new Promise((done) => app.once('exit', done));
	process.kill(app.pid, 'SIGINT');
	// A graceful stop can wait on the job queue (seen once under heavy load); then the preload ends it.
	const late = setTimeout(() => process.kill(app.pid, 'SIGUSR2'), 15_000);
	await exited;
	clearTimeout(late);
	const [file] = readdirSync(join(work, 'prof'));
	const profilePath = join(work, 'prof', file);
	if (process.env.PROFILE_OUT) copyFileSync(profilePath, process.env.PROFILE_OUT);

	const requests = result.requests.total;
	const cpuPerRequest = (cpuAfter - cpuBefore) / requests;
	const { total, byFunction, byArea, byStep } = selfTimes(profilePath, fromUs, toUs);
	console.log(
		`\n${AS}: ${requests} requests (${result['2xx']} 2xx, ${result.non2xx} other, ${result.errors} errors)`
	);
	console.log(`CPU per request (/proc/PID/stat): ${round(cpuPerRequest)} ms; load average ${loadAfter}`);
	console.log(`${total} profile ticks; each entry's CPU is its share of them × the CPU per request\n`);
	const share = (ticks) => `${round((100 * ticks) / total, 1)}%`;
	const perRequestUs = (ticks) => Math.round((1000 * cpuPerRequest * ticks) / total);
	console.log('| self time | µs per request | function | file |\n|---|---|---|---|');
	for (const [key, ticks] of byFunction.slice(0, TOP)) {
		const [name, where] = key.split('\t');
		console.log(`| ${share(ticks)} | ${perRequestUs(ticks)} | ${name} | ${where} |`);
	}
	console.log('\n| step | share | µs per request |\n|---|---|---|');
	for (const [name, ticks] of byStep) console.log(`| ${name} | ${share(ticks)} | ${perRequestUs(ticks)} |`);
	console.log('\n| self time | µs per request | package |\n|---|---|---|');
	for (const [name, ticks] of byArea.slice(0, TOP))
		console.log(`| ${share(ticks)} | ${perRequestUs(ticks)} | ${name} |`);
	return result.non2xx + result.errors === 0 ? 0 : 1;
}

await runThenCleanUp(main, { children, pgEnv: () => pgEnv, folders: [work] });
