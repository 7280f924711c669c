// `npm run probe` runs this and the other probe-* scripts in turn against a running Runrate (`npm start`).
// This one repeats the three high-severity attacks of the outside probe and says, for each, whether it is
// closed. It sends requests only to loopback addresses.
//
//   node scripts/probe-high.mjs [--base http://127.0.0.1:3000] [--mail http://127.0.0.1:3025]
//
// 1. One anonymous request freezing the server: 2,000 devices × 8 windows (about 750 KB) and a 950 KB
//    body of the same kind to the calculation endpoint, while /health is asked every 50 ms.
// 2. The password lock bypassed through Auth.js's own endpoints: ten wrong passwords through the form,
//    then the right one straight to /auth/callback/password; and eleven sign-in e-mails straight through
//    /auth/signin/email.
// 3. An account taken before its owner signs up: a sign-up with someone else's address and a password
//    of the attacker's choosing, then the owner proves the address (by an e-mailed sign-in link, or by
//    the confirmation the squatting sign-up sent), then the attacker's password is tried.
//
// Each attack uses fresh invented addresses under example.org. Exit code 0 when all are closed.
import { performance } from 'node:perf_hooks';

const args = Object.fromEntries(
	process.argv
		.slice(2)
		.join(' ')
		.split('--')
		.filter(Boolean)
		.map((pair) => pair.trim().split(/\s+/))
);
const BASE = args.base ?? process.env.PROBE_URL ?? 'http://127.0.0.1:3000';
const MAIL = args.mail ?? process.env.MAIL_VIEW_URL ?? 'http://127.0.0.1:3025';

for (const url of [BASE, MAIL]) {
	const host = new URL(url).hostname;
	if (!(host === 'localhost' || host === '[::1]' || /^127\.\d+\.\d+\.\d+$/.test(host)))
		throw new Error(`The probe sends only to loopback addresses; ${url} is not one.`);
}

const results = [];
const report = (item, closed, detail) => {
	results.push({ item, closed });
	console.log(`${closed ? 'CLOSED' : 'OPEN  '}  ${item}: ${detail}`);
};

/** A tiny cookie jar: one browser. */
let browsers = 0;
class Browser {
	cookies = new Map();
	// Each browser has its own User-Agent, as different people's browsers do.
	userAgent = `runrate-probe/${process.pid}.${++browsers}`;
	header() {
		return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
	}
	take(response) {
		for (const line of response.headers.getSetCookie?.() ?? []) {
			const [pair] = line.split(';');
			const at = pair.indexOf('=');
			const name = pair.slice(0, at).trim();
			const value = pair.slice(at + 1).trim();
			if (value === '' || /max-age=0|expires=thu, 01 jan 1970/i.test(line)) this.cookies.delete(name);
			else this.cookies.set(name, value);
		}
	}
	hasSession() {
		return [...this.cookies.keys()].some((name) => name.includes('session-token'));
	}
	async fetch(path, init = {}) {
		const headers = new Headers(init.headers);
		headers.set('user-agent', this.userAgent);
		headers.set('origin', BASE);
		if (this.cookies.size) headers.set('cookie', this.header());
		const response = await fetch(new URL(path, BASE), { ...init, headers, redirect: 'manual' });
		this.take(response);
		return response;
	}
	/** Follows redirects on our own origin, as a browser would. */
	async visit(path) {
		let response = await this.fetch(path);
		for (let hops = 0; hops < 10 && response.status >= 300 && response.status < 400; hops++) {
			const next = new URL(response.headers.get('location'), BASE);
			if (next.origin !== new URL(BASE).origin) break;
			response = await this.fetch(next.pathname + next.search);
		}
		return response;
	}
	post(path, fields, headers = {}) {
		return this.fetch(path, {
			method: 'POST',
			headers: { 'content-type': 'application/x-www-form-urlencoded', ...headers },
			body: new URLSearchParams(fields).toString()
		});
	}
	/** Submits one of Runrate's form actions as its enhanced form does; answers the action's status. */
	async action(path, fields) {
		const response = await this.post(path, fields, {
			'x-sveltekit-action': 'true',
			accept: 'application/json'
		});
		const result = await response.json().catch(() => ({}));
		if (result.type === 'failure') return result.status;
		if (result.type === 'redirect') return 303;
		return response.status;
	}
}

const unique = (tag) => `probe-${tag}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.org`;

async function mails(to) {
	const list = await (await fetch(`${MAIL}/messages?to=${encodeURIComponent(to)}`)).json();
	return list;
}

async function waitForMail(to, subject, count = 1) {
	const until = Date.now() + 15_000;
	while (Date.now() < until) {
		const found = (await mails(to)).filter((m) => subject.test(m.subject));
		if (found.length >= count) return found.at(-1);
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error(`no e-mail "${subject}" reached ${to}`);
}

/** Signs up through the form; the sign-up limit (20 an hour from one address) stops the probe with a word. */
async function signUp(browser, fields) {
	const status = await browser.action('/signup', fields);
	if (status === 429)
		throw new Error('sign-up is rate limited from this address (20 an hour, counted in the database): wait');
}

const linkIn = (text) => text.match(/https?:\/\/\S+/)?.[0];

// ---------------------------------------------------------------------------------------------------
// 1. One request freezing the server

function hostileCalculation(devices, windows) {
	const window = { start: '00:01', end: '00:02' };
	return JSON.stringify({
		timezone: 'America/Chicago',
		period: { start: '2027-01', months: 12 },
		holidays: null,
		tariff: { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1 }] },
		equipment: Array.from({ length: devices }, (_, i) => ({
			name: `Pump ${i}`,
			power: { watts: 100 },
			schedule: { type: 'windows', windows: Array.from({ length: windows }, () => window) }
		}))
	});
}

async function probeFreeze() {
	for (const [devices, windows] of [
		[2000, 8],
		[2000, 12]
	]) {
		const body = hostileCalculation(devices, windows);
		const kb = Math.round(Buffer.byteLength(body) / 1024);
		let worstHealthMs = 0;
		let polling = true;
		const poller = (async () => {
			while (polling) {
				const t = performance.now();
				// A reset connection counts as a slow answer, not as the end of the probe.
				await fetch(`${BASE}/health`, { headers: { 'user-agent': 'runrate-probe' } }).catch(() => null);
				worstHealthMs = Math.max(worstHealthMs, performance.now() - t);
				await new Promise((r) => setTimeout(r, 50));
			}
		})();
		const t = performance.now();
		const response = await fetch(`${BASE}/api/v1/calculate`, {
			method: 'POST',
			headers: { 'content-type': 'application/json', 'user-agent': 'runrate-probe' },
			body
		});
		const text = await response.text();
		const ms = performance.now() - t;
		polling = false;
		await poller;
		const closed = response.status < 500 && ms < 1000 && worstHealthMs < 500 && text.length < 100_000;
		report(
			`1. freeze (${kb} KB body)`,
			closed,
			`${response.status} in ${ms.toFixed(0)} ms, answer ${(text.length / 1024).toFixed(1)} KB, /health worst ${worstHealthMs.toFixed(0)} ms`
		);
	}
}

// ---------------------------------------------------------------------------------------------------
// 2. Auth.js's endpoints as a second door

async function confirmedAccount(tag, password) {
	const email = unique(tag);
	const owner = new Browser();
	await signUp(owner, { name: 'Probe Person', email, password, confirm: password });
	const mail = await waitForMail(email, /confirm/i);
	// The confirmation link confirms only together with the password chosen at sign-up.
	const token = new URL(linkIn(mail.text)).searchParams.get('token') ?? '';
	await owner.action('/signup/confirm', { token, password });
	return email;
}

async function directPasswordCallback(browser, email, password) {
	const csrf = await (await browser.fetch('/auth/csrf')).json().catch(() => ({}));
	const response = await browser.post('/auth/callback/password', {
		email,
		password,
		csrfToken: csrf.csrfToken ?? ''
	});
	return { status: response.status, session: browser.hasSession() };
}

async function probeLockBypass() {
	const password = 'probe-password-0123';
	const email = await confirmedAccount('lock', password);
	const attacker = new Browser();
	let last = 0;
	for (let i = 0; i < 11; i++)
		last = await attacker.action('/signin?/password', { email, password: 'wrong-guess-000' });
	const direct = await directPasswordCallback(new Browser(), email, password);
	let guessesRefused = 0;
	for (let i = 0; i < 5; i++) {
		const r = await directPasswordCallback(new Browser(), email, `wrong-${i}-guess`);
		if (r.status === 403 || r.status === 404 || r.status === 429 || r.status === 405) guessesRefused++;
	}
	report(
		'2a. password lock through /auth/callback/password',
		last === 429 && !direct.session && guessesRefused === 5,
		`form after 11 wrong: ${last}; right password straight to Auth.js: ${direct.status}, session ${direct.session ? 'made' : 'not made'}; direct wrong guesses refused ${guessesRefused}/5`
	);

	const target = unique('bomb');
	const before = (await mails(target)).length;
	const sender = new Browser();
	for (let i = 0; i < 11; i++) {
		const csrf = await (await sender.fetch('/auth/csrf')).json().catch(() => ({}));
		await sender.post('/auth/signin/email', { email: target, csrfToken: csrf.csrfToken ?? '' });
	}
	await new Promise((r) => setTimeout(r, 3000));
	const sent = (await mails(target)).length - before;
	report(
		'2b. e-mail bombing through /auth/signin/email',
		sent === 0,
		`${sent} e-mails sent by 11 direct posts`
	);
}

// ---------------------------------------------------------------------------------------------------
// 3. Account pre-hijack

async function attackerSignsUp(email, password) {
	await signUp(new Browser(), { name: 'Not The Owner', email, password, confirm: password });
}

async function attackerCanSignIn(email, password) {
	const attacker = new Browser();
	const status = await attacker.action('/signin?/password', { email, password });
	return { taken: attacker.hasSession() || status === 303, status };
}

async function probePreHijack() {
	const attackerPassword = 'attacker-chose-this-1';
	{
		const victim = unique('victim-link');
		await attackerSignsUp(victim, attackerPassword);
		const owner = new Browser();
		await owner.action('/signin?/link', { email: victim });
		const mail = await waitForMail(victim, /sign-in link/i);
		const link = new URL(linkIn(mail.text));
		await owner.visit(link.pathname + link.search);
		const ownerIn = owner.hasSession();
		const { taken, status } = await attackerCanSignIn(victim, attackerPassword);
		report(
			'3a. pre-hijack, owner signs in by e-mailed link',
			ownerIn && !taken,
			`owner signed in: ${ownerIn}; attacker's password then ${taken ? 'WORKS' : 'refused'} (${status})`
		);
	}
	{
		const victim = unique('victim-confirm');
		await attackerSignsUp(victim, attackerPassword);
		const mail = await waitForMail(victim, /confirm/i);
		const link = new URL(linkIn(mail.text));
		await new Browser().visit(link.pathname + link.search);
		const { taken, status } = await attackerCanSignIn(victim, attackerPassword);
		report(
			"3b. pre-hijack, owner clicks the squatter's confirmation",
			!taken,
			`attacker's password then ${taken ? 'WORKS' : 'refused'} (${status})`
		);
	}
}

try {
	const health = await fetch(`${BASE}/health`).catch(() => null);
	if (!health?.ok) throw new Error(`Runrate does not answer at ${BASE}/health: start it with npm start`);
	if (!process.env.PROBE_SKIP_FREEZE) await probeFreeze();
	await probeLockBypass();
	await probePreHijack();
} catch (error) {
	console.error(`[probe] ${error.message}`);
	process.exit(2);
}
const open = results.filter((r) => !r.closed).length;
console.log(`\n${results.length - open} closed, ${open} open`);
process.exit(open ? 1 : 0);
