import { describe, expect, it } from 'vitest';
import { tariffSchema } from '$lib/calc';
import {
	type FixedChargeInput,
	type TierInput,
	blankDemandCharge,
	blankEnergyCharge,
	blankFixedCharge,
	blankPeriod,
	blankRider,
	blankSeason,
	blankTariff,
	blankTax,
	quarterHours,
	setChargeMonths,
	setFixedBasis,
	toggleMonth,
	unclaimedMonths
} from './tariff-blanks';
import type { DemandTierInput } from './demand-blanks';
import { DEMAND_TIERS, ENERGY_TIERS, insertTier, removeTier } from './tier-steps';

describe('a freshly added row', () => {
	it('gives a tariff the shared schema accepts, whichever charges were added', () => {
		const tariff = {
			...blankTariff(),
			fixedCharges: [blankFixedCharge()],
			energyCharges: [blankEnergyCharge('flat'), blankEnergyCharge('tiered'), blankEnergyCharge('tou')],
			demandCharges: [blankDemandCharge()],
			riders: [blankRider()],
			taxes: [blankTax()]
		};
		const result = tariffSchema.safeParse(tariff);
		expect(result.error?.issues).toBeUndefined();
		expect(result.success).toBe(true);
	});

	it('keeps the name and the months when a charge changes type', () => {
		expect(blankEnergyCharge('tiered', 'Demo delivery', [6, 7])).toMatchObject({
			label: 'Demo delivery',
			type: 'tiered',
			months: [6, 7]
		});
		expect(blankEnergyCharge('tou', 'Demo supply', [6])).toMatchObject({
			months: [6],
			seasons: [{ months: [6] }]
		});
	});

	it('makes a second period that the schema accepts beside the first', () => {
		const season = blankSeason();
		season.periods.push({ ...blankPeriod('Off-peak'), windows: [{ start: '21:00', end: '16:00' }] });
		const charge = { label: 'Demo supply', type: 'tou' as const, seasons: [season] };
		expect(tariffSchema.safeParse({ ...blankTariff(), energyCharges: [charge] }).success).toBe(true);
	});
});

describe('tiers', () => {
	it('adds a tier before the open-ended one, a step above the highest limit', () => {
		const tiers: TierInput[] = [
			{ uptoKwh: 500, perKwh: 0.05 },
			{ uptoKwh: null, perKwh: 0.08 }
		];
		insertTier(tiers, ENERGY_TIERS);
		expect(tiers).toEqual([
			{ uptoKwh: 500, perKwh: 0.05 },
			{ uptoKwh: 1000, perKwh: 0.05 },
			{ uptoKwh: null, perKwh: 0.08 }
		]);
	});

	it('starts an empty list with a tier and an open-ended one', () => {
		const tiers: TierInput[] = [];
		insertTier(tiers, ENERGY_TIERS);
		expect(tiers.map((tier) => tier.uptoKwh)).toEqual([500, null]);
	});

	it('steps demand tiers by 100 kW, at the price of the tier before', () => {
		const tiers: DemandTierInput[] = [
			{ uptoKw: 100, perKw: 10 },
			{ uptoKw: null, perKw: 15 }
		];
		insertTier(tiers, DEMAND_TIERS);
		expect(tiers).toEqual([
			{ uptoKw: 100, perKw: 10 },
			{ uptoKw: 200, perKw: 10 },
			{ uptoKw: null, perKw: 15 }
		]);
		removeTier(tiers, 2, DEMAND_TIERS);
		expect(tiers).toEqual([
			{ uptoKw: 100, perKw: 10 },
			{ uptoKw: null, perKw: 10 }
		]);
	});

	it('opens the new last tier when the last is removed', () => {
		const tiers: TierInput[] = [
			{ uptoKwh: 500, perKwh: 0.05 },
			{ uptoKwh: null, perKwh: 0.08 }
		];
		removeTier(tiers, 1, ENERGY_TIERS);
		expect(tiers).toEqual([{ uptoKwh: null, perKwh: 0.05 }]);
	});

	it('leaves the other limits alone when a middle tier is removed', () => {
		const tiers: TierInput[] = [
			{ uptoKwh: 500, perKwh: 0.05 },
			{ uptoKwh: 900, perKwh: 0.06 },
			{ uptoKwh: null, perKwh: 0.08 }
		];
		removeTier(tiers, 1, ENERGY_TIERS);
		expect(tiers.map((tier) => tier.uptoKwh)).toEqual([500, null]);
	});
});

describe('months and hours', () => {
	it('switches a month on or off and keeps calendar order', () => {
		expect(toggleMonth([6, 8], 7)).toEqual([6, 7, 8]);
		expect(toggleMonth([6, 7, 8], 7)).toEqual([6, 8]);
	});

	it('starts a new season with the months no season holds yet', () => {
		expect(unclaimedMonths([blankSeason([1, 2, 3, 4, 5, 10, 11, 12])])).toEqual([6, 7, 8, 9]);
		expect(unclaimedMonths([blankSeason()])).toEqual([]);
	});

	it('offers every quarter hour, and midnight only as an end', () => {
		expect(quarterHours()).toHaveLength(96);
		expect(quarterHours().slice(0, 2)).toEqual(['00:00', '00:15']);
		expect(quarterHours().at(-1)).toBe('23:45');
		expect(quarterHours(true).at(-1)).toBe('24:00');
	});
});

describe('a fixed charge changing between per month and per day', () => {
	it('moves the amount and drops the other key', () => {
		const charge: FixedChargeInput = { label: 'Demo basic charge', perMonth: 12.5 };
		setFixedBasis(charge, 'perDay');
		expect(charge).toEqual({ label: 'Demo basic charge', perDay: 12.5 });
		expect(tariffSchema.safeParse({ ...blankTariff(), fixedCharges: [charge] }).success).toBe(true);
	});

	it('does nothing when it is already billed that way', () => {
		const charge: FixedChargeInput = { label: 'Demo basic charge', perDay: 0.4 };
		setFixedBasis(charge, 'perDay');
		expect(charge).toEqual({ label: 'Demo basic charge', perDay: 0.4 });
	});
});

describe('a time-of-use charge limited to some months', () => {
	it('keeps its one season on the months it applies, so the schema accepts it without a dummy season', () => {
		const charge = blankEnergyCharge('tou', 'Summer peak adder');
		setChargeMonths(charge, [6, 7, 8, 9]);
		expect(charge).toMatchObject({ months: [6, 7, 8, 9], seasons: [{ months: [6, 7, 8, 9] }] });
		expect(tariffSchema.safeParse({ ...blankTariff(), energyCharges: [charge] }).success).toBe(true);
		setChargeMonths(charge, undefined);
		expect(charge).toMatchObject({
			months: undefined,
			seasons: [{ months: [...Array(12).keys()].map((i) => i + 1) }]
		});
	});

	it('drops months from every season and gives new ones to the last', () => {
		const charge = blankEnergyCharge('tou', 'Supply');
		if (charge.type !== 'tou') throw new Error('not time-of-use');
		charge.seasons = [blankSeason([6, 7, 8, 9]), blankSeason([1, 2, 3, 4, 5, 10, 11, 12])];
		setChargeMonths(charge, [5, 6, 7]);
		expect(charge.seasons.map((season) => season.months)).toEqual([[6, 7], [5]]);
		expect(unclaimedMonths(charge.seasons, [5, 6, 7, 8])).toEqual([8]);
	});
});
