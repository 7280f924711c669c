import { afterEach, describe, expect, it } from 'vitest';
import { RULES_VERSION } from '$lib/calc';
import { hashOf, inputKeyOf, slotOf, useRulesVersionForTest, type KeyInputs } from './stored-key';

const inputs = (): KeyInputs => ({
	site: { timezone: 'America/Chicago', country: 'US', region: null, tariffId: 't1', tariffVersion: null },
	scenario: { id: 's1', revision: 3, tariffId: null, tariffVersion: null },
	tariff: {
		tariff: { id: 't1', revision: 2, holidays: null },
		versions: [
			{ id: 'v1', number: 1, effectiveFrom: '2026-01-01', effectiveTo: null },
			{ id: 'v2', number: 2, effectiveFrom: '2027-01-01', effectiveTo: null }
		]
	},
	period: { start: '2027-01', months: 12 }
});

afterEach(() => useRulesVersionForTest());

describe('the stored result key', () => {
	it('is the same for the same inputs, however their objects were built', () => {
		const reordered = inputs();
		reordered.tariff.versions.reverse();
		reordered.site = {
			region: null,
			country: 'US',
			tariffVersion: null,
			tariffId: 't1',
			timezone: 'America/Chicago'
		};
		expect(inputKeyOf(reordered)).toBe(inputKeyOf(inputs()));
		expect(hashOf({ a: 1, b: [1, 2] })).toBe(hashOf({ b: [1, 2], a: 1 }));
		expect(hashOf([1, 2])).not.toBe(hashOf([2, 1]));
	});

	it('changes with each input a figure depends on', () => {
		const base = inputKeyOf(inputs());
		const changes: ((i: KeyInputs) => void)[] = [
			(i) => (i.scenario.revision = 4),
			(i) => (i.scenario.id = 's2'),
			(i) => (i.tariff.tariff.revision = 3),
			(i) => (i.tariff.tariff.id = 't2'),
			(i) => i.tariff.versions.push({ id: 'v3', number: 3, effectiveFrom: '2027-06-01', effectiveTo: null }),
			(i) => (i.tariff.versions[0]!.effectiveTo = '2026-12-31'),
			(i) => (i.site.tariffVersion = 1),
			(i) => (i.pinVersion = 2),
			(i) => (i.site.timezone = 'America/Denver'),
			(i) => (i.site.country = 'CA'),
			(i) => (i.site.region = 'TX'),
			(i) => (i.tariff.tariff.holidays = { country: 'US', region: 'CA' }),
			(i) => (i.period = { start: '2028-01', months: 12 }),
			(i) => (i.period = { billingPeriods: [{ from: '2027-01-01', to: '2027-01-31' }] })
		];
		const keys = changes.map((change) => {
			const changed = inputs();
			change(changed);
			return inputKeyOf(changed);
		});
		for (const key of keys) expect(key).not.toBe(base);
		expect(new Set(keys).size).toBe(keys.length);
	});

	it('changes with the rules version', () => {
		const before = inputKeyOf(inputs());
		useRulesVersionForTest(RULES_VERSION + 1);
		expect(inputKeyOf(inputs())).not.toBe(before);
		useRulesVersionForTest();
		expect(inputKeyOf(inputs())).toBe(before);
	});

	it('does not follow the site’s place when the tariff has its own holidays', () => {
		const own = inputs();
		own.tariff.tariff.holidays = { dates: ['2027-07-04'] };
		const moved = structuredClone(own);
		moved.site.region = 'TX';
		expect(inputKeyOf(moved)).toBe(inputKeyOf(own));
	});
});

describe('the slot', () => {
	it('names the period and the pinned version', () => {
		expect(slotOf({ start: '2027-01', months: 12 })).toBe('months:2027-01+12');
		expect(slotOf({ start: '2027-01', months: 12 }, 2)).toBe('months:2027-01+12:v2');
		expect(slotOf({ billingPeriods: [{ from: '2027-01-03', to: '2027-02-02' }] })).toBe('bills:2027-01-03');
	});
});
