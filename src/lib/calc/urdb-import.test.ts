import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculate } from './calculate';
import { calculateRequestSchema } from './request.schema';
import { tariffFromUrdb } from './urdb-import';
import { urdbRateSchema } from './urdb.schema';

/** A sample rate of the open rate database (a public record; see tests/fixtures/urdb/README.md). */
function sample(name: string) {
	const json = JSON.parse(
		readFileSync(new URL(`../../../tests/fixtures/urdb/${name}`, import.meta.url), 'utf8')
	);
	return urdbRateSchema.parse(json.items?.[0] ?? json);
}

/** The year's energy lines of a steady load on a tariff, in UTC with no holidays, as NREL's engines price. */
function energyOfYear(tariff: unknown, kw: number, year: number) {
	const request = calculateRequestSchema.parse({
		period: { start: `${year}-01`, months: 12 },
		timezone: 'UTC',
		holidays: null,
		tariff,
		equipment: [{ name: 'Steady load', power: { watts: kw * 1000 }, schedule: { type: 'always' } }]
	});
	return calculate(request)
		.periods.flatMap((p) => p.charges)
		.filter((c) => c.kind === 'energy')
		.reduce((sum, c) => sum + c.amount, 0);
}

describe('a tiered rate from the open rate database', () => {
	const imported = tariffFromUrdb(sample('fpl-rs1-2015.json'));

	it('reads rate + adj per kWh, the cumulative bound, and the legacy fixed monthly charge', () => {
		expect(imported.tariff).toMatchObject({
			fixedCharges: [{ label: 'Fixed charge', perMonth: 7.57 }],
			energyCharges: [
				{
					type: 'tiered',
					tiers: [
						{ uptoKwh: 1000, perKwh: 0.07531 + 0.0119 },
						{ uptoKwh: null, perKwh: 0.09613 + 0.0119 }
					]
				}
			]
		});
		expect(imported.meta).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service'
		});
	});

	it("prices a steady 2.739726 kW through 2017 at 2,342.88 of energy, as NREL's REopt test asserts", () => {
		// Source: NREL REopt test suite (RS-1 on a steady load, fixed charge excluded), as quoted in
		// tests/fixtures/urdb/README.md: 12 × 1,000 × (0.07531 + 0.0119) + 12,000 × (0.09613 + 0.0119).
		expect(energyOfYear(imported.tariff, 2.739726, 2017)).toBeCloseTo(2342.88, 1);
	});
});

describe('a time-of-use rate from the open rate database', () => {
	const imported = tariffFromUrdb(sample('georgia-power-tou-reo-2013.json'));

	it('becomes a summer season with a weekday afternoon peak and the off-peak price elsewhere', () => {
		const energy = imported.tariff?.energyCharges?.[0];
		expect(energy?.type).toBe('tou');
		if (energy?.type !== 'tou') return;
		const summer = energy.seasons.find((s) => s.months?.includes(7));
		expect(summer?.otherPerKwh).toBeCloseTo(0.045947 + 0.032187, 9);
		expect(summer?.periods).toEqual([
			{
				label: 'Period 2',
				perKwh: 0.203217 + 0.044922,
				days: 'weekdays',
				windows: [{ start: '14:00', end: '19:00' }]
			}
		]);
	});
});

describe('what cannot be expressed yet', () => {
	it('is refused with notes by field, never priced wrongly', () => {
		const rate = urdbRateSchema.parse({
			energyratestructure: [[{ rate: 0.1, max: 500 }, { rate: 0.12 }], [{ rate: 0.3 }]],
			energyweekdayschedule: Array(12).fill(Array(24).fill(0)),
			energyweekendschedule: Array(12).fill(Array(24).fill(1))
		});
		const imported = tariffFromUrdb(rate);
		expect(imported.tariff).toBeNull();
		expect(imported.notes).toEqual([
			expect.objectContaining({ code: 'tiers-in-tou', field: 'energyratestructure' })
		]);
	});

	it('refuses a schedule pointing past its rate structure, at the hour', () => {
		const result = urdbRateSchema.safeParse({
			energyratestructure: [[{ rate: 0.1 }]],
			energyweekdayschedule: Array(12).fill(Array(24).fill(0)),
			energyweekendschedule: Array(12).fill([...Array(23).fill(0), 3])
		});
		expect(result.success).toBe(false);
		expect(result.error?.issues[0]).toMatchObject({
			path: ['energyweekendschedule', 0, 23],
			message: 'Period 3 is not in the energy rate structure (it has 1)'
		});
	});
});
