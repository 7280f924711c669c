import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { filteredBy, issueInWords, rateOutcome } from './rate-outcome';

// Florida Power & Light's RS-1 (2015), a public record of the open rate database (tests/fixtures/urdb/).
const RS1 = JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8')) as Record<
	string,
	unknown
>;
const ALL = { sectors: [], utilityContains: '', timezone: 'America/New_York' };
const TODAY = '2026-12-03';

describe('the admin’s filters', () => {
	it('take a rate by sector (any of those ticked, letters case aside) and by part of the utility’s name', () => {
		expect(filteredBy(RS1, { ...ALL, sectors: ['Residential'] })).toBeNull();
		expect(filteredBy({ ...RS1, sector: 'residential' }, { ...ALL, sectors: ['Residential'] })).toBeNull();
		expect(filteredBy(RS1, { ...ALL, sectors: ['Commercial', 'Lighting'] })).toBe('sector');
		expect(filteredBy(RS1, { ...ALL, utilityContains: ' power & LIGHT ' })).toBeNull();
		expect(filteredBy(RS1, { ...ALL, utilityContains: 'Georgia' })).toBe('utility');
		expect(filteredBy(null, { ...ALL, sectors: ['Residential'] })).toBe('sector');
	});
});

describe('one rate of the file', () => {
	it('is ready as a public tariff with its provenance: label, source, dates, customer class, time zone', () => {
		const outcome = rateOutcome(RS1, ALL, TODAY);
		expect(outcome.kind).toBe('ready');
		if (outcome.kind !== 'ready') return;
		expect(outcome.label).toBe('5550d6fd5457a3187e8b4567');
		expect(outcome.submission.meta).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service',
			customerClass: 'residential',
			country: 'US',
			currency: 'USD',
			timezone: 'America/New_York',
			holidays: null
		});
		expect(outcome.submission.version).toMatchObject({
			effectiveFrom: '2015-06-01',
			effectiveTo: '2015-08-31',
			source: 'https://openei.org/apps/USURDB/rate/view/5550d6fd5457a3187e8b4567',
			checkedOn: TODAY
		});
	});

	it('names the database and the label as its source when the rate has no address', () => {
		const outcome = rateOutcome({ ...RS1, uri: undefined }, ALL, TODAY);
		expect(outcome.kind === 'ready' && outcome.submission.version.source).toBe(
			'OpenEI Utility Rate Database, label 5550d6fd5457a3187e8b4567'
		);
	});

	it('is skipped with the schema’s messages in words, saying where (period and tier, month and hour)', () => {
		const structure = [[{ rate: -0.1 }]];
		const outcome = rateOutcome({ ...RS1, energyratestructure: structure }, ALL, TODAY);
		expect(outcome).toMatchObject({ kind: 'skipped', label: '5550d6fd5457a3187e8b4567' });
		expect(outcome.kind === 'skipped' && outcome.reasons).toEqual([
			'Energy rates, period 1, tier 1: Rate must be zero or more'
		]);
		expect(
			issueInWords({
				path: 'energyweekendschedule.2.7',
				message: 'Period 3 is not in the energy rate structure (it has 1)'
			})
		).toBe('Weekend schedule, month 3, hour 7: Period 3 is not in the energy rate structure (it has 1)');
	});

	it('is skipped with the import’s notes when its energy cannot be expressed (kWh-per-kW blocks)', () => {
		const blocks = [
			[
				{ rate: 0.1, max: 200, unit: 'kWh/kW' },
				{ rate: 0.05, unit: 'kWh/kW' }
			]
		];
		const outcome = rateOutcome({ ...RS1, energyratestructure: blocks }, ALL, TODAY);
		expect(outcome.kind).toBe('skipped');
		expect(outcome.kind === 'skipped' && outcome.reasons.join(' ')).toMatch(/kWh\/kW|kWh per kW/i);
	});

	it('is ready with the import’s notes when a part is not taken (net-metering rules, named by the notes)', () => {
		const outcome = rateOutcome({ ...RS1, dgrules: 'Net Metering' }, ALL, TODAY);
		expect(outcome.kind).toBe('ready');
		expect(outcome.kind === 'ready' && outcome.notes.join(' ')).toMatch(/dgrules|net.metering/i);
	});

	it('is skipped without a label (a later import could not tell it is present) or a start date', () => {
		expect(rateOutcome({ ...RS1, label: undefined }, ALL, TODAY)).toMatchObject({
			kind: 'skipped',
			reasons: [expect.stringMatching(/no label/)]
		});
		expect(rateOutcome({ ...RS1, startdate: undefined }, ALL, TODAY)).toMatchObject({
			kind: 'skipped',
			reasons: [expect.stringMatching(/no start date/)]
		});
		expect(rateOutcome(['not', 'a', 'rate'], ALL, TODAY)).toMatchObject({
			kind: 'skipped',
			reasons: ['This entry of the list is not a rate (a JSON object)']
		});
	});

	it('is the single-rate import’s submission: the label in the description, what was not taken in the change note', () => {
		const outcome = rateOutcome({ ...RS1, dgrules: 'Net Metering', sector: 'Agriculture' }, ALL, TODAY);
		expect(outcome.kind).toBe('ready');
		if (outcome.kind !== 'ready') return;
		expect(outcome.submission.meta.customerClass).toBe('agricultural');
		expect(outcome.submission.meta.description).toMatch(
			/^Imported from the OpenEI Utility Rate Database, label 5550d6fd5457a3187e8b4567\./
		);
		expect(outcome.submission.version.changeNote).toMatch(
			/^Imported from the OpenEI Utility Rate Database\. Not taken: .*dgrules/i
		);
	});

	it('keeps a long name, shortened to the library’s 120 characters, with a note saying so', () => {
		const outcome = rateOutcome({ ...RS1, name: 'Very long invented rate name '.repeat(10) }, ALL, TODAY);
		expect(outcome.kind).toBe('ready');
		if (outcome.kind !== 'ready') return;
		expect(outcome.submission.meta.name).toHaveLength(120);
		expect(outcome.notes).toContain('The rate’s name was shortened to 120 characters');
	});

	it('refuses text the database cannot store, in words', () => {
		const outcome = rateOutcome({ ...RS1, utility: 'Invented\u0000Utility' }, ALL, TODAY);
		expect(outcome.kind).toBe('skipped');
	});
});
