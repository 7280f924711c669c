import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { tariffSchema, type DatedTariff, type Meter, type TariffInput } from '$lib/calc';
import { tou, touPeriod, usdTariff } from '$lib/calc/tariffs.fixture';
import { rankTariffs, type Candidate, type YearContext } from './cheapest-rank';
import { cheapestWords } from './cheapest-words';

// Invented tariffs of a fictional utility ("Demo Valley Power"); every expected figure is derived from the rule.
const ZONE = 'America/Chicago';

const dated = (
	input: TariffInput,
	effectiveFrom = '2020-01-01',
	effectiveTo: string | null = null
): DatedTariff => ({
	id: crypto.randomUUID(),
	number: 1,
	effectiveFrom,
	effectiveTo,
	tariff: tariffSchema.parse(input)
});

const candidate = (name: string, input: TariffInput, more: Partial<Candidate> = {}): Candidate => ({
	id: name,
	name,
	utility: 'Demo Valley Power',
	currency: input.currency ?? 'USD',
	holidays: null,
	versions: [dated(input)],
	...more
});

/** 12 cents a kWh at every hour, $10 a month. */
const FLAT = usdTariff({
	fixedCharges: [{ label: 'Service', perMonth: 10 }],
	energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.12 }]
});
/** 30 cents on weekday afternoons (14:00–20:00), 8 cents at all other hours, $15 a month. */
const TOU = usdTariff({
	fixedCharges: [{ label: 'Service', perMonth: 15 }],
	energyCharges: [
		tou('Energy', {
			months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
			otherPerKwh: 0.08,
			periods: [touPeriod('on-peak', 0.3, 'weekdays', '14:00', '20:00')]
		})
	]
});

/** A year from 2027-01 of readings `minutes` long: `nightKwh` an hour from 22:00 to 06:00, `dayKwh` otherwise. */
function nightHeavyYear(minutes: 15 | 60, nightKwh = 4, dayKwh = 0.5): Meter {
	const kwh: number[] = [];
	const end = DateTime.fromISO('2028-01-01', { zone: ZONE }).toMillis();
	for (let t = DateTime.fromISO('2027-01-01', { zone: ZONE }).toMillis(); t < end; t += minutes * 60_000) {
		const hour = DateTime.fromMillis(t, { zone: ZONE }).hour;
		kwh.push(((hour >= 22 || hour < 6 ? nightKwh : dayKwh) * minutes) / 60);
	}
	return { start: '2027-01-01T00:00', intervalMinutes: minutes, kwh };
}

const year = (meter: Meter, currentTariffId: string | null = 'Flat'): YearContext => ({
	meter,
	firstMonth: '2027-01',
	timezone: ZONE,
	siteHolidays: { country: 'US' },
	currency: 'USD',
	currentTariffId
});

describe('a night-heavy load', () => {
	const ranking = rankTariffs(
		[candidate('Flat', FLAT), candidate('Time of use', TOU)],
		year(nightHeavyYear(60))
	);

	it('ranks the time-of-use tariff first and prices the difference to the current one', () => {
		expect(ranking.ranked.map((r) => r.name)).toEqual(['Time of use', 'Flat']);
		const [top, flat] = ranking.ranked;
		// Derived from the rule: the flat tariff is 0.12 × the year's kWh + 12 × $10.
		const kwh = nightHeavyYear(60).kwh.reduce((a, b) => a + b, 0);
		expect(flat!.annualCost).toBeCloseTo(0.12 * kwh + 120, 0);
		expect(flat!.fixedCost).toBe(120);
		expect(top!.fixedCost).toBe(180);
		expect(top!.differenceToCurrent).toBeCloseTo(top!.annualCost - flat!.annualCost, 2);
		expect(top!.differenceToCurrent!).toBeLessThan(0);
	});

	it('measures the share of kWh in each period of the top tariff', () => {
		// Derived from the rule: on-peak hours are 6 weekday hours at 0.5 kWh; 261 weekdays in 2027 (US holidays
		// count as weekends by default: 11 federal holidays on weekdays in 2027, so 250 priced as weekdays).
		const kwh = nightHeavyYear(60).kwh.reduce((a, b) => a + b, 0);
		const onPeak = ranking.topShares.find((s) => s.label === 'on-peak');
		expect(onPeak!.share).toBeGreaterThan((250 * 6 * 0.5) / kwh - 0.002);
		expect(onPeak!.share).toBeLessThan((261 * 6 * 0.5) / kwh + 0.002);
		const other = ranking.topShares.find((s) => s.label === 'other hours');
		expect(other!.share + onPeak!.share).toBeCloseTo(1, 3);
		expect(other!.minPerKwh).toBe(0.08);
	});

	it('says why in words built from the figures', () => {
		const [top, flat] = ranking.ranked;
		const words = cheapestWords(top!, flat!, ranking.topShares, 'USD');
		expect(words[0]).toMatch(
			/^Time of use would have cost \$[\d,.]+ for the year, \$[\d,.]+ less than your current tariff, Flat\.$/
		);
		expect(words.join(' ')).toMatch(
			/9\d % of your use falls in the hours no period names, which this tariff prices at \$0\.08\d* per kWh/
		);
		expect(words.join(' ')).toContain(
			'Its fixed charges come to $180.00 a year against $120.00 on your current tariff.'
		);
	});
});

describe('a scenario’s estimated load instead of a meter', () => {
	it('ranks the time-of-use tariff first for a 1 kW pump that runs only at night (derived from the rule)', () => {
		const pump = {
			name: 'Night pump',
			power: { watts: 1000 },
			schedule: { type: 'windows' as const, windows: [{ start: '22:00', end: '06:00' }] }
		};
		const ranking = rankTariffs([candidate('Flat', FLAT), candidate('Time of use', TOU)], {
			...year(nightHeavyYear(60)),
			meter: undefined,
			equipment: [pump]
		});
		expect(ranking.ranked.map((r) => r.name)).toEqual(['Time of use', 'Flat']);
		// 8 kWh a night, 365 nights: 2,920 kWh; all of it off-peak at 0.08 plus $15 × 12 (derived from the rule).
		expect(ranking.ranked[0]!.annualCost).toBeCloseTo(2920 * 0.08 + 180, 0);
		expect(ranking.topShares).toEqual([expect.objectContaining({ label: 'other hours', share: 1 })]);
	});
});

describe('tariffs that are not priced', () => {
	it('lists another currency and a tariff not in force all year instead of pricing them', () => {
		const euro = candidate('Euro', { ...FLAT, currency: 'EUR' });
		const late = candidate('Late', FLAT, { versions: [dated(FLAT, '2027-06-01')] });
		const ranking = rankTariffs([candidate('Flat', FLAT), euro, late], year(nightHeavyYear(60)));
		expect(ranking.ranked.map((r) => r.name)).toEqual(['Flat']);
		expect(ranking.unpriced).toEqual([
			expect.objectContaining({ name: 'Euro', reason: 'Priced in EUR; this site pays in USD.' }),
			expect.objectContaining({
				name: 'Late',
				reason: expect.stringContaining('Not in force for the whole year')
			})
		]);
	});
});

describe('the usage priced and the versions used', () => {
	it('gives each month’s kWh and peak kW, the versions priced and each month’s bill', () => {
		const meter = nightHeavyYear(60);
		const ranking = rankTariffs([candidate('Flat', FLAT)], year(meter));
		expect(ranking.usage.map((m) => m.month)).toEqual(
			Array.from({ length: 12 }, (_, i) => `2027-${String(i + 1).padStart(2, '0')}`)
		);
		// Derived from the readings: the months' kWh add up to the year's, and 4 kWh in an hour is 4 kW.
		const kwh = meter.kwh.reduce((a, b) => a + b, 0);
		expect(ranking.usage.reduce((sum, m) => sum + m.kwh, 0)).toBeCloseTo(kwh, 6);
		expect(ranking.usage.every((m) => m.peakKw === 4)).toBe(true);
		const [flat] = ranking.ranked;
		expect(flat!.versionNumbers).toEqual([1]);
		expect(flat!.monthlyCosts).toHaveLength(12);
		expect(flat!.monthlyCosts.reduce((a, b) => a + b, 0)).toBeCloseTo(flat!.annualCost, 2);
	});

	it('still gives the usage when no tariff could price the year', () => {
		const late = candidate('Late', FLAT, { versions: [dated(FLAT, '2027-06-01')] });
		const ranking = rankTariffs([late], year(nightHeavyYear(60)));
		expect(ranking.ranked).toEqual([]);
		expect(ranking.usage).toHaveLength(12);
		expect(ranking.usage[0]!.kwh).toBeCloseTo(
			nightHeavyYear(60)
				.kwh.slice(0, 31 * 24)
				.reduce((a, b) => a + b, 0),
			6
		);
	});
});

describe('bench: 30 tariffs on a year of 15-minute readings', () => {
	it('prints how long the ranking takes (a figure for the lead, no limit asserted)', () => {
		const meter = nightHeavyYear(15);
		const candidates = Array.from({ length: 30 }, (_, i) => candidate(`T${i}`, i % 2 ? TOU : FLAT));
		const started = performance.now();
		const ranking = rankTariffs(candidates, year(meter, 'T0'));
		const ms = performance.now() - started;
		console.log(`cheapest bench: 30 tariffs × ${meter.kwh.length} values in ${ms.toFixed(0)} ms`);
		expect(ranking.ranked).toHaveLength(30);
	});
});
