// node scripts/probe-accounts.mjs — repeats issue 14's account probes (items 3, 6 and 12) against a running
// Runrate on loopback with the demo data, as an outside caller would: plain HTTP, its own cookie jars, the
// sign-in e-mails read from the local mail catcher. Prints one line per probe, "open" or "closed", with the
// figures behind it. Sends only to 127.0.0.1; every address it makes is invented (example.org).
//
//   PROBE_URL=http://127.0.0.1:4173 MAIL_VIEW_URL=http://127.0.0.1:3025 node scripts/probe-accounts.mjs
import { readFileSync } from 'node:fs';

const base = new URL(process.env.PROBE_URL ?? 'http://127.0.0.1:3000');
const mailView = new URL(process.env.MAIL_VIEW_URL ?? 'http://127.0.0.1:3025');
for (const url of [base, mailView])
	if (url.hostname !== '127.0.0.1') throw new Error(`${url}: this probe only talks to 127.0.0.1`);

const demo = JSON.parse(readFileSync('data/demo-people.json', 'utf8'));
const stamp = Date.now();
const invented = (tag) => `probe-${tag}-${stamp}@example.org`;

/** A browser stand-in: a cookie jar, form posts as use:enhance makes them, and no redirects followed. */
function client(userAgent) {
	const jar = new Map();
	const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
	const keep = (res) => {
		for (const line of res.headers.getSetCookie()) {
			const [pair, ...attrs] = line.split(';');
			const [name, value] = [pair.slice(0, pair.indexOf('=')), pair.slice(pair.indexOf('=') + 1)];
			const expired = attrs.some((a) => /max-age=0|expires=thu, 01 jan 1970/i.test(a.trim()));
			if (expired || value === '') jar.delete(name.trim());
			else jar.set(name.trim(), value);
		}
		return res;
	};
	return {
		jar,
		async get(path) {
			return keep(
				await fetch(new URL(path, base), {
					redirect: 'manual',
					headers: { cookie: cookie(), 'user-agent': userAgent }
				})
			);
		},
		/** A form action; answers { status, location } the way SvelteKit's JSON answer carries them. */
		async post(path, fields) {
			const started = performance.now();
			const res = keep(
				await fetch(new URL(path, base), {
					method: 'POST',
					redirect: 'manual',
					headers: {
						cookie: cookie(),
						origin: base.origin,
						'user-agent': userAgent,
						'x-sveltekit-action': 'true',
						'content-type': 'application/x-www-form-urlencoded'
					},
					body: new URLSearchParams(fields)
				})
			);
			const ms = performance.now() - started;
			const text = await res.text();
			let body = {};
			try {
				body = JSON.parse(text);
			} catch {
				/* not an action answer */
			}
			return { status: body.status ?? res.status, type: body.type, location: body.location, text, ms };
		}
	};
}

async function mailsTo(to) {
	const res = await fetch(new URL(`/messages?to=${encodeURIComponent(to)}`, mailView));
	return res.json();
}

/** The newest message to `to` with a subject matching, newer than `after` messages; waits for the queue. */
async function nextMail(to, subject, after) {
	for (let i = 0; i < 75; i++) {
		const found = (await mailsTo(to)).slice(after).filter((m) => subject.test(m.subject));
		if (found.length) return found.at(-1);
		await new Promise((resolve) => setTimeout(resolve, 200));
	}
	throw new Error(`no mail "${subject}" to ${to}`);
}

const linkIn = (text) => text.match(/https?:\/\/\S+/)[0];
const pathOf = (link) => {
	const url = new URL(link);
	return url.pathname + url.search;
};
const signedIn = async (who) => (await who.get('/workspaces')).status === 200;
const results = [];
const report = (item, open, figures) => {
	results.push(open);
	console.log(`item ${item}: ${open ? 'OPEN  ' : 'closed'} ${figures}`);
};

async function signInByLink(who, email) {
	const after = (await mailsTo(email)).length;
	await who.post('/signin?/link', { email, next: '/workspaces' });
	const mail = await nextMail(email, /sign-in link/, after);
	await who.get(pathOf(linkIn(mail.text)));
	return signedIn(who);
}

// Item 3: an account taken before its owner signs up.
for (const way of ['sign-in link', 'confirmation link']) {
	const victim = invented(way.startsWith('sign') ? 'victim-link' : 'victim-confirm');
	const attackerPassword = 'attacker chose this 123';
	const attacker = client('probe-attacker');
	const owner = client('probe-owner');
	await attacker.post('/signup', {
		name: 'Not the owner',
		email: victim,
		password: attackerPassword,
		confirm: attackerPassword
	});
	const confirmation = await nextMail(victim, /Confirm your address/, 0);
	if (way === 'sign-in link') await signInByLink(owner, victim);
	else {
		// The owner opens the link the squatting sign-up sent them; where the page asks for the sign-up's
		// password, they type the only one they could know: their own.
		const page = await owner.get(pathOf(linkIn(confirmation.text)));
		const token = new URL(linkIn(confirmation.text)).searchParams.get('token');
		if (page.status === 200 && (await page.text()).includes('name="password"'))
			await owner.post('/signup/confirm', { token, password: 'the owner’s own password' });
	}
	const tried = await attacker.post('/signin?/password', { email: victim, password: attackerPassword });
	const inside = await signedIn(attacker);
	report(
		3,
		inside,
		`owner used the ${way}; squatter's password sign-in answered ${tried.status}, /workspaces ${inside ? '200 (signed in)' : 'refused'}`
	);
}

// Item 6: a copied session cookie after sign-out; an older reset link after a newer one was used.
{
	const browser = client('probe-browser');
	await browser.post('/signin?/password', {
		email: 'editor@example.org',
		password: demo.password,
		next: '/workspaces'
	});
	const copy = client('probe-thief');
	for (const [k, v] of browser.jar) copy.jar.set(k, v);
	const before = await signedIn(copy);
	await browser.post('/signout', {});
	const started = performance.now();
	const after = (await copy.get('/workspaces')).status;
	report(
		6,
		after === 200,
		`copied cookie: /workspaces ${before ? 200 : 'refused'} before sign-out, ${after} right after (${(performance.now() - started).toFixed(0)} ms later)`
	);

	const email = invented('reset');
	const elsewhere = client('probe-elsewhere');
	await signInByLink(elsewhere, email);
	const resetter = client('probe-resetter');
	const links = [];
	for (let i = 0; i < 2; i++) {
		const seen = (await mailsTo(email)).length;
		await resetter.post('/forgot', { email });
		const mail = await nextMail(email, /Reset your Runrate password/, seen);
		links.push(new URL(linkIn(mail.text)).searchParams.get('token'));
	}
	const newer = await resetter.post('/reset', {
		token: links[1],
		password: 'chosen by the owner 1',
		confirm: 'chosen by the owner 1'
	});
	const stillIn = await signedIn(elsewhere);
	const older = await resetter.post('/reset', {
		token: links[0],
		password: 'someone else chose 2',
		confirm: 'someone else chose 2'
	});
	report(6, stillIn, `reset (${newer.status}): the other session ${stillIn ? 'still signed in' : 'ended'}`);
	report(6, older.status < 400, `older reset link after the newer one: ${older.status}`);
}

// Item 12: sign-up timing for an address with an account against a new one (medians of five).
{
	const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
	const known = [];
	const fresh = [];
	const answers = new Set();
	for (let i = 0; i < 5; i++) {
		for (const [email, into] of [
			['owner@example.org', known],
			[invented(`new-${i}`), fresh]
		]) {
			const res = await client(`probe-signup-${i}-${into === known}`).post('/signup', {
				name: 'Probe',
				email,
				password: 'a long probe password',
				confirm: 'a long probe password'
			});
			into.push(res.ms);
			answers.add(`${res.status} ${String(res.location).replace(encodeURIComponent(email), '…')}`);
		}
	}
	const [k, f] = [median(known), median(fresh)];
	report(
		12,
		Math.abs(k - f) > 0.5 * Math.max(k, f) || answers.size > 1,
		`sign-up medians: existing ${k.toFixed(0)} ms, new ${f.toFixed(0)} ms; answers: ${[...answers].join(' | ')}`
	);
}

console.log(results.some(Boolean) ? 'some probes are still open' : 'all probes closed');
process.exitCode = results.some(Boolean) ? 1 : 0;
