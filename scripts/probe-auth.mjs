// Repeats the attacker's sign-in probes of issue 14 (items 2, 5, 8, 10) against a running Runrate with the
// demo data, and prints each as closed or OPEN. Sends only to 127.0.0.1.
//
//   node scripts/probe-auth.mjs            # the app of `npm start` (port 3000, e-mail view on 3025)
//   PROBE_URL=http://127.0.0.1:4173 MAIL_VIEW_URL=http://127.0.0.1:3025 node scripts/probe-auth.mjs
//
// It sends one wrong password for the demo viewer (nine more in 15 minutes would lock that address), signs
// in as the viewer and asks Auth.js for sign-in e-mails to an invented address.
import { request as httpRequest } from 'node:http';

const app = new URL(process.env.PROBE_URL ?? 'http://127.0.0.1:3000');
const mailView = process.env.MAIL_VIEW_URL ?? 'http://127.0.0.1:3025';
if (app.hostname !== '127.0.0.1' || new URL(mailView).hostname !== '127.0.0.1')
	throw new Error('This probe only talks to 127.0.0.1.');
const PASSWORD = 'runrate-demo-2027';
const UA = `runrate-probe-auth-${Date.now()}`;
const results = [];

/** One HTTP request through node:http, which adds no User-Agent unless one is given. */
function send(method, path, { body = '', headers = {} } = {}) {
	return new Promise((resolve, reject) => {
		const req = httpRequest(
			new URL(path, app),
			{ method, headers: { origin: app.origin, ...headers } },
			(res) => {
				let text = '';
				res.on('data', (chunk) => (text += chunk));
				res.on('end', () => resolve({ status: res.statusCode, headers: res.headers, body: text }));
			}
		);
		req.on('error', reject);
		req.end(body);
	});
}
const form = (fields) => new URLSearchParams(fields).toString();
const FORM = { 'content-type': 'application/x-www-form-urlencoded' };
const ACTION = { ...FORM, 'x-sveltekit-action': 'true', accept: 'application/json' };
const cookiesOf = (res) => (res.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]).join('; ');
const report = (item, closed, figure) => results.push({ item, closed, figure });
const mailsTo = async (to) =>
	(await (await fetch(`${mailView}/messages?to=${encodeURIComponent(to)}`)).json()).length;

// Item 2: the right password straight to Auth.js, and Auth.js's e-mail sign-in called directly.
const direct = await send('POST', '/auth/callback/password', {
	body: form({ email: 'viewer@example.org', password: PASSWORD, callbackUrl: '/workspaces' }),
	headers: { ...FORM, 'user-agent': UA }
});
const session = cookiesOf(direct).includes('session-token');
report(
	'2 password to /auth/callback/password',
	direct.status === 404 && !session,
	`${direct.status}, session ${session}`
);
const target = `probe-${Date.now()}@example.org`;
const statuses = [];
for (let i = 0; i < 5; i++)
	statuses.push(
		(
			await send('POST', '/auth/signin/email', {
				body: form({ email: target }),
				headers: { ...FORM, 'user-agent': UA }
			})
		).status
	);
// A queued e-mail leaves within a few seconds; wait long enough to see one.
await new Promise((done) => setTimeout(done, 8000));
const sent = await mailsTo(target);
report('2 e-mails from /auth/signin/email (5 posts)', sent === 0, `${statuses.join(' ')}, ${sent} e-mails`);

// Item 5: a wrong password without a User-Agent, then the right one from a browser.
const wrong = await send('POST', '/signin?/password', {
	body: form({ email: 'viewer@example.org', password: 'not the password' }),
	headers: ACTION
});
const right = await send('POST', '/signin?/password', {
	body: form({ email: 'viewer@example.org', password: PASSWORD }),
	headers: { ...ACTION, 'user-agent': UA }
});
const signedIn = JSON.parse(right.body).type === 'redirect';
report(
	'5 no-UA wrong password, then the right one',
	signedIn,
	`${JSON.parse(wrong.body).status} then ${right.body.slice(0, 60)}`
);
const api = await send('POST', '/api/v1/calculate', {
	body: '{}',
	headers: { 'content-type': 'application/json' }
});
report('5 anonymous API call without a User-Agent', api.status !== 429, String(api.status));

// Item 8: hostile next= values for a signed-in person.
const cookie = cookiesOf(right);
for (const next of ['/%09/evil.example', '/%0A/x', '/%0D/x', '/%00/x', '/%E6%97%A5']) {
	const res = await send('GET', `/signin?next=${next}`, { headers: { cookie, 'user-agent': UA } });
	const location = res.headers.location ?? '';
	const stays = res.status === 303 && /^\/(?!\/)[\x21-\x7e]*$/.test(location);
	report(`8 next=${next}`, stays, `${res.status} ${JSON.stringify(location)}`);
}

// Item 10: a forged sign-in link and an unknown provider.
for (const path of [
	'/auth/callback/email?token=forged-token-000&email=nobody%40example.org',
	'/auth/signin/nope'
]) {
	const res = await send('GET', path, { headers: { 'user-agent': UA } });
	const readable = res.status < 500 && res.headers['x-frame-options'] === 'DENY';
	report(`10 ${path.split('?')[0]}`, readable, `${res.status} ${res.headers.location ?? ''}`);
}

for (const r of results) console.log(`${r.closed ? 'closed' : 'OPEN  '}  ${r.item.padEnd(46)} ${r.figure}`);
process.exit(results.every((r) => r.closed) ? 0 : 1);
