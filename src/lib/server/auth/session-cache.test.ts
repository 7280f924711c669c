import type { Cookies } from '@sveltejs/kit';
import { describe, expect, it } from 'vitest';
import { carriesSessionCookie } from './session-cache';

/** The cookies of a request with these names (the values do not matter here). */
const cookiesNamed = (...names: string[]) =>
	({ getAll: () => names.map((name) => ({ name, value: 'x' })) }) as unknown as Cookies;

describe('whether a request carries a session cookie (without one, Auth.js is not asked)', () => {
	it.each([
		['authjs.session-token'],
		['__Secure-authjs.session-token'],
		['authjs.session-token.0'],
		['__Secure-authjs.session-token.1']
	])('%s: yes, whole or split, so the session is read and checked live', (name) => {
		expect(carriesSessionCookie(cookiesNamed('theme', name))).toBe(true);
	});

	it.each([[[]], [['authjs.csrf-token', 'authjs.callback-url']], [['authjs.session-tokens']]])(
		'%j: no, the request is anonymous',
		(names) => {
			expect(carriesSessionCookie(cookiesNamed(...names))).toBe(false);
		}
	);
});
