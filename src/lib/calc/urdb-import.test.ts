import { describe, expect, it } from 'vitest';
import { tariffSchema } from './tariff.schema';
import { tariffFromUrdb } from './urdb-import';
import { urdbRateSchema } from './urdb.schema';
import { grid, rate, sample } from './urdb.fixture';

/** Imports a rate, checks the tariff passes the schema, and gives it. */
function imported(fields: Record<string, unknown>) {
	const result = tariffFromUrdb(rate(fields));
	if (result.tariff) expect(tariffSchema.safeParse(result.tariff).success).toBe(true);
	return result;
}

describe('the sample rates of the open rate database', () => {
	it('RS-1: rate + adj per kWh, the cumulative bound, the legacy fixed monthly charge', () => {
		const result = tariffFromUrdb(sample('fpl-rs1-2015.json'));
		expect(tariffSchema.safeParse(result.tariff).success).toBe(true);
		expect(result.tariff).toMatchObject({
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
		expect(result.meta).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service'
		});
	});

	it('Georgia Power: a summer season with a weekday afternoon peak and the off-peak price elsewhere', () => {
		const result = tariffFromUrdb(sample('georgia-power-tou-reo-2013.json'));
		expect(tariffSchema.safeParse(result.tariff).success).toBe(true);
		const energy = result.tariff?.energyCharges?.[0];
		if (energy?.type !== 'tou') throw new Error('expected time-of-use');
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

describe('tiers inside time-of-use periods', () => {
	const peakHours = (_m: number, h: number) => (h >= 14 && h < 19 ? 1 : 0);
	const tiered = {
		energyratestructure: [
			[{ rate: 0.1, max: 500 }, { rate: 0.12 }],
			[{ rate: 0.3, max: 500 }, { rate: 0.35 }]
		],
		energyweekdayschedule: grid(peakHours),
		energyweekendschedule: grid(0)
	};

	it('become the season’s tier limits and each period’s prices above them', () => {
		const energy = imported(tiered).tariff?.energyCharges?.[0];
		expect(energy).toEqual({
			label: 'Energy',
			type: 'tou',
			seasons: [
				{
					months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
					otherPerKwh: 0.1,
					otherAbovePerKwh: [0.12],
					tierLimitsKwh: [500],
					periods: [
						{
							label: 'Period 2',
							perKwh: 0.3,
							abovePerKwh: [0.35],
							days: 'weekdays',
							windows: [{ start: '14:00', end: '19:00' }]
						}
					]
				}
			]
		});
	});

	it('let a single-tier period keep its price in every tier', () => {
		const energy = imported({
			...tiered,
			energyratestructure: [tiered.energyratestructure[0], [{ rate: 0.3 }]]
		}).tariff?.energyCharges?.[0];
		expect(energy?.type === 'tou' && energy.seasons[0]?.periods[0]?.abovePerKwh).toEqual([0.3]);
	});

	it('refuse limits that differ between the periods of a season, with a note', () => {
		const result = imported({
			...tiered,
			energyratestructure: [tiered.energyratestructure[0], [{ rate: 0.3, max: 300 }, { rate: 0.35 }]]
		});
		expect(result.tariff).toBeNull();
		expect(result.notes).toContainEqual(expect.objectContaining({ code: 'tier-limits-differ' }));
	});

	it('read "kWh daily" as tiers per day; refuse a mix of units and kWh/kW', () => {
		const daily = imported({
			energyratestructure: [
				[
					{ rate: 0.1, max: 20, unit: 'kWh daily' },
					{ rate: 0.2, unit: 'kWh daily' }
				]
			]
		});
		expect(daily.tariff?.energyCharges?.[0]).toMatchObject({ type: 'tiered', tiersPer: 'day' });
		const mixed = imported({
			energyratestructure: [
				[
					{ rate: 0.1, max: 20, unit: 'kWh daily' },
					{ rate: 0.2, unit: 'kWh' }
				]
			]
		});
		expect(mixed.tariff).toBeNull();
		expect(mixed.notes).toContainEqual(expect.objectContaining({ code: 'mixed-units' }));
		const perKw = imported({
			energyratestructure: [[{ rate: 0.1, max: 200, unit: 'kWh/kW' }, { rate: 0.05 }]]
		});
		expect(perKw.tariff).toBeNull();
		expect(perKw.notes).toContainEqual(
			expect.objectContaining({ code: 'tier-unit', field: 'energyratestructure' })
		);
	});
});

describe('demand charges', () => {
	it('whole-month demand: one charge per flat structure, months from flatdemandmonths, tiers in kW', () => {
		const result = imported({
			flatdemandstructure: [[{ rate: 5 }], [{ rate: 8, max: 50 }, { rate: 10 }]],
			flatdemandmonths: [0, 0, 0, 0, 0, 1, 1, 1, 1, 0, 0, 0],
			demandwindow: 60
		});
		expect(result.tariff?.demandCharges).toEqual([
			{ label: 'Demand 1', perKw: 5, intervalMinutes: 60, months: [1, 2, 3, 4, 5, 10, 11, 12] },
			{
				label: 'Demand 2',
				tiers: [
					{ uptoKw: 50, perKw: 8 },
					{ uptoKw: null, perKw: 10 }
				],
				intervalMinutes: 60,
				months: [6, 7, 8, 9]
			}
		]);
	});

	it('time-of-use demand: a charge per period with its days and windows, one across seasons with the same hours', () => {
		const result = imported({
			demandratestructure: [[{ rate: 0 }], [{ rate: 12 }], [{ rate: 4 }]],
			demandweekdayschedule: grid((m, h) => (h >= 14 && h < 19 ? (m >= 6 && m <= 9 ? 1 : 2) : 0)),
			demandweekendschedule: grid(0)
		});
		expect(result.tariff?.demandCharges).toEqual([
			{
				label: 'Demand, period 3',
				perKw: 4,
				intervalMinutes: 15,
				months: [1, 2, 3, 4, 5, 10, 11, 12],
				days: 'weekdays',
				windows: [{ start: '14:00', end: '19:00' }]
			},
			{
				label: 'Demand, period 2',
				perKw: 12,
				intervalMinutes: 15,
				months: [6, 7, 8, 9],
				days: 'weekdays',
				windows: [{ start: '14:00', end: '19:00' }]
			}
		]);
	});

	it('imports a priced demand period with different weekday and weekend hours as one charge', () => {
		const result = imported({
			demandratestructure: [[{ rate: 3 }], [{ rate: 12 }]],
			demandweekdayschedule: grid((_m, h) => (h >= 14 && h < 19 ? 1 : 0)),
			demandweekendschedule: grid(0)
		});
		expect(result.notes).toEqual([]);
		expect(result.tariff?.demandCharges).toEqual([
			{
				label: 'Demand, period 1',
				perKw: 3,
				intervalMinutes: 15,
				months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
				days: 'all',
				windows: [{ start: '19:00', end: '14:00' }],
				weekendWindows: [{ start: '00:00', end: '24:00' }]
			},
			{
				label: 'Demand, period 2',
				perKw: 12,
				intervalMinutes: 15,
				months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
				days: 'weekdays',
				windows: [{ start: '14:00', end: '19:00' }]
			}
		]);
	});

	it('ratchets: equal monthly percentages look back 11 months; lookback fields map the same way', () => {
		const flat = { flatdemandstructure: [[{ rate: 5 }]], flatdemandmonths: Array(12).fill(0) };
		const monthly = imported({ ...flat, demandratchetpercentage: Array(12).fill(0.8) });
		expect(monthly.tariff?.demandCharges?.[0]?.ratchet).toEqual({ percent: 80, monthsBack: 11 });
		const range = imported({ ...flat, lookbackPercent: 0.6, lookbackRange: 6 });
		expect(range.tariff?.demandCharges?.[0]?.ratchet).toEqual({ percent: 60, monthsBack: 6 });
		const months = imported({
			...flat,
			lookbackPercent: 0.5,
			lookbackMonths: [false, false, false, false, false, true, true, true, false, false, false, false]
		});
		expect(months.tariff?.demandCharges?.[0]?.ratchet).toEqual({ percent: 50, months: [6, 7, 8] });
		const differing = imported({
			...flat,
			demandratchetpercentage: [...Array(6).fill(0.8), ...Array(6).fill(0.6)]
		});
		expect(differing.tariff).toBeNull();
		expect(differing.notes).toContainEqual(
			expect.objectContaining({ code: 'ratchet-monthly', field: 'demandratchetpercentage' })
		);
	});

	it('a 30-minute window is priced on 15-minute peaks with a note; demand not in kW is refused', () => {
		const thirty = imported({ flatdemandstructure: [[{ rate: 5 }]], demandwindow: 30 });
		expect(thirty.tariff?.demandCharges?.[0]?.intervalMinutes).toBe(15);
		expect(thirty.notes).toContainEqual(
			expect.objectContaining({ code: 'demand-window', field: 'demandwindow' })
		);
		const kva = imported({ flatdemandstructure: [[{ rate: 5 }]], demandunits: 'kVA' });
		expect(kva.tariff).toBeNull();
		expect(kva.notes).toContainEqual(expect.objectContaining({ code: 'demand-unit', field: 'demandunits' }));
	});
});

describe('fixed charges, minimums and the fields Runrate does not price', () => {
	it('reads a fixed charge per year and minimums per day and per year', () => {
		expect(imported({ fixedchargefirstmeter: 120, fixedchargeunits: '$/year' }).tariff?.fixedCharges).toEqual(
			[{ label: 'Fixed charge', perYear: 120 }]
		);
		expect(imported({ mincharge: 0.5, minchargeunits: '$/day' }).tariff).toMatchObject({
			minimumPerDay: 0.5
		});
		expect(imported({ mincharge: 300, minchargeunits: '$/year' }).tariff).toMatchObject({
			minimumPerYear: 300
		});
		expect(imported({ annualmincharge: 250 }).tariff).toMatchObject({ minimumPerYear: 250 });
	});

	it('names coincident demand, reactive power, export rules and free text in the notes, by field', () => {
		const result = imported({
			coincidentratestructure: [[{ rate: 3 }]],
			demandreactivepowercharge: 0.5,
			dgrules: 'Net Metering',
			energyattrs: [{ 'Fuel adjustment': 'varies' }],
			energycomments: 'See tariff sheet'
		});
		expect(result.tariff).not.toBeNull();
		expect(result.notes.map((n) => n.field).sort()).toEqual(
			[
				'coincidentratestructure',
				'demandreactivepowercharge',
				'dgrules',
				'energyattrs',
				'energycomments'
			].sort()
		);
	});

	it('refuses a schedule pointing past its rate structure, at the hour', () => {
		const result = urdbRateSchema.safeParse({
			energyratestructure: [[{ rate: 0.1 }]],
			energyweekdayschedule: grid(0),
			energyweekendschedule: Array(12).fill([...Array(23).fill(0), 3])
		});
		expect(result.success).toBe(false);
		expect(result.error?.issues[0]).toMatchObject({
			path: ['energyweekendschedule', 0, 23],
			message: 'Period 3 is not in the energy rate structure (it has 1)'
		});
	});
});
