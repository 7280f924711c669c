import { spawn, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import postgres from 'postgres';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { withPorts, wrapperConf } from './nginx';

// Issue 20, item 5: two app processes (the production build, `node build`) on two ports against one
// PostgreSQL, with Debian's nginx in front using the repo's deploy/nginx/runrate.conf. scripts/test.mjs
// runs this after the build, with its throwaway database, mail catcher and S3 stand-in. Direct requests
// carry X-Forwarded-For as the proxy would (the processes trust it: ADDRESS_HEADER, XFF_DEPTH=1).
// Invented addresses.
const tag = `two-${Date.now()}`;
const people = JSON.parse(readFileSync('data/demo-people.json', 'utf8'));
const work = mkdtempSync(join(tmpdir(), 'runrate-processes-'));
chmodSync(work, 0o755);
const sql = postgres(process.env.DATABASE_URL!, { max: 2, onnotice: () => {} });
const children: ChildProcess[] = [];
let a = '';
let b = '';
let proxy = '';

function freePort() {
	return new Promise<number>((done, fail) => {
		const server = createServer();
		server.on('error', fail);
		server.listen(0, '127.0.0.1', () => {
			const { port } = server.address() as { port: number };
			server.close(() => done(port));
		});
	});
}

/** Starts a child in its own process group; resolves once `ready` appears on its output (or at once). */
function startChild(command: string, args: string[], env: Record<string, string>, ready?: RegExp) {
	return new Promise<ChildProcess>((done, fail) => {
		const child = spawn(command, args, { env: { ...process.env, ...env }, detached: true });
		children.push(child);
		if (!ready) done(child);
		let seen = '';
		const onData = (d: Buffer) => {
			seen += d.toString();
			if (ready?.test(seen)) done(child);
		};
		child.stdout!.on('data', onData);
		child.stderr!.on('data', onData);
		child.on('exit', (code) => fail(new Error(`${command} exited with ${code}:\n${seen}`)));
	});
}

const ended = (child: ChildProcess) =>
	new Promise<void>((done) => (child.exitCode !== null ? done() : child.once('exit', () => done())));

beforeAll(async () => {
	const [portA, portB, portProxy] = await Promise.all([freePort(), freePort(), freePort()]);
	const base = (port: number) => `http://127.0.0.1:${port}`;
	[a, b, proxy] = [base(portA!), base(portB!), base(portProxy!)];
	// The e2e run before this one used the same database and client address: start from no counts.
	await sql`delete from rate_limit_hit`;
	await sql`delete from sign_in_lock`;
	const build = resolve(process.env.RUNRATE_BUILD_DIR || 'build');
	const app = (port: number) =>
		startChild(
			'node',
			[build],
			{
				HOST: '127.0.0.1',
				PORT: String(port),
				ORIGIN: proxy,
				ADDRESS_HEADER: 'X-Forwarded-For',
				XFF_DEPTH: '1',
				BODY_SIZE_LIMIT: '11M',
				NODE_ENV: 'production',
				LOG_LEVEL: 'warn'
			},
			/Listening on/
		);
	// One after the other, as scripts/cluster.mjs starts its workers (the job queue's schema first).
	await app(portA!);
	await app(portB!);
	const conf = join(work, 'runrate.conf');
	writeFileSync(conf, withPorts(portProxy!, [portA!, portB!]));
	writeFileSync(join(work, 'nginx.conf'), wrapperConf(work, conf, join(work, 'access.log')));
	const nginxArgs = ['-p', work, '-e', join(work, 'error.log'), '-c', join(work, 'nginx.conf')];
	await startChild('nginx', [...nginxArgs, '-g', 'daemon off;'], {});
	// Ready when the proxy answers (a refused connection until then); a hook cannot use expect.poll.
	for (
		let tries = 0;
		(await fetch(`${proxy}/health`).then(
			(r) => r.status,
			() => 0
		)) !== 200;
		tries++
	) {
		if (tries === 300) throw new Error('nginx did not answer /health');
		await new Promise((done) => setTimeout(done, 100));
	}
}, 120_000);

afterAll(async () => {
	for (const child of children) {
		try {
			process.kill(-child.pid!, 'SIGTERM');
		} catch {
			// Already gone.
		}
	}
	await Promise.all(children.map(ended));
	await sql.end({ timeout: 5 });
	rmSync(work, { recursive: true, force: true });
}, 60_000);

/** Posts a form action as the browser's enhanced form does; `from` is the client's address. */
function postForm(base: string, path: string, fields: Record<string, string>, from: string, cookie = '') {
	return fetch(`${base}${path}`, {
		method: 'POST',
		headers: {
			origin: proxy,
			'content-type': 'application/x-www-form-urlencoded',
			'x-sveltekit-action': 'true',
			'x-forwarded-for': from,
			'user-agent': `processes-test ${tag}`,
			...(cookie ? { cookie } : {})
		},
		body: new URLSearchParams(fields),
		redirect: 'manual'
	});
}

const signInAttempt = (base: string, email: string, password: string, from: string) =>
	postForm(base, '/signin?/password', { email, password }, from);

describe('two app processes behind one database', () => {
	it('ten wrong passwords spread across both lock the address on both', async () => {
		const email = `guessed-${tag}@example.org`;
		for (let i = 1; i <= 10; i++) {
			const answer = await signInAttempt(i % 2 ? a : b, email, `guess ${i}`, `198.51.100.${i}`);
			expect(await answer.text()).toContain('That e-mail and password do not match an account.');
		}
		for (const base of [a, b]) {
			const answer = await signInAttempt(base, email, 'guess 11', '198.51.100.50');
			expect(await answer.text()).toContain('Too many attempts.');
		}
	});

	it('a session made on one is valid on the other, and signing out on one ends it on both', async () => {
		const signedIn = await signInAttempt(a, 'owner@example.org', people.password, '198.51.100.60');
		const cookie = signedIn.headers
			.getSetCookie()
			.map((c) => c.split(';')[0]!)
			.find((c) => c.includes('session-token'));
		expect(cookie).toBeTruthy();
		const workspace = `/w/${people.workspaces[0].id}`;
		const open = (base: string) =>
			fetch(`${base}${workspace}`, {
				headers: { cookie: cookie!, 'x-forwarded-for': '198.51.100.60' },
				redirect: 'manual'
			});
		const onB = await open(b);
		expect(onB.status).toBe(200);
		expect(await onB.text()).toContain(people.workspaces[0].name.replace('&', '&amp;'));
		expect((await postForm(b, '/signout', {}, '198.51.100.60', cookie)).status).toBeLessThan(400);
		expect((await open(a)).status).toBe(303);
	});

	it('a job queued by one runs once', async () => {
		// Four sign-in links (each e-mail is a job in the shared pg-boss queue), two asked of each process.
		const addresses = [1, 2, 3, 4].map((i) => `once-${i}-${tag}@example.org`);
		for (const [i, email] of addresses.entries()) {
			const answer = await postForm(i % 2 ? b : a, '/signin?/link', { email }, `198.51.100.${70 + i}`);
			expect(answer.status).toBe(200);
		}
		const jobs = () => sql<{ state: string; retry_count: number }[]>`
			select state, retry_count from pgboss.job
			where name = 'send-mail' and data->>'to' in ${sql(addresses)}`;
		await expect
			.poll(async () => (await jobs()).map((j) => j.state).join(','), { timeout: 30_000 })
			.toBe('completed,completed,completed,completed');
		expect((await jobs()).every((j) => j.retry_count === 0)).toBe(true);
		for (const email of addresses) {
			const mails = await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(email)}`);
			expect(await mails.json()).toHaveLength(1);
		}
	});
});

describe('the reverse proxy in front of them (deploy/nginx/runrate.conf)', () => {
	it('spreads requests over both processes', async () => {
		for (let i = 0; i < 6; i++) expect((await fetch(`${proxy}/health`)).status).toBe(200);
		const upstreams = new Set(readFileSync(join(work, 'access.log'), 'utf8').trim().split('\n'));
		expect([...upstreams].sort()).toEqual([a, b].map((base) => base.replace('http://', '')).sort());
	});

	it('the API budget counts the real client address across both processes, whatever the client claims', async () => {
		// 60 a minute per client (src/lib/server/http/rate-limits.ts). Every request claims another
		// address; nginx appends the real one (127.0.0.1), which is the one counted. Shared through the
		// batched store, the two processes admit at most 2 × 9 past the budget; counting apart, 120.
		let admitted = 0;
		let refused = false;
		for (let i = 0; i < 120 && !refused; i++) {
			const answer = await fetch(`${proxy}/api/v1/calculate`, {
				method: 'POST',
				headers: {
					'content-type': 'application/json',
					'x-forwarded-for': `10.${i}.0.1`,
					'user-agent': `budget-test ${tag}`
				},
				body: '{}'
			});
			await answer.arrayBuffer();
			if (answer.status === 429) refused = true;
			else admitted++;
		}
		expect(refused).toBe(true);
		expect(admitted).toBeGreaterThanOrEqual(60);
		expect(admitted).toBeLessThanOrEqual(60 + 2 * 9);
	});
});
