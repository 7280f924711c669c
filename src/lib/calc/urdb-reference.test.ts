import { describe, expect, it } from 'vitest';
import { tariffFromUrdb } from './urdb-import';
import { sample, steady, total } from './urdb.fixture';

/**
 * Bills of open-rate-database rates as NREL's open engines price them, each check value beside its
 * source. The engines use no holidays and no daylight saving: priced in UTC with no holidays.
 */
describe('reference bills', () => {
	it('FPL RS-1 (tiered): a steady 2.739726 kW through 2017 costs 2,342.88 in energy', () => {
		const { tariff } = tariffFromUrdb(sample('fpl-rs1-2015.json'));
		// Source: NREL REopt API test suite (reo/tests, energy tiers: RS-1 on 24,000 kWh a year, fixed
		// charge excluded): 12 × 1,000 × (0.07531 + 0.0119) + 12,000 × (0.09613 + 0.0119) = 2,342.88.
		expect(total(steady(tariff, 2.739726, '2017-01'), 'energy')).toBeCloseTo(2342.88, 1);
	});
});
