import { expect, test, type APIRequestContext } from '@playwright/test';
import { request as httpRequest } from 'node:http';
import { DEMO_PASSWORD, latestMail, linkIn, uniqueEmail } from './helpers';

// Issue 14, items 2, 5, 8 and 10: Auth.js's own endpoints as a second door past the lockout and the
// e-mail limit, a missing User-Agent locking an account, the open redirect in `next`, and Auth.js's
// error redirects turning into bare 500s.

// Its own user agent, so the lock this spec provokes never reaches the other specs' sign-ins.
const UA = 'runrate-auth-doors-test';
test.use({ userAgent: UA });

type ActionResult = { type: string; status: number; location?: string };

/** Posts to a form action the way `use:enhance` does and reads SvelteKit's JSON answer. */
async function action(
	request: APIRequestContext,
	path: string,
	form: Record<string, string>
): Promise<ActionResult> {
	const res = await request.post(path, {
		form,
		headers: {
			origin: new URL(path, baseUrl()).origin,
			'x-sveltekit-action': 'true',
			accept: 'application/json'
		}
	});
	expect(res.status()).toBe(200);
	return (await res.json()) as ActionResult;
}

const baseUrl = () => `http://127.0.0.1:${process.env.APP_PORT ?? 4173}`;

/** A request with no User-Agent header at all (node:http adds none; browsers and Playwright always do). */
function withoutUserAgent(method: string, path: string, body: string, contentType: string, extra = {}) {
	return new Promise<{ status: number; body: string }>((resolve, reject) => {
		const url = new URL(path, baseUrl());
		const req = httpRequest(
			url,
			{ method, headers: { origin: url.origin, 'content-type': contentType, ...extra } },
			(res) => {
				let text = '';
				res.on('data', (chunk) => (text += chunk));
				res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
			}
		);
		req.on('error', reject);
		req.end(body);
	});
}

async function mailsTo(email: string, subject: RegExp): Promise<number> {
	const list = (await (
		await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(email)}`)
	).json()) as { subject: string }[];
	return list.filter((m) => subject.test(m.subject)).length;
}

const hasSession = async (request: APIRequestContext) =>
	(await request.storageState()).cookies.some((c) => c.name.includes('session-token'));

test.describe.serial('sign-in has one door', () => {
	const email = uniqueEmail('doors');
	const password = 'a long door password';

	test.beforeAll(async ({ playwright }) => {
		const request = await playwright.request.newContext({ baseURL: baseUrl(), userAgent: UA });
		const signedUp = await action(request, '/signup', {
			name: 'Door Tester (invented)',
			email,
			password,
			confirm: password
		});
		expect(signedUp.type).toBe('redirect');
		// The confirmation link confirms only with the password chosen at sign-up (item 3's fix).
		const link = new URL(linkIn((await latestMail(email, /Confirm your address/)).text));
		const token = link.searchParams.get('token') ?? '';
		const confirmed = await action(request, '/signup/confirm', { token, password });
		expect(confirmed.type).toBe('redirect');
		await request.dispose();
	});

	test('a wrong password without a User-Agent counts as one failure, not a lock (item 5)', async ({
		playwright
	}) => {
		const wrong = await withoutUserAgent(
			'POST',
			'/signin?/password',
			new URLSearchParams({ email, password: 'not the password' }).toString(),
			'application/x-www-form-urlencoded',
			{ 'x-sveltekit-action': 'true', accept: 'application/json' }
		);
		expect(wrong.status).toBe(200);
		expect(JSON.parse(wrong.body)).toMatchObject({ type: 'failure', status: 400 });

		const browser = await playwright.request.newContext({ baseURL: baseUrl(), userAgent: UA });
		const right = await action(browser, '/signin?/password', { email, password });
		expect(right).toMatchObject({ type: 'redirect' });
		expect(await hasSession(browser)).toBe(true);
		await browser.dispose();

		// Anonymous API callers without a User-Agent get an answer, not 429.
		for (let i = 0; i < 3; i++) {
			const api = await withoutUserAgent('POST', '/api/v1/calculate', '{}', 'application/json');
			expect(api.status).toBe(400);
		}
	});

	test('after the form locks the address, the right password sent straight to Auth.js is refused (item 2)', async ({
		request
	}) => {
		// With the one wrong password of the test above, ten wrong passwords: the tenth locks the address.
		for (let attempt = 2; attempt <= 10; attempt++) {
			const result = await action(request, '/signin?/password', { email, password: `guess ${attempt}` });
			expect(result).toMatchObject({ type: 'failure', status: 400 });
		}
		expect(await action(request, '/signin?/password', { email, password })).toMatchObject({
			type: 'failure',
			status: 429
		});

		for (const path of ['/auth/callback/password', '/auth/signin/password']) {
			const direct = await request.post(path, {
				form: { email, password, callbackUrl: '/workspaces' },
				headers: { origin: baseUrl() },
				maxRedirects: 0
			});
			expect(direct.status()).toBe(404);
			expect(direct.headers()['set-cookie'] ?? '').not.toContain('session-token');
		}
		expect(await hasSession(request)).toBe(false);
		const workspaces = await request.get('/workspaces', { maxRedirects: 0 });
		expect(workspaces.status()).toBe(303);
		expect(workspaces.headers()['location']).toContain('/signin');
	});

	test("Auth.js's e-mail sign-in sends nothing when called directly; the form's link still signs in (items 2, 10)", async ({
		request,
		page
	}) => {
		const before = await mailsTo(email, /sign-in link/);
		for (let i = 0; i < 3; i++) {
			const direct = await request.post('/auth/signin/email', {
				form: { email, callbackUrl: '/workspaces' },
				headers: { origin: baseUrl() },
				maxRedirects: 0
			});
			expect(direct.status()).toBe(404);
		}
		for (const path of [
			'/auth/signin/email',
			'/auth/csrf',
			'/auth/providers',
			'/auth/session',
			'/auth/signin'
		]) {
			const get = await request.get(`${path}?email=${encodeURIComponent(email)}`, { maxRedirects: 0 });
			expect(get.status()).toBe(404);
			expect(get.headers()['x-frame-options']).toBe('DENY');
		}

		// The form's own link: when it has arrived, the direct posts' e-mails (queued earlier) would have too.
		expect(await action(request, '/signin?/link', { email, next: '/workspaces' })).toMatchObject({
			type: 'redirect'
		});
		const mail = await latestMail(email, /sign-in link/);
		expect(await mailsTo(email, /sign-in link/)).toBe(before + 1);

		const link = linkIn(mail.text);
		await page.goto(link);
		await expect(page.getByRole('heading', { name: 'Your workspaces' })).toBeVisible();
		await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();

		// The same link again: a readable page with the security headers, never a bare 500.
		const used = await request.get(link, { maxRedirects: 0 });
		expect(used.status()).toBe(302);
		expect(used.headers()['location']).toContain('/signin/problem?error=Verification');
		expect(used.headers()['x-frame-options']).toBe('DENY');
		expect(used.headers()['x-content-type-options']).toBe('nosniff');
		const problem = await page.goto(link);
		expect(problem?.status()).toBe(200);
		expect(problem?.headers()['x-frame-options']).toBe('DENY');
		await expect(page.getByRole('heading', { name: 'We could not sign you in' })).toBeVisible();
		await expect(page.getByText('That sign-in link has been used already or has expired')).toBeVisible();
	});
});

test('an unknown provider or a forged sign-in link gives a readable page with the security headers (item 10)', async ({
	request
}) => {
	for (const path of [
		'/auth/signin/no-such-provider',
		'/auth/callback/no-such-provider',
		'/auth/callback/email?token=not-a-real-token-000&email=nobody%40example.org'
	]) {
		const res = await request.get(path);
		expect(res.status(), path).toBeLessThan(500);
		expect(res.headers()['x-frame-options'], path).toBe('DENY');
		expect(res.headers()['x-content-type-options'], path).toBe('nosniff');
		expect(await res.text(), path).toMatch(/We could not (find that page|sign you in)/);
	}
});

test('a signed-in person sent to a hostile next= stays on this site, and no value is a 500 (item 8)', async ({
	playwright
}) => {
	// A user agent of its own: the lock above also holds this spec's first client for 15 minutes.
	const request = await playwright.request.newContext({ baseURL: baseUrl(), userAgent: `${UA}-next` });
	expect(
		await action(request, '/signin?/password', { email: 'viewer@example.org', password: DEMO_PASSWORD })
	).toMatchObject({ type: 'redirect' });
	const hostile = [
		'/%09/evil.example',
		'/%0A/evil.example',
		'/%0D/evil.example',
		'/%0D%0ASet-Cookie:%20x=1',
		'/%00/evil.example',
		'/%5C/evil.example',
		'%5C%5Cevil.example',
		'//evil.example',
		'/.//evil.example',
		'https://evil.example/',
		'javascript:alert(1)',
		'/%E6%97%A5%E6%9C%AC%E8%AA%9E',
		'/w/caf%C3%A9?q=%C3%BC#x',
		'/%ED%A0%80',
		'/' + 'a'.repeat(4000)
	];
	for (const next of hostile) {
		const res = await request.get(`/signin?next=${next}`, { maxRedirects: 0 });
		expect(res.status(), next).toBe(303);
		const location = res.headers()['location'] ?? '';
		expect(location, next).toMatch(/^\/(?!\/)[\x21-\x7e]*$/);
		expect(new URL(location, baseUrl()).origin, next).toBe(baseUrl());
	}
	// An ordinary destination still works.
	const ordinary = await request.get('/signin?next=%2Fw%2Fabc%3Ftab%3Dmembers', { maxRedirects: 0 });
	expect(ordinary.headers()['location']).toBe('/w/abc?tab=members');
	await request.dispose();
});
