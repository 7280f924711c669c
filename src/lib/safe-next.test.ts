import { describe, expect, it } from 'vitest';
import { safeNext } from './safe-next';

/** How a browser reads a Location header on our origin: where would this answer send someone? */
const followed = (location: string) => new URL(location, 'https://runrate.example.org/');

describe('safeNext, the after-sign-in destination', () => {
	it.each([
		['/w/abc?tab=members', '/w/abc?tab=members'],
		['/w/abc?tab=members#people', '/w/abc?tab=members#people'],
		['/sites/s1/bills?month=2026-01', '/sites/s1/bills?month=2026-01'],
		['https://elsewhere.example.org/', '/workspaces'],
		['//elsewhere.example.org/', '/workspaces'],
		['/\\elsewhere.example.org', '/workspaces'],
		['\\\\elsewhere.example.org', '/workspaces'],
		['javascript:alert(1)', '/workspaces'],
		['', '/workspaces'],
		[null, '/workspaces'],
		[undefined, '/workspaces']
	])('turns %s into %s (open-redirect forms, common practice)', (input, expected) => {
		expect(safeNext(input)).toBe(expected);
	});

	// Each of these once answered a Location leaving the site (tab) or a 500 for an invalid header.
	const hostile = [
		'/\t/evil.example',
		'/\t/evil.example/path',
		'\t//evil.example',
		'/\n/evil.example',
		'/\r/evil.example',
		'/\r\n/evil.example',
		'/\0/evil.example',
		'/%09/evil.example',
		'/./\t/evil.example',
		'/.//evil.example',
		'/..//evil.example',
		'/ /evil.example',
		'/\\/evil.example',
		'/\\\t\\evil.example',
		' //evil.example',
		'javascript:alert(1)',
		'JaVaScRiPt:alert(1)',
		'/javascript:alert(1)',
		'data:text/html,<script>alert(1)</script>',
		'http://evil.example',
		'https:evil.example',
		'/@evil.example',
		'/w/\u65e5\u672c\u8a9e',
		'/w/caf\u00e9?q=\u00fc\u00f1\u00ee#fr\u00e4g',
		'/w/\u202e\u0000',
		'/w/"><script>',
		'/w/\ud800',
		'/' + 'a'.repeat(5000),
		'/' + '\t'.repeat(100) + '/evil.example'
	];
	it.each(hostile)('keeps %j on our origin with a valid header value', (input) => {
		const answer = safeNext(input);
		expect(answer.startsWith('/')).toBe(true);
		expect(answer.startsWith('//')).toBe(false);
		// Only printable ASCII: no control characters, no raw non-Latin text in a header.
		expect(answer).toMatch(/^[\x21-\x7e]+$/);
		expect(followed(answer).origin).toBe('https://runrate.example.org');
	});

	it('percent-encodes non-Latin paths instead of refusing them', () => {
		expect(safeNext('/w/\u65e5\u672c')).toBe('/w/%E6%97%A5%E6%9C%AC');
	});

	it('refuses values longer than any page of ours', () => {
		expect(safeNext('/' + 'a'.repeat(5000))).toBe('/workspaces');
	});

	it('with an origin, accepts absolute URLs on it and nothing else', () => {
		const origin = 'http://127.0.0.1:4173';
		expect(safeNext(`${origin}/w/abc?x=1`, '/', origin)).toBe('/w/abc?x=1');
		expect(safeNext('http://127.0.0.1:4174/w/abc', '/', origin)).toBe('/');
		expect(safeNext(`${origin}.evil.example/`, '/', origin)).toBe('/');
		expect(safeNext(`${origin}@evil.example/`, '/', origin)).toBe('/');
		expect(safeNext('/\t/evil.example', '/', origin)).toBe('/');
	});
});
