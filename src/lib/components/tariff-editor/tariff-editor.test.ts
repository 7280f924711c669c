import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { tiered } from '$lib/calc/tariffs.fixture';
import { blankEnergyCharge, blankSeason, blankTariff } from './tariff-blanks';
import { numberDraft } from '$lib/components/fields/number-text';
import {
	describePath,
	fieldId,
	fieldIdsToward,
	flaggedMonths,
	tariffIssues,
	writeDraft
} from './tariff-editor';

// Every tariff here is invented test data, no real utility's rates. Expected messages are the shared
// schema's own (src/lib/calc/tariff.schema.ts and tariff.ts), so a change there shows up here.

describe('a number box in the tariff', () => {
	it('writes nothing when the box is empty, so the schema says the field is required', () => {
		expect(numberDraft('')).toBeUndefined();
		expect(numberDraft('   ')).toBeUndefined();
		const charge = blankEnergyCharge('flat');
		if (charge.type !== 'flat') throw new Error('expected a flat blank');
		writeDraft(charge, 'perKwh', numberDraft(''));
		const tariff: TariffInput = { ...blankTariff(), energyCharges: [charge] };
		expect(tariffIssues(tariff)).toEqual([
			{ path: 'energyCharges.0.perKwh', message: 'Per kWh is required' }
		]);
	});

	it('keeps text that is not a number as text, which the schema refuses by name', () => {
		expect(numberDraft('12abc')).toBe('12abc');
		expect(numberDraft('0x10')).toBe('0x10');
		expect(numberDraft('Infinity')).toBe('Infinity');
		expect(numberDraft('1e999')).toBe('1e999');
		const tariff: TariffInput = { ...blankTariff(), taxes: [{ label: 'Demo tax', percent: 0 }] };
		writeDraft(tariff.taxes![0]!, 'percent', numberDraft('four'));
		expect(tariffIssues(tariff)).toEqual([{ path: 'taxes.0.percent', message: 'Percent must be a number' }]);
	});
});

describe('issues from the live check', () => {
	it('reports nothing for a valid tariff', () => {
		expect(tariffIssues(blankTariff())).toEqual([]);
	});

	it('puts a tier out of order at that tier’s limit', () => {
		const tariff: TariffInput = {
			...blankTariff(),
			energyCharges: [
				blankEnergyCharge('flat'),
				blankEnergyCharge('flat'),
				tiered('Demo delivery', [500, 0.05], [300, 0.07], [null, 0.09])
			]
		};
		expect(tariffIssues(tariff)).toEqual([
			{
				path: 'energyCharges.2.tiers.1.uptoKwh',
				message: 'Each tier must end above the one before (500 kWh)'
			}
		]);
	});

	it('puts a repeated month at the later season and a missed month at the seasons list', () => {
		const charge = blankEnergyCharge('tou');
		if (charge.type !== 'tou') throw new Error('expected a time-of-use blank');
		charge.seasons = [blankSeason([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]), blankSeason([6])];
		const issues = tariffIssues({ ...blankTariff(), energyCharges: [charge] });
		expect(issues.map((issue) => issue.path)).toEqual([
			'energyCharges.0.seasons.1.months.0',
			'energyCharges.0.seasons'
		]);
		expect(issues[1]?.message).toContain('12 (December)');
	});

	it('puts overlapping periods at the later period’s hours', () => {
		const charge = blankEnergyCharge('tou');
		if (charge.type !== 'tou') throw new Error('expected a time-of-use blank');
		charge.seasons[0]!.periods.push({
			label: 'Shoulder',
			perKwh: 0.2,
			days: 'all',
			windows: [{ start: '20:00', end: '22:00' }]
		});
		const issues = tariffIssues({ ...blankTariff(), energyCharges: [charge] });
		expect(issues).toEqual([
			{
				path: 'energyCharges.0.seasons.0.periods.1.windows',
				message: '“Shoulder” overlaps “On-peak” on weekdays at 20:00'
			}
		]);
	});

	it('reports an emptied fixed charge at its amount, not as the choice between month and day', () => {
		const tariff: TariffInput = {
			...blankTariff(),
			fixedCharges: [{ label: 'Demo customer charge', perDay: 1 }]
		};
		writeDraft(tariff.fixedCharges![0]!, 'perDay', undefined);
		expect(tariffIssues(tariff)).toEqual([{ path: 'fixedCharges.0.perDay', message: 'Per day is required' }]);
	});

	it('keeps the choice message when a fixed charge gives both amounts', () => {
		const tariff = { ...blankTariff(), fixedCharges: [{ label: 'Demo', perMonth: 1, perDay: 1 }] };
		expect(tariffIssues(tariff as unknown as TariffInput)).toEqual([
			{ path: 'fixedCharges.0', message: 'Give a fixed charge per month, per day or per year (one of them)' }
		]);
	});
});

describe('showing issues beside their fields', () => {
	const issues = [
		{
			path: 'energyCharges.0.seasons.1.months.2',
			message: 'Month 3 (March) is already in an earlier season'
		},
		{ path: 'energyCharges.0.seasons.1.months', message: 'Months must not be empty' },
		{ path: 'energyCharges.0.seasons.10.months', message: 'Another season' }
	];

	it('names the months the issues point at by position', () => {
		expect([...flaggedMonths(issues, 'energyCharges.0.seasons.1.months', [1, 2, 3])]).toEqual([3]);
	});

	it('gives each path an element id, and the ids to fall back to', () => {
		expect(fieldId('energyCharges.0.perKwh')).toBe('te-energyCharges-0-perKwh');
		expect(fieldIdsToward('taxes.1.percent')).toEqual([
			'te-taxes-1-percent',
			'te-taxes-1',
			'te-taxes',
			'te-tariff'
		]);
	});

	it('says in words where an issue is', () => {
		expect(describePath('energyCharges.0.seasons.1.months.2')).toBe('Energy charge 1 · season 2');
		expect(describePath('demandCharges.1.windows.0.start')).toBe('Demand charge 2 · window 1');
		expect(describePath('currency')).toBe('Tariff');
	});
});
