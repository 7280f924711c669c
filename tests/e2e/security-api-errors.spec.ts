import { expect, test, type APIResponse } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { DEMO_WS, signInWithPassword } from './helpers';

// Issue 14, item 13: the guard's refusals under /api/ came back as an HTML page unless the caller
// asked for JSON, and SvelteKit's own 404 and 405 as HTML or plain text. Every API answer at or above
// 400 is JSON { error, message }, whatever the Accept header, with the security headers kept.
const site = (JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as { sites: { id: string }[] })
	.sites[0]!;

const ACCEPTS: [string, Record<string, string>][] = [
	['no Accept header', {}],
	['Accept: text/html', { accept: 'text/html' }],
	['Accept: */*', { accept: '*/*' }]
];

async function expectApiError(res: APIResponse, status: number, error: string, message?: RegExp) {
	expect(res.status()).toBe(status);
	expect(res.headers()['content-type']).toContain('application/json');
	const body = (await res.json()) as { error?: unknown; message?: unknown };
	expect(body.error).toBe(error);
	expect(typeof body.message).toBe('string');
	if (message) expect(body.message).toMatch(message);
	expect(res.headers()['x-content-type-options']).toBe('nosniff');
	expect(res.headers()['x-frame-options']).toBe('DENY');
	expect(res.headers()['referrer-policy']).toBe('strict-origin-when-cross-origin');
}

for (const [accept, headers] of ACCEPTS) {
	test.describe(`API errors with ${accept}`, () => {
		test('401 without a session, 404 for an unknown tariff or route, 405 for an unknown method', async ({
			request
		}) => {
			await expectApiError(
				await request.get(`/api/v1/sites?workspaceId=${DEMO_WS.id}`, { headers }),
				401,
				'unauthorized',
				/Sign in first/
			);
			await expectApiError(
				await request.get('/api/v1/tariffs/00000000-0000-4000-8000-00000000abcd', { headers }),
				404,
				'not_found'
			);
			await expectApiError(await request.get('/api/v1/no-such-thing', { headers }), 404, 'not_found');
			const method = await request.delete('/api/v1/calculate', { headers });
			await expectApiError(method, 405, 'method_not_allowed', /POST/);
		});

		test('403 for a viewer writing, with the guard’s own message', async ({ page }) => {
			await signInWithPassword(page, 'viewer@example.org');
			const res = await page.request.put(`/api/v1/sites/${site.id}`, { headers, data: { name: 'x' } });
			await expectApiError(res, 403, 'forbidden', /needs the editor role/);
		});
	});
}

test('an API answer that already is JSON { error, message } is passed through unchanged', async ({
	request
}) => {
	const res = await request.post('/api/v1/pumping', {
		headers: { accept: 'text/html' },
		data: { fluid: 'lava' }
	});
	await expectApiError(res, 400, 'invalid_request', /Some fields need attention/);
	expect(((await res.json()) as { issues?: unknown[] }).issues?.length).toBeGreaterThan(0);
});
