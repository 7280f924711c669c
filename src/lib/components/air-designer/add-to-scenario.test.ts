import { describe, expect, it } from 'vitest';
import { refusalWords, savedWords } from './add-to-scenario';

describe('what "Add to scenario" says', () => {
	it('names what went into the list', () => {
		const words = savedWords({
			pumpName: 'Linear pump (invented)',
			count: 2,
			flowEachLpm: 60,
			totalFlowLpm: 120,
			wattsEach: 45,
			wattsTotal: 90,
			gaugeKPa: 9,
			wattsFrom: 'data-sheet'
		});
		expect(words).toContain('2 × Linear pump (invented), 45 W each, always on');
	});

	it('puts the page-wide refusal first and says each message once', () => {
		expect(
			refusalWords({
				errors: { 'design.pump': 'Too weak', form: 'Someone else saved', 'design.x': 'Too weak' }
			})
		).toEqual(['Someone else saved', 'Too weak']);
		expect(refusalWords(undefined)).toEqual(['The design could not be saved. Try again.']);
	});
});
