import { describe, expect, it } from 'vitest';
import { calculate } from './calculate';
import { calculateRequestSchema } from './request.schema';
import { tariffFromUrdb } from './urdb-import';
import { urdbRateSchema } from './urdb.schema';
import { grid, sample, steady, total } from './urdb.fixture';

/**
 * Bills of open-rate-database rates as NREL's open engines price them, each check value beside its
 * source (the rates are in tests/fixtures/urdb/, see its README). The engines use no holidays and no
 * daylight saving: priced in UTC with no holidays.
 */
describe('reference bills', () => {
	it('FPL RS-1 (tiered energy): a steady 2.739726 kW through 2017 costs 2,342.88 in energy', () => {
		const { tariff } = tariffFromUrdb(sample('fpl-rs1-2015.json'));
		// Source: NREL REopt test suite (REopt API reo/tests test_tiered_energy_rate / test_demand_ratchet
		// docstring; REopt.jl test/runtests.jl "Tiered Energy"): 24,000 kWh a year, fixed charge excluded,
		// 12 × 1,000 × (0.07531 + 0.0119) + 12,000 × (0.09613 + 0.0119) = 2,342.88.
		expect(total(steady(tariff, 2.739726, '2017-01'), 'energy')).toBeCloseTo(2342.88, 1);
	});

	it('tiered time-of-use demand: a flat 1,000,000 kWh a year pays 12 × (50 × 0 + (P − 50) × 12)', () => {
		const { tariff, notes } = tariffFromUrdb(sample('reopt-tiered-tou-demand.json'));
		expect(notes).toEqual([]);
		const kw = 1_000_000 / 8760;
		// Source: NREL REopt.jl test suite (test/runtests.jl, the tiered TOU demand test on
		// test/scenarios/tiered_tou_demand.json): demand tiers 0 $/kW up to 50 kW, then 12 $/kW, on a flat
		// load of 1e6 / 8760 kW: 12 × (50 × 0 + (P − 50) × 12) = 9,238.36.
		const expected = 12 * (50 * 0 + (kw - 50) * 12);
		expect(total(steady(tariff, kw, '2017-01'), 'demand')).toBeCloseTo(expected, 1);
	});

	it('a 35 % ratchet over seasonal demand prices (REopt’s lookback case 1) bills 5,302.50 of demand', () => {
		const { tariff } = tariffFromUrdb(sample('wallingford-primary-northford-2013.json'));
		const request = calculateRequestSchema.parse({
			period: { start: '2017-01', months: 12 },
			timezone: 'UTC',
			holidays: null,
			tariff,
			equipment: [
				{ name: 'Base load', power: { watts: 1000 }, schedule: { type: 'always' } },
				{
					name: 'January surge',
					power: { watts: 99_000 },
					months: [1],
					schedule: { type: 'windows', windows: [{ start: '07:00', end: '08:00' }] }
				}
			]
		});
		// Source: NREL REopt.jl test suite (test/runtests.jl "Lookback Demand Charges", case 1, on this rate,
		// URDB label 539f6a23ec4f024411ec8bf9): 1 kW all year with a 100 kW hour in January is billed
		// 100 × (10.5 + 0.35 × 10.5 × 5 + 0.35 × 11.5 × 6) = 5,302.50 of demand — the ratchet follows the
		// month's peak across the winter and summer prices. (Runrate's surge repeats each January morning;
		// the demand it sets is the same 100 kW.)
		expect(total(calculate(request).periods, 'demand')).toBeCloseTo(5302.5, 1);
	});

	it('a 35 % ratchet on one whole-month price: one 100 kW January sets 35 kW in every later month', () => {
		const { tariff } = tariffFromUrdb(
			urdbRateSchema.parse({
				flatdemandstructure: [[{ rate: 10.5 }]],
				demandratchetpercentage: Array(12).fill(0.35)
			})
		);
		const request = calculateRequestSchema.parse({
			period: { start: '2017-01', months: 12 },
			timezone: 'UTC',
			holidays: null,
			tariff,
			equipment: [
				{ name: 'Base load', power: { watts: 1000 }, schedule: { type: 'always' } },
				{
					name: 'January surge',
					power: { watts: 99_000 },
					months: [1],
					schedule: { type: 'windows', windows: [{ start: '07:00', end: '08:00' }] }
				}
			]
		});
		// Derived from the rule (REopt's case 1 above with one price, 10.5 $/kW, in every month):
		// 100 × 10.5 + 11 × 35 × 10.5 = 5,092.50.
		expect(total(calculate(request).periods, 'demand')).toBeCloseTo(100 * 10.5 + 11 * 35 * 10.5, 1);
	});
	/**
	 * REopt.jl's lookback cases 2 and 3 (test/runtests.jl "Lookback Demand Charges"): 100 kW in every hour
	 * of the year but four, 200 kW in hour 22 (January), 400 in hour 2,403 (April), 500 in hour 4,088
	 * (June) and 300 in hour 8,333 (December); monthly demand prices 10, 10, 20, 50, 20, 10, 20, 20, 20,
	 * 20, 20, 5 $/kW; a 75 % lookback. REopt treats the year as a loop, so its January to March look back at
	 * the same year's later months; Runrate looks back only at months inside the calculation, so those three
	 * months differ by design and the check is on April to December, where both rules see the same months.
	 */
	const LOOKBACK_PRICES = [10, 10, 20, 50, 20, 10, 20, 20, 20, 20, 20, 5];
	const lookbackYear = (ratchet: Record<string, unknown>) => {
		const kwh = Array.from({ length: 8760 }, () => 100);
		kwh[22 - 1] = 200;
		kwh[2403 - 1] = 400;
		kwh[4088 - 1] = 500;
		kwh[8333 - 1] = 300;
		const request = calculateRequestSchema.parse({
			period: { start: '2017-01', months: 12 },
			timezone: 'UTC',
			holidays: null,
			tariff: {
				currency: 'USD',
				demandCharges: LOOKBACK_PRICES.map((perKw, m) => ({
					label: `Demand ${m + 1}`,
					perKw,
					intervalMinutes: 60,
					months: [m + 1],
					ratchet: { percent: 75, ...ratchet }
				}))
			},
			meter: { start: '2017-01-01T00:00', intervalMinutes: 60, kwh }
		});
		return calculate(request).periods.map((p) => total([p], 'demand'));
	};
	const fromApril = (costs: number[]) => costs.slice(3).reduce((sum, cost) => sum + cost, 0);

	it('lookback months January, April and December (REopt’s case 2): April to December as REopt bills them', () => {
		const costs = lookbackYear({ months: [1, 4, 12] });
		// Source: REopt.jl test/runtests.jl, case 2: monthly peaks 300, 300, 300, 400, 300, 500, 300, 300, 300,
		// 300, 300, 300 (300 = 400 × 0.75). April to December: 400 × 50 + 300 × 20 + 500 × 10 + 5 × 300 × 20
		// + 300 × 5 = 62,500.
		expect(fromApril(costs)).toBeCloseTo(62_500, 6);
		// Derived from Runrate's rule (no later month is seen): January its own 200 kW, February and March
		// 0.75 × 200 = 150 kW.
		expect(costs.slice(0, 3)).toEqual([2000, 1500, 3000]);
	});

	it('lookback of 6 months (REopt’s case 3): April to December as REopt bills them', () => {
		const costs = lookbackYear({ monthsBack: 6 });
		// Source: REopt.jl test/runtests.jl, case 3: monthly peaks 225, 225, 225, 400, 300, 500, 375 × 6.
		// April to December: 400 × 50 + 300 × 20 + 500 × 10 + 5 × 375 × 20 + 375 × 5 = 70,375.
		expect(fromApril(costs)).toBeCloseTo(70_375, 6);
	});
	it('tiered time-of-use demand on one metered day (SAM’s demand-charge test): 200.00', () => {
		// Source: NREL SAM Simulation Core, test/shared_test/lib_utility_rate_equations_test.cpp,
		// test_demand_charges: on weekdays hours 15–19 are demand period 1 (20 $/kW up to 100 kW, then 15),
		// the rest period 2 (10 $/kW up to 100 kW, then 5); one day's hourly load 1, 1, 2 … 10 … 2, 1, 1, 1,
		// 1 kW peaks at 5 kW in period 1 and 10 kW in period 2: 5 × 20 + 10 × 10 = 200.00. SAM's year starts
		// on a Monday, so the day is 1 January 2018 (a Monday); the rest of the month draws nothing.
		const sam = {
			energyratestructure: [[{ rate: 0.05 }]],
			energyweekdayschedule: grid(0),
			energyweekendschedule: grid(0),
			demandratestructure: [
				[{ max: 100, rate: 20 }, { rate: 15 }],
				[{ max: 100, rate: 10 }, { rate: 5 }]
			],
			demandweekdayschedule: grid((_, hour) => (hour >= 15 && hour < 20 ? 0 : 1)),
			demandweekendschedule: grid(1)
		};
		// SAM's weekends are all period 2, which then spans weekday hours and whole weekend days: one charge
		// of every day, measured in its weekday windows on weekdays and all day at weekends.
		const { tariff, notes } = tariffFromUrdb(urdbRateSchema.parse(sam));
		expect(notes).toEqual([]);
		expect(tariff?.demandCharges?.[1]).toMatchObject({
			days: 'all',
			windows: [{ start: '20:00', end: '15:00' }],
			weekendWindows: [{ start: '00:00', end: '24:00' }]
		});
		const day = [1, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 9, 8, 7, 6, 5, 4, 3, 2, 1, 1, 1, 1, 1];
		const request = calculateRequestSchema.parse({
			period: { start: '2018-01', months: 1 },
			timezone: 'UTC',
			holidays: null,
			tariff,
			meter: {
				start: '2018-01-01T00:00',
				intervalMinutes: 60,
				kwh: [...day, ...Array.from({ length: 30 * 24 }, () => 0)]
			}
		});
		expect(total(calculate(request).periods, 'demand')).toBeCloseTo(200, 6);
	});
});
