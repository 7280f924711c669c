import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { linuxProgram, pngHead, windowsProgram } from '$lib/server/sheets/hostile-fixture';
import { answer } from './parse-job';
import { usageFormat } from './read-usage';

const bytesOf = (text: string) => new TextEncoder().encode(text);
const errorOf = (reply: ReturnType<typeof answer>) => ('error' in reply ? reply.error : 'read without error');
const FEED = '<feed xmlns="http://www.w3.org/2005/Atom"><title>&x;</title></feed>';

/** The classic "billion laughs": ten levels of ten references, 10⁹ copies of "lol" once expanded. */
function billionLaughs(): string {
	const levels = Array.from({ length: 9 }, (_, i) => {
		const inner = i === 0 ? 'lol' : `lol${i}`;
		return `<!ENTITY lol${i + 1} "${`&${inner};`.repeat(10)}">`;
	});
	return `<?xml version="1.0"?>\n<!DOCTYPE feed [\n<!ENTITY lol "lol">\n${levels.join('\n')}\n]>\n${FEED.replace('&x;', '&lol9;')}`;
}

// Each must be refused before any parser sees it. OWASP's XXE cheat sheet describes these shapes.
const declared: [what: string, xml: string][] = [
	['the billion laughs', billionLaughs()],
	['the invented bomb sample file', readFileSync('tests/fixtures/green-button/bomb.xml', 'utf8')],
	[
		'an external entity reading a local file',
		`<!DOCTYPE feed [<!ENTITY x SYSTEM "file:///etc/passwd">]>${FEED}`
	],
	[
		'an external entity fetching an address',
		`<!DOCTYPE feed [<!ENTITY x SYSTEM "http://example.org/usage">]>${FEED}`
	],
	['a parameter entity', '<!DOCTYPE feed [<!ENTITY % p SYSTEM "http://example.org/x.dtd"> %p;]><feed/>'],
	['an external DTD', `<!DOCTYPE feed SYSTEM "http://example.org/feed.dtd">${FEED}`],
	['a lower-case doctype after a comment', `<!-- invented --><!doctype feed [<!ENTITY x "y">]>${FEED}`],
	['one big entity used many times', `<!DOCTYPE feed [<!ENTITY x "${'a'.repeat(10_000)}">]>${FEED}`]
];

// The worker's own check, on the decoded text: read-usage refuses these from the bytes before it starts
// a worker (declarations.test.ts), and this check stands behind that one.
describe('an XML bomb or an external entity as a Green Button file', () => {
	it.each(declared)('refuses %s unread, quickly and without growing the heap', (_, xml) => {
		const heapBefore = process.memoryUsage().heapUsed;
		const started = performance.now();
		const reply = answer({ format: usageFormat(bytesOf(xml)), bytes: bytesOf(xml), timezone: 'UTC' });
		const ms = performance.now() - started;
		expect(errorOf(reply)).toMatch(
			/^The file declares a DOCTYPE or entities, which Green Button files never do/
		);
		expect(errorOf(reply)).not.toMatch(/root:|lollol/);
		// Measured well under 1 ms; expanded, the billion laughs would need about 3 GB.
		expect(ms).toBeLessThan(250);
		expect(process.memoryUsage().heapUsed - heapBefore).toBeLessThan(32 * 1024 * 1024);
	});

	it('refuses elements nested thousands deep with a message, not a crash', () => {
		const xml = `<feed>${'<a>'.repeat(5000)}${'</a>'.repeat(5000)}</feed>`;
		const reply = answer({ format: 'green-button', bytes: bytesOf(xml), timezone: 'UTC' });
		expect(errorOf(reply)).toBe('The XML nests its elements far deeper than a Green Button download does.');
	});
});

describe('a program or an image under a usage file’s name', () => {
	// The import never reads the name: what the bytes are decides, so .xml and .csv are alike here.
	it.each([
		['a Windows program', windowsProgram()],
		['a Linux program', linuxProgram()],
		['a PNG image', pngHead()]
	])('refuses %s as not text', (_, bytes) => {
		const reply = answer({ format: usageFormat(bytes), bytes, timezone: 'UTC' });
		expect(errorOf(reply)).toBe(
			'The file is not text: upload a Green Button XML file or a timestamp,kWh CSV sheet.'
		);
	});
});
