import { describe, expect, it } from 'vitest';
import { withSecurityHeaders } from './security-headers';

describe('withSecurityHeaders', () => {
	it('adds the headers to an ordinary response', async () => {
		const response = withSecurityHeaders(new Response('hello', { status: 201 }));
		expect(response.status).toBe(201);
		expect(response.headers.get('x-frame-options')).toBe('DENY');
		expect(await response.text()).toBe('hello');
	});

	it('copies a response with immutable headers (Response.redirect, as Auth.js answers errors) instead of throwing', () => {
		const original = Response.redirect('http://127.0.0.1/signin/problem?error=Verification', 302);
		expect(() => original.headers.set('x-test', '1')).toThrow();
		const response = withSecurityHeaders(original);
		expect(response.status).toBe(302);
		expect(response.headers.get('location')).toBe('http://127.0.0.1/signin/problem?error=Verification');
		expect(response.headers.get('x-content-type-options')).toBe('nosniff');
		expect(response.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
		expect(response.headers.get('x-frame-options')).toBe('DENY');
	});
});
