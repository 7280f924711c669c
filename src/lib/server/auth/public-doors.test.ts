import { describe, expect, it } from 'vitest';
import { isPublicAuthDoor } from './public-doors';

describe("Auth.js's public doors", () => {
	it.each([
		['GET', '/auth/callback/email'],
		['GET', '/auth/verify-request']
	])('%s %s stays open (the e-mailed link and its check-your-e-mail redirect)', (method, path) => {
		expect(isPublicAuthDoor(method, path)).toBe(true);
	});

	it.each([
		['POST', '/auth/callback/password'],
		['POST', '/auth/signin/email'],
		['POST', '/auth/signin/password'],
		['POST', '/auth/callback/email'],
		['POST', '/auth/signout'],
		['POST', '/auth/session'],
		['GET', '/auth/callback/password'],
		['GET', '/auth/signin/email'],
		['GET', '/auth/signin/password'],
		['GET', '/auth/signin'],
		['GET', '/auth/csrf'],
		['GET', '/auth/providers'],
		['GET', '/auth/session'],
		['GET', '/auth/signout'],
		['GET', '/auth/error'],
		['GET', '/auth/callback/email/'],
		['HEAD', '/auth/callback/email'],
		['PUT', '/auth/callback/email']
	])('%s %s is closed: only our own actions reach Auth.js there', (method, path) => {
		expect(isPublicAuthDoor(method, path)).toBe(false);
	});
});
