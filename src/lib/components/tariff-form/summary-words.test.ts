import { describe, expect, it } from 'vitest';
import { describeField, summaryEntries } from '$lib/components/tariff-editor/tariff-editor';
import { formFieldWords, formSummary, previewFieldWords } from './tariff-form';

// Summaries name fields in words and leave each message to its field, so a message shows once.
describe('the tariff editor’s summary', () => {
	it('names the field in words, never the dotted path', () => {
		expect(describeField('energyCharges.0.tiers.1.uptoKwh')).toBe('Energy charge 1 · tier 2 · Up to kWh');
		expect(describeField('energyCharges.0.seasons.1.months.2')).toBe('Energy charge 1 · season 2 · Months');
		expect(describeField('fixedCharges.0')).toBe('Fixed charge 1');
		expect(describeField('currency')).toBe('Currency');
		expect(describeField('energyCharges')).toBe('Energy charges');
		expect(describeField('')).toBe('Tariff');
	});

	it('lists a field once and repeats a message only where no field shows it', () => {
		const entries = summaryEntries([
			{ path: 'energyCharges.0.perKwh', message: 'Per kWh is required' },
			{ path: 'energyCharges.0.perKwh', message: 'Per kWh must be a number' },
			{ path: '', message: 'The form did not arrive whole. Try saving again.' }
		]);
		expect(entries).toEqual([
			{ path: 'energyCharges.0.perKwh', words: 'Energy charge 1 · Per kWh', messages: [] },
			{ path: '', words: 'Tariff', messages: ['The form did not arrive whole. Try saving again.'] }
		]);
	});
});

describe('the tariff form’s summary', () => {
	it('names each field once in words and keeps messages no field shows', () => {
		expect(
			formSummary([
				{ path: 'meta.timezone', message: 'Time zone must be an IANA name such as America/Chicago' },
				{ path: 'version.source', message: 'Source is required' },
				{ path: 'structure.energyCharges.0.perKwh', message: 'Per kWh is required' },
				{ path: 'structure.currency', message: 'Currency must be three letters' },
				{ path: '', message: 'The form did not arrive whole. Try saving again.' }
			])
		).toEqual({
			fields: ['Time zone', 'Source', 'Charges'],
			messages: ['The form did not arrive whole. Try saving again.']
		});
		expect(formFieldWords('meta.holidays.country')).toBe('Public holidays');
		expect(formFieldWords('meta.unknown')).toBeNull();
	});

	it('lets the live preview name the field instead of repeating its message', () => {
		expect(previewFieldWords('timezone')).toBe('Time zone');
		expect(previewFieldWords('holidays.region')).toBe('Public holidays');
		expect(previewFieldWords('tariff.energyCharges.0.perKwh')).toBe('Charges');
		expect(previewFieldWords('equipment.0.power.watts')).toBeNull();
	});
});
