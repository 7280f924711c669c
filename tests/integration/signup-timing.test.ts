import { isRedirect } from '@sveltejs/kit';
import { afterAll, describe, expect, it } from 'vitest';
import { client } from '$lib/server/db';
import { stopJobs } from '$lib/server/jobs';
import { actions } from '../../src/routes/signup/+page.server';
import { makeUser } from './fixtures';

// Sign-up must not tell who has an account (issue 14, item 12): an address that has one took 27 ms and a
// new one 508 ms, because only the new one paid for the password hash. The sign-up action itself is run,
// against the real PostgreSQL and job queue of `npm test`. Invented addresses.
const tag = `signup-timing-${Date.now()}`;
const ORIGIN = 'http://127.0.0.1';
let calls = 0;

afterAll(async () => {
	await stopJobs();
	await client.end({ timeout: 5 });
});

type SignUpEvent = Parameters<typeof actions.default>[0];

/** Posts the sign-up form as a browser would; each call from its own client so the limiter stays out of it. */
function signUpEvent(email: string): SignUpEvent {
	calls += 1;
	const body = new FormData();
	body.set('name', 'Timing Test (invented)');
	body.set('email', email);
	body.set('password', 'a long test password');
	body.set('confirm', 'a long test password');
	const url = new URL('/signup', ORIGIN);
	return {
		request: new Request(url, { method: 'POST', body, headers: { 'user-agent': `timing-test-${calls}` } }),
		url,
		getClientAddress: () => `10.14.12.${calls}`,
		locals: { user: null, sessionId: null },
		params: {},
		route: { id: '/signup' }
	} as unknown as SignUpEvent;
}

/** The action's answer (status and where it sends the browser, with the address taken out) and its time. */
async function postSignUp(email: string): Promise<{ answer: string; ms: number }> {
	const started = performance.now();
	let answer = 'no redirect';
	try {
		const result = await actions.default(signUpEvent(email));
		answer = JSON.stringify(result);
	} catch (thrown) {
		if (!isRedirect(thrown)) throw thrown;
		answer = `${thrown.status} ${thrown.location.replace(encodeURIComponent(email), '<address>')}`;
	}
	return { answer, ms: performance.now() - started };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

describe('signing up', () => {
	it('answers an address with an account exactly as a new one, in about the same time', async () => {
		const existing = await makeUser(`has-account-${tag}@example.org`, 'Has Account', {
			emailVerified: new Date()
		});
		// Warm up both paths (the job queue starts on the first e-mail; bcrypt's first hash is slower).
		await postSignUp(existing.email);
		await postSignUp(`warm-up-${tag}@example.org`);

		const known: number[] = [];
		const fresh: number[] = [];
		const answers = new Set<string>();
		for (let i = 0; i < 5; i++) {
			const a = await postSignUp(existing.email);
			const b = await postSignUp(`new-${i}-${tag}@example.org`);
			known.push(a.ms);
			fresh.push(b.ms);
			answers.add(a.answer).add(b.answer);
		}
		expect([...answers]).toEqual(['303 /signup/sent?email=<address>']);

		// Both pay for one password hash (~100 ms and up); before the fix the known address took a
		// twentieth of the new one's time. Medians of interleaved tries keep a busy machine fair to both.
		const [k, f] = [median(known), median(fresh)];
		expect(Math.abs(k - f), `medians: known ${k.toFixed(0)} ms, new ${f.toFixed(0)} ms`).toBeLessThan(
			0.5 * Math.max(k, f)
		);
	});
});
