import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deviceArb, periodArb, rate, requestArb, tariffArb, zoneArb } from './arbitraries.fixture';
import { calculate } from './calculate';
import { dayNumber, isoDate } from './dates';
import { parseRequest } from './parse';
import { type CalculateRequestInput, calculateRequestSchema } from './request.schema';

function parse(input: CalculateRequestInput) {
	const result = parseRequest(calculateRequestSchema, input);
	if (!result.success) throw new Error(JSON.stringify(result.error.issues));
	return result.data;
}

function numbersOf(value: unknown): number[] {
	if (typeof value === 'number') return [value];
	if (value && typeof value === 'object') return Object.values(value).flatMap(numbersOf);
	return [];
}

describe('any valid request', () => {
	it('never answers NaN or Infinity', () => {
		fc.assert(
			fc.property(requestArb, (input) => {
				expect(numbersOf(calculate(parse(input))).every(Number.isFinite)).toBe(true);
			}),
			{ numRuns: 60 }
		);
	});

	it('totals exactly the sum of its rounded lines', () => {
		fc.assert(
			fc.property(requestArb, (input) => {
				for (const period of calculate(parse(input)).periods) {
					const sum = period.charges.reduce((total, charge) => total + charge.amount, 0);
					expect(Math.abs(period.total - sum)).toBeLessThan(1e-9);
					for (const charge of period.charges)
						expect(Math.round(charge.amount * 100) / 100).toBe(charge.amount);
				}
			}),
			{ numRuns: 60 }
		);
	});

	it('shares its total among the devices and the shared cost to the cent, each period and the year', () => {
		const cents = (money: number) => Math.round(money * 100);
		fc.assert(
			fc.property(requestArb, (input) => {
				const result = calculate(parse(input));
				let yearCents = 0;
				for (const period of result.periods) {
					const shares =
						period.equipment.reduce((sum, share) => sum + cents(share.cost), 0) + cents(period.sharedCost);
					expect(shares).toBe(cents(period.total));
					for (const share of period.equipment) expect(cents(share.cost) / 100).toBe(share.cost);
					yearCents += shares;
				}
				expect(yearCents).toBe(cents(result.totals.cost));
			}),
			{ numRuns: 60 }
		);
	});
});

describe('more running', () => {
	// Running below standby (say 0 W running, 46 W standby) would rightly cost less, so no standby here.
	it('never costs less on a tariff without a minimum', () => {
		const hoursArb = fc.tuple(
			fc.double({ min: 0, max: 24, noNaN: true }),
			fc.double({ min: 0, max: 24, noNaN: true })
		);
		fc.assert(
			fc.property(
				tariffArb,
				zoneArb,
				periodArb,
				deviceArb,
				hoursArb,
				(tariff, timezone, period, base, hours) => {
					const [fewer, more] = [Math.min(...hours), Math.max(...hours)];
					const total = (hoursPerDay: number) =>
						calculate(
							parse({
								period,
								timezone,
								holidays: null,
								tariff,
								equipment: [{ ...base, standbyWatts: 0, schedule: { type: 'hours', hoursPerDay } }]
							})
						).totals.cost;
					expect(total(more)).toBeGreaterThanOrEqual(total(fewer));
				}
			),
			{ numRuns: 60 }
		);
	});
});

describe('splitting a billing period', () => {
	it('does not change the kWh or the flat-rate energy', () => {
		const splitArb = fc.record({
			from: fc.integer({ min: 0, max: 300 }),
			days: fc.integer({ min: 2, max: 60 })
		});
		fc.assert(
			fc.property(
				zoneArb,
				fc.array(deviceArb, { minLength: 1, maxLength: 3 }),
				rate,
				splitArb,
				(timezone, equipment, perKwh, split) => {
					const start = dayNumber('2027-01-01') + split.from;
					const end = start + split.days - 1;
					const middle = start + Math.floor(split.days / 2) - 1;
					const tariff = {
						currency: 'USD',
						energyCharges: [{ label: 'Energy', type: 'flat' as const, perKwh }]
					};
					const periods = (billingPeriods: Array<{ from: string; to: string }>) =>
						calculate(parse({ period: { billingPeriods }, timezone, holidays: null, tariff, equipment }));
					const whole = periods([{ from: isoDate(start), to: isoDate(end) }]);
					const parts = periods([
						{ from: isoDate(start), to: isoDate(middle) },
						{ from: isoDate(middle + 1), to: isoDate(end) }
					]);
					expect(parts.totals.kwh).toBeCloseTo(whole.totals.kwh, 6);
					expect(Math.abs(parts.totals.cost - whole.totals.cost)).toBeLessThanOrEqual(0.01 + 1e-9);
				}
			),
			{ numRuns: 60 }
		);
	});
});

describe('any JSON at all', () => {
	it('is parsed or refused with issues, never thrown', () => {
		fc.assert(
			fc.property(fc.jsonValue(), (json) => {
				const result = parseRequest(calculateRequestSchema, json);
				expect(result.success || result.error.issues.length > 0).toBe(true);
			}),
			{ numRuns: 200 }
		);
	});
});
