import { describe, expect, it } from 'vitest';
import { tariffSchema } from './tariff.schema';
import { device, flatTariff, line, onlyPeriod, run } from './requests.fixture';
import { tieredTouSeason, tou } from './tariffs.fixture';

/**
 * The charges real tariffs use (issue 19). Each expected figure is a worked example derived from the
 * rule stated in the module that applies it; June 2027 has 30 days, priced in UTC with no holidays.
 */
describe('tiers inside time-of-use periods', () => {
	const tariff = flatTariff(0, {
		energyCharges: [tou('Energy', tieredTouSeason([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]))]
	});

	it('tiers the month’s kWh across periods and shares each tier by the periods’ kWh', () => {
		// 1 kW all month: 720 kWh, 180 of them 12:00–18:00. Tier 1 holds 500, tier 2 220 (derived from
		// the rule): peak 180/720 × (500 × 0.30 + 220 × 0.40) = 59.50; other 540/720 × (500 × 0.10 +
		// 220 × 0.15) = 62.25; together 121.75.
		const period = onlyPeriod({ tariff, equipment: [device({ power: { watts: 1000 } })] });
		expect(period.kwh).toBeCloseTo(720, 9);
		expect(line(period, 'energy', 'Energy')).toBe(121.75);
	});

	it('gives each device the blended price of the intervals it used', () => {
		const period = onlyPeriod({
			tariff,
			equipment: [
				device({
					name: 'Day lights',
					power: { watts: 1000 },
					schedule: { type: 'windows', windows: [{ start: '12:00', end: '18:00' }] }
				}),
				device({
					name: 'Night pump',
					power: { watts: 1000 },
					schedule: { type: 'windows', windows: [{ start: '18:00', end: '12:00' }] }
				})
			]
		});
		// Derived from the rule: the lights use the 180 peak kWh (59.50), the pump the 540 others (62.25).
		expect(period.equipment.map((share) => share.cost)).toEqual([59.5, 62.25]);
	});

	it('refuses a season whose periods lack a price above each limit', () => {
		const broken = structuredClone(tariff);
		const season = (
			broken.energyCharges![0] as { seasons: Array<{ periods: Array<{ abovePerKwh?: number[] }> }> }
		).seasons[0]!;
		season.periods[0]!.abovePerKwh = [];
		const result = tariffSchema.safeParse(broken);
		expect(result.success).toBe(false);
		expect(result.error?.issues.map((issue) => issue.message)).toEqual([
			'“Peak” needs one price above each tier limit: the season has one tier limit'
		]);
	});
});

describe('daily-allowance tiers', () => {
	it('multiplies the tier bounds by the days of the billing period', () => {
		// 10 kWh a day × 30 days = 300 kWh at 0.10, the other 420 at 0.20: 114.00 (derived from the rule).
		const period = onlyPeriod({
			tariff: flatTariff(0, {
				energyCharges: [
					{
						label: 'Energy',
						type: 'tiered',
						tiersPer: 'day',
						tiers: [
							{ uptoKwh: 10, perKwh: 0.1 },
							{ uptoKwh: null, perKwh: 0.2 }
						]
					}
				]
			})
		});
		expect(line(period, 'energy', 'Energy')).toBe(114);
	});
});

describe('tiered and ratcheted demand', () => {
	it('prices the first 100 kW at one rate and the rest at another', () => {
		const period = onlyPeriod({
			tariff: flatTariff(0, {
				demandCharges: [
					{
						label: 'Demand',
						tiers: [
							{ uptoKw: 100, perKw: 10 },
							{ uptoKw: null, perKw: 15 }
						]
					}
				]
			}),
			equipment: [device({ power: { watts: 150_000 } })]
		});
		// 100 × 10 + 50 × 15 = 1,750.00 (derived from the rule).
		expect(line(period, 'demand', 'Demand')).toBe(1750);
	});

	it('bills the larger of the month’s peak and 80 % of the highest earlier peak', () => {
		const result = run({
			period: { start: '2027-06', months: 3 },
			tariff: flatTariff(0, {
				demandCharges: [{ label: 'Demand', perKw: 10, ratchet: { percent: 80, monthsBack: 11 } }]
			}),
			equipment: [
				device({ name: 'Summer chiller', power: { watts: 100_000 }, months: [6] }),
				device({ name: 'Pump', power: { watts: 10_000 } })
			]
		});
		// June 110 kW → 1,100; July and August measure 10 kW, billed at 0.8 × 110 = 88 kW → 880 (derived).
		expect(result.periods.map((period) => line(period, 'demand', 'Demand'))).toEqual([1100, 880, 880]);
		// The devices' shares still add up to each bill.
		for (const period of result.periods) {
			const shares = period.equipment.reduce((sum, share) => sum + share.cost, 0);
			expect(shares + period.sharedCost).toBeCloseTo(period.total, 9);
		}
	});

	it('looks only at listed months when the ratchet lists them', () => {
		const result = run({
			period: { start: '2027-06', months: 3 },
			tariff: flatTariff(0, {
				demandCharges: [{ label: 'Demand', perKw: 10, ratchet: { percent: 50, months: [7] } }]
			}),
			equipment: [
				device({ name: 'Summer chiller', power: { watts: 100_000 }, months: [6] }),
				device({ name: 'Pump', power: { watts: 10_000 } })
			]
		});
		// June is not listed, so July and August bill their own 10 kW (derived from the rule).
		expect(result.periods.map((period) => line(period, 'demand', 'Demand'))).toEqual([1100, 100, 100]);
	});
});

describe('yearly fixed charges and minimums per day and per year', () => {
	it('charges a twelfth of a yearly fixed charge each month', () => {
		const period = onlyPeriod({
			tariff: flatTariff(0.1, { fixedCharges: [{ label: 'Yearly service', perYear: 120 }] })
		});
		expect(line(period, 'fixed', 'Yearly service')).toBe(10);
	});

	it('floors the bill at the minimum per day × the days', () => {
		// 1 W all month: 0.72 kWh × 0.10 = 0.07; the floor 2.00 × 30 days = 60.00 adds 59.93 (derived).
		const period = onlyPeriod({
			tariff: flatTariff(0.1, { minimumPerDay: 2 }),
			equipment: [device({ power: { watts: 1 } })]
		});
		expect(line(period, 'minimum', 'Minimum bill')).toBe(59.93);
		expect(period.total).toBe(60);
	});

	it('tops a year up to the yearly minimum on its last billing period', () => {
		const result = run({
			period: { start: '2027-01', months: 12 },
			tariff: flatTariff(0.1, { fixedCharges: [{ label: 'Service', perMonth: 5 }], minimumPerYear: 100 }),
			equipment: [device({ power: { watts: 1 } })]
		});
		// 8.76 kWh × 0.10 = 0.88 over the year (each month's energy line rounded) plus 12 × 5.00 fixed.
		const before = result.periods.slice(0, 11).reduce((sum, period) => sum + period.total, 0);
		const december = result.periods[11]!;
		const topUp = line(december, 'minimum', 'Yearly minimum');
		expect(before + december.total).toBeCloseTo(100, 9);
		expect(topUp).toBeGreaterThan(39);
	});
});
