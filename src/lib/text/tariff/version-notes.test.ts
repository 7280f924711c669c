import { describe, expect, it } from 'vitest';
import { beforeFirstVersionNote, periodsText } from './version-notes';

describe('the note on months priced before a tariff’s first version', () => {
	it.each([
		[['2026-01', '2026-11'], 'January–November 2026'],
		[['2025-12', '2026-03'], 'December 2025–March 2026'],
		[['2026-03'], 'March 2026'],
		[['2026-01-05/2026-02-03', '2026-02-04/2026-03-05'], '2026-01-05 to 2026-03-05']
	])('names %j as "%s"', (labels, text) => {
		expect(periodsText(labels)).toBe(text);
	});

	it('says which version priced them and when it starts', () => {
		const labels = Array.from({ length: 11 }, (_, i) => `2026-${String(i + 1).padStart(2, '0')}`);
		expect(beforeFirstVersionNote({ labels, number: 1, effectiveFrom: '2026-12-03' })).toBe(
			'January–November 2026 are priced on version 1, which starts 2026-12-03: the tariff has no earlier rates.'
		);
	});
});
