import { describe, expect, it } from 'vitest';
import { inForceWords, provenanceSentence, sourceWords, urdbLabelWords } from './provenance';

// Invented provenance (fictional utility); the dates in words are the reports' own format.
const FERNHOLLOW = {
	tariffName: 'Fernhollow Power (demo) — Small farm TOU',
	tariffVersion: 2,
	tariffUtility: 'Fernhollow Power (demo)',
	tariffSource: 'https://fernhollow.example.org/rates (invented)',
	tariffCheckedOn: '2026-12-01',
	tariffEffectiveFrom: '2027-01-01',
	tariffEffectiveTo: null,
	tariffUrdbLabel: '5cd0000000000000000demo'
};

describe('a version in force', () => {
	it('says when it has no end date', () => {
		expect(inForceWords('2027-01-01', null)).toBe('in force from 1 January 2027 (no end date)');
	});

	it('names its last day, which is included', () => {
		expect(inForceWords('2015-01-01', '2015-08-31')).toBe('in force from 1 January 2015 to 31 August 2015');
	});
});

describe('a source', () => {
	it('says when none was given, and leaves out a missing check', () => {
		expect(sourceWords('', '')).toBe('no source given');
		expect(sourceWords('Rate sheet (invented)', '2026-12-01')).toBe(
			'source: Rate sheet (invented), checked 1 December 2026'
		);
	});

	it('names the open-data label only when there is one', () => {
		expect(urdbLabelWords(null)).toBeNull();
		expect(urdbLabelWords('abc')).toBe('OpenEI Utility Rate Database label abc');
	});
});

describe('the whole provenance', () => {
	it('reads as one sentence', () => {
		expect(provenanceSentence(FERNHOLLOW)).toBe(
			'Fernhollow Power (demo) — Small farm TOU, version 2, in force from 1 January 2027 (no end date): source: https://fernhollow.example.org/rates (invented), checked 1 December 2026; OpenEI Utility Rate Database label 5cd0000000000000000demo'
		);
	});

	it('leaves the label out for a tariff typed in', () => {
		expect(provenanceSentence({ ...FERNHOLLOW, tariffUrdbLabel: null })).not.toContain('OpenEI');
	});
});
