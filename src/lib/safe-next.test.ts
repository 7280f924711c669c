import { describe, expect, it } from 'vitest';
import { safeNext } from './safe-next';

describe('safeNext, the after-sign-in destination', () => {
	it.each([
		['/w/abc?tab=members', '/w/abc?tab=members'],
		['https://elsewhere.example.org/', '/workspaces'],
		['//elsewhere.example.org/', '/workspaces'],
		['/\\elsewhere.example.org', '/workspaces'],
		['javascript:alert(1)', '/workspaces'],
		['', '/workspaces'],
		[null, '/workspaces']
	])('turns %s into %s (open-redirect forms, common practice)', (input, expected) => {
		expect(safeNext(input)).toBe(expected);
	});
});
