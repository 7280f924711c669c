import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DECLARES_ENTITIES, declaresEntities } from './declarations';
import { yearOfQuarterHours } from './green-button-fixture';
import { readUsageFile } from './read-usage';

const bytesOf = (text: string) => new TextEncoder().encode(text);
const FEED = '<feed xmlns="http://www.w3.org/2005/Atom"><title>Invented</title></feed>';

describe('telling a declaration from the bytes', () => {
	it.each([
		['a DOCTYPE with entities', `<!DOCTYPE feed [<!ENTITY x "y">]>${FEED}`],
		['a lower-case doctype after the XML declaration', `<?xml version="1.0"?><!doctype feed>${FEED}`],
		['an entity declaration alone', `<!Entity x "y">${FEED}`],
		['a DOCTYPE at the very end', `${FEED}<!DOCTYPE`]
	])('finds %s', (_, xml) => {
		expect(declaresEntities(bytesOf(xml))).toBe(true);
	});

	it.each([
		['an ordinary feed', FEED],
		['comments and CDATA', `<!-- invented --><feed><![CDATA[<b>]]></feed>`],
		['the invented hourly sample file', readFileSync('tests/fixtures/green-button/hourly.xml', 'utf8')],
		['an opening cut short', `${FEED}<!DOCTYP`]
	])('finds none in %s', (_, xml) => {
		expect(declaresEntities(bytesOf(xml))).toBe(false);
	});

	it('reads a 10 MB file in a few milliseconds (measured about 5 ms)', () => {
		const bytes = bytesOf(yearOfQuarterHours());
		const started = performance.now();
		expect(declaresEntities(bytes)).toBe(false);
		expect(performance.now() - started).toBeLessThan(250);
	});
});

describe('an XML bomb sent to the usage import', () => {
	it('is refused before a worker thread starts, in a few milliseconds', async () => {
		const bomb = new Uint8Array(readFileSync('tests/fixtures/green-button/bomb.xml'));
		const started = performance.now();
		expect(await readUsageFile(bomb, 'UTC')).toEqual({ format: 'green-button', error: DECLARES_ENTITIES });
		// A worker takes about a second to start under vitest; this answer comes without one.
		expect(performance.now() - started).toBeLessThan(100);
	});
});
