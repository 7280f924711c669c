// Shared by start.mjs and test.mjs: dependency install, free ports, child processes, the local secret.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';

export const root = new URL('..', import.meta.url).pathname.replace(/\/$/, '');

export function log(tag, message) {
	console.log(`[${tag}] ${message}`);
}

/** `npm ci` when node_modules is missing or older than the lockfile. */
export function ensureDependencies() {
	const marker = `${root}/node_modules/.package-lock.json`;
	const lock = `${root}/package-lock.json`;
	if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
	log('deps', 'installing dependencies with npm ci');
	const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
	if (result.status !== 0) throw new Error('npm ci failed');
}

export function freePort() {
	return new Promise((resolve, reject) => {
		const server = createServer();
		server.unref();
		server.on('error', reject);
		server.listen(0, '127.0.0.1', () => {
			const { port } = server.address();
			server.close(() => resolve(port));
		});
	});
}

/** Runs a command to completion; resolves with its exit code. */
export function run(command, args, { env = {}, quiet = false } = {}) {
	return new Promise((resolve) => {
		const child = spawn(command, args, {
			cwd: root,
			env: { ...process.env, ...env },
			stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit'
		});
		let output = '';
		if (quiet) {
			child.stdout.on('data', (d) => (output += d));
			child.stderr.on('data', (d) => (output += d));
		}
		child.on('close', (code) => resolve({ code: code ?? 1, output }));
	});
}

export function runOrThrow(command, args, options) {
	return run(command, args, options).then((r) => {
		if (r.code !== 0) {
			if (r.output) process.stderr.write(r.output);
			throw new Error(`${command} ${args.join(' ')} exited with ${r.code}`);
		}
		return r;
	});
}

/** Starts a long-running child; resolves once a line matching `ready` appears on its output. */
export function startService(name, command, args, { env = {}, ready, timeoutMs = 60_000 }) {
	return new Promise((resolve, reject) => {
		// Its own process group, so stopGroup() ends the whole tree it starts.
		const child = spawn(command, args, {
			cwd: root,
			env: { ...process.env, ...env },
			stdio: ['ignore', 'pipe', 'pipe'],
			detached: true
		});
		let seen = '';
		const timer = setTimeout(
			() => reject(new Error(`${name} did not start within ${timeoutMs} ms:\n${seen}`)),
			timeoutMs
		);
		const onData = (d) => {
			const text = d.toString();
			if (seen.length < 20_000) seen += text;
			if (process.env.RUNRATE_VERBOSE) process.stdout.write(`[${name}] ${text}`);
			if (ready.test(seen)) {
				clearTimeout(timer);
				resolve(child);
			}
		};
		child.stdout.on('data', onData);
		child.stderr.on('data', onData);
		child.on('exit', (code) => {
			clearTimeout(timer);
			reject(new Error(`${name} exited with ${code}:\n${seen}`));
		});
	});
}

/** Ends a service started by startService, with everything it started. */
export function stopGroup(child, signal = 'SIGTERM') {
	try {
		process.kill(-child.pid, signal);
	} catch {
		// Already gone.
	}
}

/** TypeScript scripts run in one Node process through tsx's loader (no npx/tsx wrapper processes). */
export const tsNode = (script) => [process.execPath, ['--import', 'tsx', script]];

/** A secret for Auth.js, made once per checkout and kept in the git-ignored .data folder. */
export function localSecret() {
	const file = `${root}/.data/auth-secret`;
	mkdirSync(`${root}/.data`, { recursive: true });
	if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
	return readFileSync(file, 'utf8').trim();
}
