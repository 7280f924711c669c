import { describe, expect, it } from 'vitest';
import { neutraliseFormula } from './safe-text';

// The leading characters are those the OWASP "CSV Injection" page lists.
describe('text that looks like a formula', () => {
	it.each(['=1+1', '+1', '-1', '@SUM(A1)', '\t=1', '\r=1'])('gets an apostrophe: %j', (text) => {
		expect(neutraliseFormula(text)).toBe(`'${text}`);
	});
	it('leaves ordinary text alone', () => {
		expect(neutraliseFormula('Pump 1 = main')).toBe('Pump 1 = main');
	});
});
