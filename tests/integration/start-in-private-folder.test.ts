import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir, userInfo } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';

// `npm start` from a clone in a private folder (mode 0700, as root's home is): as root, PostgreSQL runs as
// Debian's postgres user, which cannot enter the folder, so the cluster must live where it can
// (~postgres/runrate/…) and the folder must keep its mode.
//
// The clone is a `git clone` of this checkout's HEAD (commit first to test a change). It is the real
// start path, build included (about 40 s of CPU): only node_modules is a hard-linked copy (`cp -al`),
// since `npm ci` would fetch from the registry and take minutes. Every port is a free one, so a
// running `npm start` on this machine is untouched.
const RUNNING = /Runrate is running at (\S+)/;
const STARTED_WITHIN_MS = 420_000;

const outer = mkdtempSync(join(tmpdir(), 'runrate-private-'));
const clone = join(outer, 'runrate');
const asRoot = userInfo().uid === 0;
let start: ChildProcess | null = null;
let pgPort = 0;

function freePort() {
	return new Promise<number>((resolve, reject) => {
		const server = createServer();
		server.on('error', reject);
		server.listen(0, '127.0.0.1', () => {
			const { port } = server.address() as { port: number };
			server.close(() => resolve(port));
		});
	});
}

/** Only what a person's shell would have: none of the test run's own database or build settings. */
function cleanEnv(ports: Record<string, number>) {
	const env: Record<string, string> = {};
	for (const name of ['PATH', 'HOME', 'LANG', 'TMPDIR'])
		if (process.env[name]) env[name] = process.env[name]!;
	for (const [name, port] of Object.entries(ports)) env[name] = String(port);
	return env;
}

/** Resolves with the start output so far once `pattern` appears; rejects if start exits first. */
function waitForOutput(child: ChildProcess, pattern: RegExp, timeoutMs: number) {
	return new Promise<string>((resolve, reject) => {
		let seen = '';
		const timer = setTimeout(
			() => reject(new Error(`no ${pattern} within ${timeoutMs} ms:\n${seen}`)),
			timeoutMs
		);
		const onData = (d: Buffer) => {
			seen += d.toString();
			if (pattern.test(seen)) {
				clearTimeout(timer);
				resolve(seen);
			}
		};
		child.stdout!.on('data', onData);
		child.stderr!.on('data', onData);
		child.on('exit', (code) => {
			clearTimeout(timer);
			reject(new Error(`npm start exited with ${code}:\n${seen}`));
		});
	});
}

function exited(child: ChildProcess, timeoutMs: number) {
	return new Promise<boolean>((resolve) => {
		if (child.exitCode !== null || child.signalCode !== null) return resolve(true);
		const timer = setTimeout(() => resolve(false), timeoutMs);
		child.once('exit', () => {
			clearTimeout(timer);
			resolve(true);
		});
	});
}

afterAll(async () => {
	if (start?.pid) {
		start.kill('SIGTERM');
		if (!(await exited(start, 30_000))) process.kill(-start.pid, 'SIGKILL');
	}
	// The cluster may live outside the clone (in ~postgres): pg.sh drop removes it wherever it is.
	if (pgPort)
		execFileSync('bash', ['scripts/pg.sh', 'drop'], {
			cwd: clone,
			env: cleanEnv({ PGPORT: pgPort }),
			stdio: 'pipe'
		});
	rmSync(outer, { recursive: true, force: true });
}, 120_000);

describe('npm start from a clone in a private folder', () => {
	it(
		'keeps the cluster where PostgreSQL can reach it, says so, and answers /health',
		async () => {
			expect(statSync(outer).mode & 0o777).toBe(0o700);
			execFileSync('git', ['clone', '--quiet', process.cwd(), clone], { stdio: 'pipe' });
			execFileSync('cp', ['-al', join(process.cwd(), 'node_modules'), join(clone, 'node_modules')]);
			// A fresh checkout's lockfile is newer than the copied install: date it back, or start runs npm ci.
			execFileSync('touch', [
				'-r',
				join(clone, 'node_modules/.package-lock.json'),
				join(clone, 'package-lock.json')
			]);

			const [port, pg, smtp, mailView, s3] = await Promise.all(Array.from({ length: 5 }, freePort));
			pgPort = pg!;
			start = spawn('node', ['scripts/start.mjs'], {
				cwd: clone,
				env: cleanEnv({
					PORT: port!,
					PGPORT: pg!,
					SMTP_PORT: smtp!,
					MAIL_VIEW_PORT: mailView!,
					S3_PORT: s3!
				}),
				stdio: ['ignore', 'pipe', 'pipe'],
				detached: true
			});
			const output = await waitForOutput(start, RUNNING, STARTED_WITHIN_MS);

			const health = await fetch(`${RUNNING.exec(output)![1]}/health`);
			expect(health.status).toBe(200);
			expect(await health.json()).toEqual({ ok: true, database: 'up' });

			const where = execFileSync('bash', ['scripts/pg.sh', 'where'], {
				cwd: clone,
				env: cleanEnv({ PGPORT: pg! })
			})
				.toString()
				.trim();
			expect(output).toContain(`(data in ${where})`);
			if (asRoot) {
				expect(where).toMatch(/\/runrate\/runrate-[0-9a-f]{12}\/pg$/);
				expect(where.startsWith(outer)).toBe(false);
				expect(output).toContain('the postgres user cannot enter');
				expect(output).toContain(`keeping this checkout's cluster in ${where}`);
			}
			// Nothing was loosened to get there.
			expect(statSync(outer).mode & 0o777).toBe(0o700);
		},
		STARTED_WITHIN_MS + 60_000
	);
});
