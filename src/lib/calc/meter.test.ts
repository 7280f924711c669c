import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clockMinutes } from './clock';
import { dayNumber } from './dates';
import { parseRequest } from './parse';
import { calculateRequestSchema } from './request.schema';
import { device, flatTariff, line, run } from './requests.fixture';
import { dayShapes } from './zone-days';

type Window = { start: string; end: string };
type Load = { kw: number; window: Window };

/** The 15-minute kWh series of devices on in a daily window, day by day in the zone (real intervals). */
function seriesOf(loads: readonly Load[], timezone: string, from: string, to: string): number[] {
	const kwh: number[] = [];
	for (const shape of dayShapes(timezone, dayNumber(from), dayNumber(to))) {
		for (const minute of shape.minutes) {
			let kw = 0;
			for (const load of loads) {
				const start = clockMinutes(load.window.start);
				const end = clockMinutes(load.window.end);
				const on = start < end ? minute >= start && minute < end : minute >= start || minute < end;
				if (on) kw += load.kw;
			}
			kwh.push(kw / 4);
		}
	}
	return kwh;
}

const quarter = fc.integer({ min: 0, max: 95 }).map((slot) => {
	const minutes = slot * 15;
	return `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
});
const loadArb = fc.record({
	kw: fc.integer({ min: 1, max: 5000 }).map((w) => w / 100),
	window: fc
		.tuple(quarter, quarter)
		.filter(([a, b]) => a !== b)
		.map(([start, end]) => ({ start, end }))
});

describe('pricing a meter series', () => {
	it('gives the same bill from equipment as from the meter series of that equipment (issue 19 property)', () => {
		fc.assert(
			fc.property(
				fc.array(loadArb, { minLength: 1, maxLength: 4 }),
				fc.constantFrom('UTC', 'America/Chicago', 'Europe/Berlin'),
				(loads, timezone) => {
					const tariff = flatTariff(0.13, {
						fixedCharges: [{ label: 'Service', perMonth: 9 }],
						demandCharges: [{ label: 'Demand', perKw: 4 }]
					});
					const base = { period: { start: '2027-01', months: 12 }, timezone, holidays: null, tariff };
					const fromEquipment = run({
						...base,
						equipment: loads.map((load, i) =>
							device({
								name: `Load ${i + 1}`,
								power: { watts: load.kw * 1000 },
								schedule: { type: 'windows', windows: [load.window] }
							})
						)
					});
					const kwh = seriesOf(loads, timezone, '2027-01-01', '2027-12-31');
					const fromMeter = run({
						...base,
						equipment: [],
						meter: { start: '2027-01-01T00:00', intervalMinutes: 15, kwh }
					});
					expect(fromMeter.totals.kwh).toBeCloseTo(fromEquipment.totals.kwh, 6);
					expect(fromMeter.totals.peakKw).toBeCloseTo(fromEquipment.totals.peakKw, 9);
					// The two add the same kWh in a different order, so a line on a half cent (7.5 kWh at
					// 0.13 is 0.975) may round either way: at most a cent a line apart.
					fromMeter.periods.forEach((period, p) =>
						period.charges.forEach((charge, c) => {
							const apart = Math.abs(charge.amount - (fromEquipment.periods[p]?.charges[c]?.amount ?? NaN));
							expect(apart).toBeLessThanOrEqual(0.01 + 1e-9);
						})
					);
					for (const period of fromMeter.periods) {
						expect((period.meter?.cost ?? 0) + period.sharedCost).toBeCloseTo(period.total, 9);
					}
				}
			),
			{ numRuns: 25 }
		);
	});

	it('reads 60-minute data as hourly means: its 15-minute demand is the hour’s mean', () => {
		// 2 kWh in one hour of June is 2 kW for that hour (derived from the rule), 0 the rest of the month.
		const kwh = Array.from({ length: 30 * 24 }, (_, hour) => (hour === 100 ? 2 : 0));
		const result = run({
			tariff: flatTariff(0.1, { demandCharges: [{ label: 'Demand', perKw: 10 }] }),
			equipment: [],
			meter: { start: '2027-06-01T00:00', intervalMinutes: 60, kwh }
		});
		const [june] = result.periods;
		expect(june?.peakKw).toBe(2);
		expect(line(june!, 'demand', 'Demand')).toBe(20);
		expect(june?.kwh).toBe(2);
	});

	it('adds the meter to equipment beside it, and their shares add up to each bill', () => {
		const kwh = Array.from({ length: 30 * 96 }, () => 0.5); // 2 kW all June
		const [june] = run({
			tariff: flatTariff(0.1, {
				demandCharges: [{ label: 'Demand', perKw: 10 }],
				taxes: [{ label: 'Tax', percent: 5 }]
			}),
			equipment: [device({ power: { watts: 1000 } })],
			meter: { start: '2027-06-01T00:00', intervalMinutes: 15, kwh }
		}).periods;
		// 3 kW all month: 2,160 kWh × 0.10 = 216.00, demand 3 kW × 10 = 30.00, tax 5 % (derived).
		expect(june?.kwh).toBeCloseTo(2160, 9);
		expect(june?.total).toBe(258.3);
		expect(june?.meter?.cost).toBe(172.2);
		expect(june?.equipment[0]?.cost).toBe(86.1);
	});

	it('counts a spring-forward day’s 92 quarter hours as the rest of the core does', () => {
		// March 2027 in Chicago: 31 days × 96 − 4 = 2,972 quarter hours (clocks skip 02:00–03:00 on the 14th).
		const request = {
			period: { start: '2027-03', months: 1 },
			timezone: 'America/Chicago',
			holidays: null,
			tariff: flatTariff(0.1),
			equipment: [],
			meter: {
				start: '2027-03-01T00:00',
				intervalMinutes: 15 as const,
				kwh: Array.from({ length: 2972 }, () => 0.25)
			}
		};
		expect(run(request).periods[0]?.kwh).toBeCloseTo(743, 9);
		const short = parseRequest(calculateRequestSchema, {
			...request,
			meter: { ...request.meter, kwh: request.meter.kwh.slice(1) }
		});
		expect(short.success ? [] : short.error.issues.map((issue) => issue.message)).toEqual([
			'The meter data ends before the last billing period does (2027-03-31): 1 more 15-minute value is needed'
		]);
	});

	it('says where a series has a gap, starts too late or starts off its interval', () => {
		const base = {
			period: { start: '2027-06', months: 1 },
			timezone: 'UTC',
			holidays: null,
			tariff: flatTariff(0.1),
			equipment: []
		};
		const kwh: unknown[] = Array.from({ length: 30 * 24 }, () => 1);
		kwh[5] = null;
		const messages = (meter: unknown) => {
			const parsed = parseRequest(calculateRequestSchema, { ...base, meter });
			return parsed.success ? [] : parsed.error.issues.map((issue) => issue.message);
		};
		expect(messages({ start: '2027-06-01T00:00', intervalMinutes: 60, kwh })).toEqual([
			'Meter value number 6 is missing or not a number (a gap in the series)'
		]);
		expect(messages({ start: '2027-06-02T00:00', intervalMinutes: 60, kwh: kwh.map(() => 1) })).toEqual([
			'The meter data starts after the first billing period begins (2027-06-01)'
		]);
		expect(messages({ start: '2027-06-01T00:10', intervalMinutes: 15, kwh: [1] })).toEqual([
			"The meter's start must fall on a 15-minute boundary"
		]);
	});
});
