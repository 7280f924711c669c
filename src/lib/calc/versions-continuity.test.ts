import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deviceArb, tariffArb } from './arbitraries.fixture';
import { calculate } from './calculate';
import { dayNumber, isoDate } from './dates';
import { calculateRequestSchema, type CalculateRequestInput } from './request.schema';
import { device, flatTariff, line } from './requests.fixture';
import { type Tariff, type TariffInput, tariffSchema } from './tariff.schema';
import { type DatedTariff, calculateAcrossVersions } from './versions';
import { dayShapes } from './zone-days';

// A year that crosses a rate change is one calculation: ratchets and the yearly minimum see all of it.
// Every utility, rate and meter series here is invented.

const dated = (id: string, effectiveFrom: string, tariff: Tariff): DatedTariff => ({
	id,
	number: Number(id.slice(1)),
	effectiveFrom,
	effectiveTo: null,
	tariff
});

const parse = (input: CalculateRequestInput) => calculateRequestSchema.parse(input);

/** A 15-minute series over 2027 in the zone: each month's kW (its own level) during a daily window. */
function meterYear(timezone: string, levels: readonly number[], fromQuarter: number, quarters: number) {
	const first = dayNumber('2027-01-01');
	const kwh: number[] = [];
	dayShapes(timezone, first, dayNumber('2027-12-31')).forEach((shape, i) => {
		const kw = levels[Number(isoDate(first + i).slice(5, 7)) - 1] ?? 0;
		for (const minute of shape.minutes) {
			const quarter = minute / 15;
			kwh.push(quarter >= fromQuarter && quarter < fromQuarter + quarters ? kw / 4 : 0);
		}
	});
	return { start: '2027-01-01T00:00', intervalMinutes: 15 as const, kwh };
}

describe('a ratchet across a version change', () => {
	// 10 kW at noon each day of January, 2 kW each other month; a $10 per kW charge. The version of
	// July adds an 80 % ratchet over the 11 months before.
	const levels = [10, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2];
	const demand = { label: 'Demand', perKw: 10 };
	const versions = [
		dated('v1', '2027-01-01', tariffSchema.parse(flatTariff(0, { demandCharges: [demand] }))),
		dated(
			'v2',
			'2027-07-01',
			tariffSchema.parse(
				flatTariff(0, { demandCharges: [{ ...demand, ratchet: { percent: 80, monthsBack: 11 } }] })
			)
		)
	];
	const request = parse({
		period: { start: '2027-01', months: 12 },
		timezone: 'UTC',
		holidays: null,
		tariff: versions[0]!.tariff,
		equipment: [],
		meter: meterYear('UTC', levels, 48, 4)
	});

	it("bills the new version's ratchet on the old version's January peak", () => {
		const result = calculateAcrossVersions(request, versions);
		// June, on the first version: its own 2 kW × $10. July: 80 % of January's 10 kW = 8 kW × $10 (derived).
		expect(line(result.periods[5]!, 'demand', 'Demand')).toBe(20);
		expect(line(result.periods[6]!, 'demand', 'Demand')).toBe(80);
		// December still looks back to January (11 months back): 8 kW again.
		expect(line(result.periods[11]!, 'demand', 'Demand')).toBe(80);
	});
});

describe('the yearly minimum across a version change', () => {
	// $5 a month of service and nothing else billed; a yearly minimum of $120, then $240 from July.
	const tariff = (minimumPerYear: number) =>
		tariffSchema.parse(flatTariff(0, { fixedCharges: [{ label: 'Service', perMonth: 5 }], minimumPerYear }));
	const request = parse({
		period: { start: '2027-01', months: 12 },
		timezone: 'UTC',
		holidays: null,
		tariff: tariff(120),
		equipment: [device({ power: { watts: 1 } })]
	});

	it('counts each version for its own months of one year, topped up on its last period', () => {
		const versions = [dated('v1', '2027-01-01', tariff(120)), dated('v2', '2027-07-01', tariff(240))];
		const result = calculateAcrossVersions(request, versions);
		// Floor 6 × 120/12 + 6 × 240/12 = 180; billed 12 × 5 = 60; December gets 120 (derived).
		expect(result.periods.slice(0, 11).every((p) => p.charges.every((c) => c.kind !== 'minimum'))).toBe(true);
		expect(line(result.periods[11]!, 'minimum', 'Yearly minimum')).toBe(120);
		expect(result.totals.cost).toBe(180);
	});

	it('leaves the months of a version without one out of the year', () => {
		const none = tariffSchema.parse(flatTariff(0, { fixedCharges: [{ label: 'Service', perMonth: 5 }] }));
		const versions = [dated('v1', '2027-01-01', tariff(120)), dated('v2', '2027-07-01', none)];
		const result = calculateAcrossVersions(request, versions);
		// Floor 6 × 10 = 60, billed January–June 30: June, the first version's last month, gets 30 (derived).
		expect(line(result.periods[5]!, 'minimum', 'Yearly minimum')).toBe(30);
		expect(result.periods[11]!.charges.some((c) => c.kind === 'minimum')).toBe(false);
	});
});

describe('two versions holding the same tariff', () => {
	/** tariffArb's charges with a ratchet (months back or listed months) and a yearly minimum. */
	const ratchetedArb = fc
		.record({
			tariff: tariffArb,
			percent: fc.integer({ min: 0, max: 200 }),
			back: fc.oneof(
				fc.record({ monthsBack: fc.integer({ min: 1, max: 24 }) }),
				fc.record({
					months: fc.uniqueArray(fc.integer({ min: 1, max: 12 }), { minLength: 1, maxLength: 12 })
				})
			),
			minimumPerYear: fc.integer({ min: 0, max: 40_000 })
		})
		.map(({ tariff, percent, back, minimumPerYear }): TariffInput => ({
			...tariff,
			demandCharges: (tariff.demandCharges ?? []).map((c) => ({ ...c, ratchet: { percent, ...back } })),
			minimumPerYear
		}));

	it('price a year as one version does, for any month of the change (issue 19 property)', () => {
		fc.assert(
			fc.property(
				ratchetedArb,
				fc.integer({ min: 2, max: 12 }),
				fc.constantFrom('UTC', 'America/Chicago', 'Europe/Berlin'),
				fc.array(
					fc.integer({ min: 0, max: 3000 }).map((w) => w / 100),
					{ minLength: 12, maxLength: 12 }
				),
				fc.tuple(fc.integer({ min: 0, max: 95 }), fc.integer({ min: 1, max: 96 })),
				fc.array(deviceArb, { maxLength: 2 }),
				(tariffInput, changeMonth, timezone, levels, [fromQuarter, quarters], equipment) => {
					const tariff = tariffSchema.parse(tariffInput);
					const request = parse({
						period: { start: '2027-01', months: 12 },
						timezone,
						holidays: { country: 'US' },
						tariff: tariffInput,
						equipment,
						meter: meterYear(timezone, levels, fromQuarter, quarters)
					});
					const change = `2027-${String(changeMonth).padStart(2, '0')}-01`;
					const across = calculateAcrossVersions(request, [
						dated('v1', '2027-01-01', tariff),
						dated('v2', change, tariff)
					]);
					expect(across.versions.filter((v) => v.versionId === 'v1')).toHaveLength(changeMonth - 1);
					const one = calculate(request);
					expect(across.periods).toEqual(one.periods);
					expect(across.totals).toEqual(one.totals);
				}
			),
			{ numRuns: 20 }
		);
	});
});
