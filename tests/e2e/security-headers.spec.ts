import { expect, test } from '@playwright/test';
import { signInWithPassword } from './helpers';

// The headers every page carries (OWASP Secure Headers Project recommendations).
test.describe('web security', () => {
	test('pages carry a script policy without unsafe-inline, no framing, no sniffing and a referrer policy', async ({
		request
	}) => {
		const res = await request.get('/');
		const csp = res.headers()['content-security-policy'] ?? '';
		expect(csp).toContain("frame-ancestors 'none'");
		expect(csp).toContain("object-src 'none'");
		const script = csp.split(';').find((d) => d.trim().startsWith('script-src')) ?? '';
		expect(script).toMatch(/'nonce-[^']+'|'sha256-[^']+'/);
		expect(script).not.toContain("'unsafe-inline'");
		expect(res.headers()['x-content-type-options']).toBe('nosniff');
		expect(res.headers()['referrer-policy']).toBe('strict-origin-when-cross-origin');
		expect(res.headers()['x-frame-options']).toBe('DENY');
	});

	test('every inline script of a page carries the nonce of its policy', async ({ page }) => {
		const response = await page.goto('/signin');
		const nonce = /'nonce-([^']+)'/.exec(response?.headers()['content-security-policy'] ?? '')?.[1];
		const scripts = await page
			.locator('script:not([src])')
			.evaluateAll((nodes) => nodes.map((n) => (n as HTMLScriptElement).nonce || n.getAttribute('nonce')));
		expect(scripts.length).toBeGreaterThan(0);
		for (const value of scripts) expect(value).toBe(nonce);
	});

	test('the session cookie is httpOnly and SameSite=Lax', async ({ page }) => {
		await signInWithPassword(page, 'viewer@example.org');
		const session = (await page.context().cookies()).find((c) => c.name.includes('session-token'));
		expect(session?.httpOnly).toBe(true);
		expect(session?.sameSite).toBe('Lax');
	});

	test('a form post from another origin is refused (SvelteKit origin check)', async ({ request }) => {
		const res = await request.post('/signin?/password', {
			form: { email: 'viewer@example.org', password: 'x' },
			headers: { origin: 'https://attacker.example.org' }
		});
		expect(res.status()).toBe(403);
	});
});
