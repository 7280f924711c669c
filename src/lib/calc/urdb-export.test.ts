import { describe, expect, it } from 'vitest';
import { type TariffInput, tariffSchema } from './tariff.schema';
import { urdbFromTariff } from './urdb-export';
import { tariffFromUrdb } from './urdb-import';
import { urdbRateSchema } from './urdb.schema';
import { grid, rate, sample } from './urdb.fixture';

/** Import → export → import: the tariff comes back the same (after the tariff schema's defaults). */
function roundTrip(first: TariffInput | null) {
	expect(first).not.toBeNull();
	const tariff = tariffSchema.parse(first);
	const { rate: written } = urdbFromTariff(tariff, { label: 'example' });
	const again = tariffFromUrdb(urdbRateSchema.parse(written));
	expect(again.notes).toEqual([]);
	expect(tariffSchema.parse(again.tariff)).toEqual(tariff);
}

const peak = (_m: number, h: number) => (h >= 14 && h < 19 ? 1 : 0);
const summerPeak = (m: number, h: number) =>
	m >= 6 && m <= 9 && h >= 12 && h < 20 ? 2 : h >= 7 && h < 22 ? 1 : 0;

/** Invented rates of each kind the import supports, as URDB fields. */
const KINDS: Record<string, Record<string, unknown>> = {
	flat: {},
	tiered: { energyratestructure: [[{ rate: 0.1, max: 600 }, { rate: 0.14, max: 1000 }, { rate: 0.2 }]] },
	'daily tiers': {
		energyratestructure: [
			[
				{ rate: 0.1, max: 20, unit: 'kWh daily' },
				{ rate: 0.2, unit: 'kWh daily' }
			]
		]
	},
	'time-of-use': {
		energyratestructure: [[{ rate: 0.08 }], [{ rate: 0.15 }], [{ rate: 0.32 }]],
		energyweekdayschedule: grid(summerPeak),
		energyweekendschedule: grid((m, h) => (h >= 17 && h < 21 ? 1 : 0))
	},
	'tiered time-of-use': {
		energyratestructure: [
			[{ rate: 0.1, max: 500 }, { rate: 0.12 }],
			[{ rate: 0.3, max: 500 }, { rate: 0.35 }]
		],
		energyweekdayschedule: grid(peak),
		energyweekendschedule: grid(0)
	},
	'seasonal flat demand with tiers': {
		flatdemandstructure: [[{ rate: 0 }], [{ rate: 8, max: 50 }, { rate: 10 }], [{ rate: 6 }]],
		flatdemandmonths: [2, 2, 2, 2, 2, 1, 1, 1, 1, 2, 2, 0],
		demandwindow: 60
	},
	'flat demand with tiers and a ratchet': {
		flatdemandstructure: [[{ rate: 8, max: 50 }, { rate: 10 }]],
		flatdemandmonths: Array(12).fill(0),
		demandratchetpercentage: Array(12).fill(0.75)
	},
	'lookback months': {
		flatdemandstructure: [[{ rate: 5 }]],
		lookbackPercent: 0.5,
		lookbackMonths: [false, false, false, false, false, true, true, true, true, false, false, false]
	},
	'time-of-use demand': {
		demandratestructure: [[{ rate: 0 }], [{ rate: 12 }], [{ rate: 4, max: 100 }, { rate: 5 }]],
		demandweekdayschedule: grid((m, h) => (h >= 14 && h < 19 ? (m >= 6 && m <= 9 ? 1 : 2) : 0)),
		demandweekendschedule: grid(0)
	},
	'time-of-use demand with other hours at weekends': {
		demandratestructure: [[{ rate: 3 }], [{ rate: 12 }]],
		demandweekdayschedule: grid((_m, h) => (h >= 15 && h < 20 ? 1 : 0)),
		demandweekendschedule: grid((m, h) => (m >= 6 && m <= 9 && h >= 17 && h < 19 ? 1 : 0)),
		demandwindow: 60
	},
	'fixed per month': { fixedchargefirstmeter: 9.5, fixedchargeunits: '$/month' },
	'fixed per day': { fixedchargefirstmeter: 0.4, fixedchargeunits: '$/day' },
	'fixed per year': { fixedchargefirstmeter: 120, fixedchargeunits: '$/year' },
	minimums: { mincharge: 0.5, minchargeunits: '$/day', annualmincharge: 300 },
	'minimum per month': { minmonthlycharge: 15 }
};

describe('import → export → import gives the same tariff', () => {
	it.each(['fpl-rs1-2015.json', 'georgia-power-tou-reo-2013.json', 'reopt-tiered-tou-demand.json'])(
		'sample %s',
		(name) => {
			roundTrip(tariffFromUrdb(sample(name)).tariff);
		}
	);
	it.each(Object.keys(KINDS))('%s', (kind) => {
		roundTrip(tariffFromUrdb(rate(KINDS[kind]!)).tariff);
	});
});

describe('what the database shape cannot hold', () => {
	it('is listed as not written: riders, taxes, holidays as weekends, quarter-hour windows', () => {
		const tariff = tariffSchema.parse({
			currency: 'USD',
			holidaysAsWeekends: true,
			energyCharges: [
				{
					label: 'Energy',
					type: 'tou',
					seasons: [
						{
							months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
							otherPerKwh: 0.1,
							periods: [{ label: 'Peak', perKwh: 0.3, windows: [{ start: '16:30', end: '19:00' }] }]
						}
					]
				}
			],
			riders: [{ label: 'Fuel', perKwh: 0.01 }],
			taxes: [{ label: 'Sales tax', percent: 5 }]
		});
		const { rate: written, notes } = urdbFromTariff(tariff);
		expect(notes.map((n) => n.field).sort()).toEqual([
			'energyCharges',
			'holidaysAsWeekends',
			'riders',
			'taxes'
		]);
		// 16:30–19:00: hour 16 is written off-peak (by its first quarter), hours 17 and 18 peak.
		const row = (written.energyweekdayschedule as number[][])[0]!;
		const peakIndex = row[17];
		expect(row.slice(15, 20).map((v) => (v === peakIndex ? 'peak' : 'off'))).toEqual([
			'off',
			'off',
			'peak',
			'peak',
			'off'
		]);
	});
});
