import { describe, expect, it } from 'vitest';
import { describeField, summaryEntries } from '$lib/components/tariff-editor/tariff-editor';
import {
	formFieldWords,
	formSummary,
	holidaysOf,
	metaDraftFrom,
	previewFieldWords,
	submission
} from './tariff-form';

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
		// The country is asked once, for the tariff and its holiday calendar: its field shows the message.
		expect(formFieldWords('meta.holidays.country')).toBe('Country');
		expect(formFieldWords('meta.holidays.dates.0')).toBe('Public holidays');
		expect(formFieldWords('meta.unknown')).toBeNull();
	});

	it('lets the live preview name the field instead of repeating its message', () => {
		expect(previewFieldWords('timezone')).toBe('Time zone');
		expect(previewFieldWords('holidays.region')).toBe('Public holidays');
		expect(previewFieldWords('tariff.energyCharges.0.perKwh')).toBe('Charges');
		expect(previewFieldWords('equipment.0.power.watts')).toBeNull();
	});
});

describe('the tariff form’s holidays', () => {
	const meta = { ...metaDraftFrom({}), country: 'ca', holidayRegion: '' };

	it('uses the tariff’s own country for its holiday calendar, asked once', () => {
		expect(holidaysOf({ ...meta, holidayMode: 'country' })).toEqual({ country: 'CA' });
		const sent = submission({ ...meta, holidayMode: 'country' }, {} as never, { currency: 'CAD' });
		expect(sent.meta.holidays).toEqual({ country: 'CA' });
		expect(sent.meta.currency).toBe('CAD'); // the currency is asked once, with the charges
	});

	it('prices the preview with the tariff’s own holiday dates, as the tariff page does', () => {
		// The cause of $126.67 (preview) against $126.10 (tariff page) for the demo "General service
		// time-of-use": the preview left out a tariff's own list of holidays.
		expect(holidaysOf({ ...meta, holidayMode: 'dates', holidayDates: '2026-01-01\n2026-07-03' })).toEqual({
			dates: ['2026-01-01', '2026-07-03']
		});
	});

	it('starts a new tariff empty: no country, zone or currency that looks real', () => {
		expect(metaDraftFrom({})).toMatchObject({ country: '', timezone: '', currency: '', holidayMode: 'none' });
	});
});
