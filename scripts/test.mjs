// `npm test`: every check, against a throwaway PostgreSQL and the local stand-ins, ending with one line
// "N passed, N failed". `npm test -- unit e2e` runs only the named suites. `processes` (two app
// processes behind nginx, and nginx's check of the repo's proxy configuration) runs on the build.
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { ensureDependencies, freePort, log, run, runOrThrow, stopGroup } from './lib.mjs';
import { migrateSeedAndStartStandIns, standInEnv } from './local-services.mjs';

const ALL = ['types', 'lint', 'format', 'unit', 'integration', 'e2e', 'processes'];
const wanted = process.argv.slice(2).filter((a) => ALL.includes(a));
const suites = wanted.length ? wanted : ALL;
const needsServices = suites.some((s) => s === 'integration' || s === 'e2e' || s === 'processes');
const needsBuild = suites.some((s) => s === 'e2e' || s === 'processes');

const tally = { passed: 0, failed: 0 };
const summary = [];
const work = mkdtempSync(join(tmpdir(), 'runrate-test-'));
// The cluster runs as Debian's postgres user, which must be able to enter this folder (when TMPDIR sits in
// a private folder, pg.sh keeps the cluster in ~postgres instead; `pg.sh drop` removes it either way).
chmodSync(work, 0o755);
const children = [];
let pgEnv = null;

function record(name, passed, failed, seconds) {
	tally.passed += passed;
	tally.failed += failed;
	summary.push(
		`${name.padEnd(12)} ${String(passed).padStart(4)} passed ${String(failed).padStart(3)} failed  ${seconds.toFixed(1)} s`
	);
}

async function timed(fn) {
	const t = performance.now();
	const result = await fn();
	return { ...result, seconds: (performance.now() - t) / 1000 };
}

/** A static check counts as one test. */
async function check(name, command, args) {
	log('test', `${name}: ${command} ${args.join(' ')}`);
	const r = await timed(() => run(command, args));
	record(name, r.code === 0 ? 1 : 0, r.code === 0 ? 0 : 1, r.seconds);
}

async function vitest(project, env) {
	const out = join(work, `vitest-${project}.json`);
	log('test', `${project}: vitest`);
	const r = await timed(() =>
		run(
			'npx',
			[
				'vitest',
				'run',
				'--project',
				project,
				'--reporter=default',
				'--reporter=json',
				`--outputFile.json=${out}`
			],
			{ env }
		)
	);
	if (!existsSync(out)) return record(project, 0, 1, r.seconds);
	const report = JSON.parse(readFileSync(out, 'utf8'));
	const failedFiles = report.testResults.filter(
		(f) => f.status === 'failed' && f.assertionResults.length === 0
	).length;
	record(
		project,
		report.numPassedTests,
		report.numFailedTests +
			failedFiles +
			(r.code !== 0 && report.numFailedTests === 0 && failedFiles === 0 ? 1 : 0),
		r.seconds
	);
}

/** Installs a Debian package with apt-get when its `binary` is missing; `purpose` says in the log what needs it. */
async function ensureDebianPackage(binary, pkg, purpose) {
	if (existsSync(binary)) return;
	log('test', `installing Debian's ${pkg} for ${purpose}`);
	await runOrThrow('apt-get', ['update', '-qq']);
	await runOrThrow('apt-get', ['install', '-y', '-qq', pkg], { env: { DEBIAN_FRONTEND: 'noninteractive' } });
}

/** Chromium runs the end-to-end tests. */
const ensureChromium = () => ensureDebianPackage('/usr/bin/chromium', 'chromium', 'the end-to-end tests');

/** Debian's nginx checks deploy/nginx/runrate.conf and proxies the two-process test (never as a daemon). */
const ensureNginx = () => ensureDebianPackage('/usr/sbin/nginx', 'nginx', 'the reverse proxy tests');

/** LibreOffice Calc recalculates the exported workbook in the integration tests (headless, no GUI). */
const ensureLibreOffice = () =>
	ensureDebianPackage('/usr/bin/soffice', 'libreoffice-calc-nogui', 'the workbook recalculation test');

async function startServices() {
	const [pgPort, smtpPort, mailViewPort, s3Port, appPort] = await Promise.all(
		Array.from({ length: 5 }, freePort)
	);
	pgEnv = { PGDATA: join(work, 'pg'), PGPORT: String(pgPort) };
	await runOrThrow('bash', ['scripts/pg.sh', 'start'], { env: pgEnv });
	const env = {
		DATABASE_URL: `postgres://postgres@127.0.0.1:${pgPort}/runrate`,
		AUTH_SECRET: 'test-only-secret-not-for-production-0123456789',
		...standInEnv({ smtpPort, mailViewPort, s3Port, s3Dir: join(work, 's3') }),
		APP_PORT: String(appPort),
		PGPORT: String(pgPort),
		PGDATA: pgEnv.PGDATA,
		// Inside the project (so the bundle finds node_modules), one folder per run.
		RUNRATE_BUILD_DIR: join('.test-build', basename(work))
	};
	children.push(await migrateSeedAndStartStandIns(env));
	return env;
}

async function cleanup() {
	for (const child of children) stopGroup(child);
	if (pgEnv) await run('bash', ['scripts/pg.sh', 'drop'], { env: pgEnv, quiet: true });
	rmSync(work, { recursive: true, force: true });
	rmSync(join('.test-build', basename(work)), { recursive: true, force: true });
}

let exitCode = 0;
try {
	ensureDependencies();
	await runOrThrow('npx', ['svelte-kit', 'sync']);
	if (suites.includes('types'))
		await check('types', 'npx', ['svelte-check', '--tsconfig', './tsconfig.json', '--fail-on-warnings']);
	if (suites.includes('lint')) await check('lint', 'npx', ['eslint', '.']);
	if (suites.includes('format')) await check('format', 'npx', ['prettier', '--check', '.']);
	if (suites.includes('unit')) await vitest('unit', {});
	if (needsServices) {
		if (suites.includes('e2e')) await ensureChromium();
		if (suites.includes('integration')) await ensureLibreOffice();
		const env = await startServices();
		if (suites.includes('integration')) await vitest('integration', env);
		let built = false;
		if (needsBuild) {
			log('test', 'building the production bundle');
			const build = await timed(() => run('npx', ['vite', 'build', '--logLevel', 'warn'], { env }));
			built = build.code === 0;
			if (!built) record('build', 0, 1, build.seconds);
		}
		if (built && suites.includes('e2e')) {
			const out = join(work, 'playwright.json');
			const r = await timed(() =>
				run(
					'npx',
					[
						'playwright',
						'test',
						...(process.env.E2E_GREP ? ['--grep', process.env.E2E_GREP] : []),
						...(process.env.E2E_REPEAT ? ['--repeat-each', process.env.E2E_REPEAT] : [])
					],
					{ env: { ...env, PLAYWRIGHT_JSON_OUTPUT_NAME: out } }
				)
			);
			if (!existsSync(out)) record('e2e', 0, 1, r.seconds);
			else {
				const { stats } = JSON.parse(readFileSync(out, 'utf8'));
				record(
					'e2e',
					stats.expected + stats.flaky,
					stats.unexpected + (r.code !== 0 && stats.unexpected === 0 ? 1 : 0),
					r.seconds
				);
			}
		}
		if (built && suites.includes('processes')) {
			await ensureNginx();
			await vitest('processes', env);
		}
	}
} catch (error) {
	console.error(`[test] ${error.message}`);
	tally.failed += 1;
} finally {
	await cleanup();
}
console.log('\n' + summary.join('\n'));
if (tally.failed > 0) exitCode = 1;
console.log(`${tally.passed} passed, ${tally.failed} failed`);
process.exit(exitCode);
