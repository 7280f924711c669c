import { describe, expect, it } from 'vitest';
import { calculate } from './calculate';
import { calculateRequestSchema } from './request.schema';
import { calculateAcrossVersions, NoVersionInForce, versionInForce, type DatedTariff } from './versions';
import { tariffSchema } from './tariff.schema';

// Invented tariffs for the test: a flat rate that rises on 2027-07-01.
const flat = (perKwh: number) =>
	tariffSchema.parse({ currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh }] });
const versions: DatedTariff[] = [
	{ id: 'v1', number: 1, effectiveFrom: '2026-01-01', effectiveTo: null, tariff: flat(0.1) },
	{ id: 'v2', number: 2, effectiveFrom: '2027-07-01', effectiveTo: null, tariff: flat(0.2) }
];

const request = (period: unknown) =>
	calculateRequestSchema.parse({
		period,
		timezone: 'UTC',
		holidays: null,
		tariff: flat(0),
		equipment: [
			{ name: 'Load', category: 'other', quantity: 1, power: { watts: 1000 }, schedule: { type: 'always' } }
		]
	});

describe('the version in force', () => {
	it.each([
		['2025-12-31', null],
		['2026-01-01', 'v1'],
		['2027-06-30', 'v1'],
		['2027-07-01', 'v2'],
		['2030-01-01', 'v2']
	])('on %s is %s', (date, expected) => {
		expect(versionInForce(versions, date)?.id ?? null).toBe(expected);
	});

	it('ends at effectiveTo, inclusive', () => {
		const bounded = [{ ...versions[0]!, effectiveTo: '2026-06-30' }];
		expect(versionInForce(bounded, '2026-06-30')?.id).toBe('v1');
		expect(versionInForce(bounded, '2026-07-01')).toBeNull();
	});

	it('prefers the later-published of two versions effective the same day', () => {
		const correction = { ...versions[1]!, id: 'v3', number: 3 };
		expect(versionInForce([...versions, correction], '2027-08-01')?.id).toBe('v3');
	});
});

describe('calculating across a rate change', () => {
	it('prices each month on the version in force on its first day', () => {
		const result = calculateAcrossVersions(request({ start: '2027-01', months: 12 }), versions);
		expect(result.periods.map((p) => p.label)).toEqual(
			Array.from({ length: 12 }, (_, i) => `2027-${String(i + 1).padStart(2, '0')}`)
		);
		expect(result.versions.filter((v) => v.versionId === 'v1')).toHaveLength(6);
		// 1 kW always on: June (720 h) at 0.10, July (744 h) at 0.20.
		expect(result.periods[5]!.total).toBe(72);
		expect(result.periods[6]!.total).toBeCloseTo(148.8, 10);
	});

	it('gives the same answer as one calculate() when no version changes', () => {
		const one = calculate({ ...request({ start: '2026-02', months: 6 }), tariff: versions[0]!.tariff });
		const across = calculateAcrossVersions(request({ start: '2026-02', months: 6 }), versions);
		expect(across.totals).toEqual(one.totals);
		expect(across.periods).toEqual(one.periods);
	});

	it('keeps explicit billing periods as they are, judged by their first day', () => {
		const result = calculateAcrossVersions(
			request({
				billingPeriods: [
					{ from: '2027-06-15', to: '2027-07-14' },
					{ from: '2027-07-15', to: '2027-08-13' }
				]
			}),
			versions
		);
		expect(result.versions.map((v) => v.versionId)).toEqual(['v1', 'v2']);
		// 30 days × 24 kWh at 0.10, then 30 days × 24 kWh at 0.20.
		expect(result.periods.map((p) => p.total)).toEqual([72, 144]);
		expect(result.totals.cost).toBe(216);
	});

	it('refuses a period before the first version', () => {
		expect(() => calculateAcrossVersions(request({ start: '2025-12', months: 2 }), versions)).toThrow(
			NoVersionInForce
		);
	});
});

describe('months before the first version', () => {
	// A tariff whose first version is dated 2026-12-03 (the day it was added), priced for the year 2026.
	const added: DatedTariff[] = [
		{ id: 'v1', number: 1, effectiveFrom: '2026-12-03', effectiveTo: null, tariff: flat(0.1) }
	];

	it('refuses them by default, naming the first day without rates', () => {
		expect(() => calculateAcrossVersions(request({ start: '2026-01', months: 12 }), added)).toThrow(
			new NoVersionInForce('2026-01-01')
		);
	});

	it('prices them on the earliest version when asked, and says which months', () => {
		const result = calculateAcrossVersions(request({ start: '2026-01', months: 12 }), added, 'earliest');
		// December 2026 starts on the 1st, before the version's 3rd: it too is priced before the version.
		expect(result.beforeFirst).toEqual({
			labels: Array.from({ length: 12 }, (_, i) => `2026-${String(i + 1).padStart(2, '0')}`),
			number: 1,
			effectiveFrom: '2026-12-03'
		});
		// 1 kW always on for the 8,760 h of 2026 at $0.10 per kWh: $876.00 (hand-checked).
		expect(result.totals.cost).toBe(876);
	});

	it('leaves months a version is in force for alone', () => {
		const result = calculateAcrossVersions(request({ start: '2027-01', months: 3 }), added, 'earliest');
		expect(result.beforeFirst).toBeUndefined();
	});
});
