import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { tou, usdTariff } from '$lib/calc/tariffs.fixture';
import { describeTariff } from './tariff-summary';
import { describeTariffDiff } from './version-diff';

// The charges real tariffs use (issue 19) in words. Invented rates; the expected sentences are the
// wording the tariff page promises for each rule of the core (derived from the rule).

const tieredTou = (): TariffInput =>
	usdTariff({
		energyCharges: [
			tou('Energy', {
				months: [6, 7, 8, 9],
				tierLimitsKwh: [500],
				periods: [
					{
						label: 'On-peak',
						perKwh: 0.3,
						abovePerKwh: [0.4],
						days: 'weekdays',
						windows: [{ start: '16:00', end: '21:00' }]
					}
				],
				otherPerKwh: 0.1,
				otherAbovePerKwh: [0.15]
			}),
			{
				label: 'Delivery',
				type: 'tiered',
				tiersPer: 'day',
				tiers: [
					{ uptoKwh: 10, perKwh: 0.05 },
					{ uptoKwh: 20, perKwh: 0.07 },
					{ uptoKwh: null, perKwh: 0.09 }
				]
			}
		],
		fixedCharges: [{ label: 'Meter charge', perYear: 120 }],
		demandCharges: [
			{
				label: 'Demand',
				tiers: [
					{ uptoKw: 100, perKw: 10 },
					{ uptoKw: null, perKw: 15 }
				],
				ratchet: { percent: 80, monthsBack: 11 }
			},
			{ label: 'Summer demand', perKw: 4, ratchet: { percent: 50, months: [6, 7, 8, 9] } }
		],
		minimumPerDay: 0.5,
		minimumPerYear: 240
	});

const section = (tariff: TariffInput, heading: string) =>
	describeTariff(tariff).find((s) => s.heading === heading)?.lines ?? [];

describe('describeTariff, the charges real tariffs use', () => {
	it('gives each period of a tiered time-of-use season its price ladder, limits counted across periods', () => {
		expect(section(tieredTou(), 'Energy charges')[0]).toBe(
			"Energy, June–September: On-peak on weekdays 16:00–21:00, $0.30 per kWh up to 500 kWh of the billing period's use across all periods, then $0.40; at other times, $0.10 per kWh up to 500 kWh, then $0.15."
		);
	});

	it('says daily tier bounds are multiplied by the days of the billing period', () => {
		expect(section(tieredTou(), 'Energy charges')[1]).toBe(
			'Delivery: $0.05 per kWh for the first 10 kWh a day (× the days of the billing period), $0.07 per kWh from 10 to 20 kWh a day, then $0.09 per kWh.'
		);
	});

	it('writes a tiered time-of-use season with daily limits', () => {
		const tariff = tieredTou();
		const energy = tariff.energyCharges?.[0];
		if (energy?.type === 'tou') energy.tiersPer = 'day';
		expect(section(tariff, 'Energy charges')[0]).toContain(
			'$0.30 per kWh up to 500 kWh a day (× the days of the billing period) of the use across all periods, then $0.40'
		);
	});

	it('writes demand tiers and ratchets of months back or listed months', () => {
		expect(section(tieredTou(), 'Demand charges')).toEqual([
			'Demand: $10.00 per kW for the first 100 kW, then $15.00 per kW, of the highest 15-minute demand in the billing period; billed on at least 80% of the highest peak of the 11 billing periods before (within this calculation).',
			'Summer demand: $4.00 per kW of the highest 15-minute demand in the billing period; billed on at least 50% of the highest peak of June–September of the 11 billing periods before (within this calculation).'
		]);
	});

	it('writes a demand charge with other hours at weekends', () => {
		const offPeak = usdTariff({
			demandCharges: [
				{
					label: 'Off-peak demand',
					perKw: 3,
					windows: [
						{ start: '00:00', end: '15:00' },
						{ start: '20:00', end: '24:00' }
					],
					weekendWindows: [{ start: '00:00', end: '24:00' }]
				}
			]
		});
		expect(section(offPeak, 'Public holidays')).toEqual(['Holidays price like weekends.']);
		expect(section(offPeak, 'Demand charges')).toEqual([
			'Off-peak demand: $3.00 per kW of the highest 15-minute demand in the billing period (weekdays 00:00–15:00 and 20:00–24:00 and all day at weekends).'
		]);
		const later = structuredClone(offPeak);
		later.demandCharges![0]!.weekendWindows = [{ start: '17:00', end: '19:00' }];
		expect(describeTariffDiff(offPeak, later)).toContain(
			'Off-peak demand: now $3.00 per kW of the highest 15-minute demand in the billing period (weekdays 00:00–15:00 and 20:00–24:00 and at weekends 17:00–19:00)'
		);
	});

	it('writes a yearly fixed charge as a twelfth a billing period', () => {
		expect(section(tieredTou(), 'Fixed charges')).toEqual([
			'Meter charge: $120.00 a year (a twelfth each billing period).'
		]);
	});

	it('writes the daily and yearly minimums and how each applies', () => {
		expect(section(tieredTou(), 'Minimum bill')).toEqual([
			'Minimum bill: $0.50 a day of the billing period.',
			'Minimum bill: $240.00 a year.',
			'If the charges before tax come to less than the daily amount × the days of the billing period, the bill is raised to it before tax is added.',
			'The yearly minimum is checked on each run of 12 billing periods (a shorter last run on its share, n/12): if their bills before tax come to less, the last bill of the run is raised by the difference before tax is added.'
		]);
	});
});

type Change = (tariff: TariffInput) => void;
const diffAfter = (change: Change) => {
	const after = structuredClone(tieredTou());
	change(after);
	return describeTariffDiff(tieredTou(), after);
};
const season = (tariff: TariffInput) => {
	const energy = tariff.energyCharges?.[0];
	if (energy?.type !== 'tou' || !energy.seasons[0]) throw new Error('fixture changed');
	return energy.seasons[0];
};
const demand = (tariff: TariffInput, i = 0) => {
	const charge = tariff.demandCharges?.[i];
	if (!charge) throw new Error('fixture changed');
	return charge;
};

describe('describeTariffDiff, one new field at a time', () => {
	const cases: Array<{ name: string; change: Change; lines: string[] }> = [
		{
			name: 'a tier limit of a time-of-use season',
			change: (t) => (season(t).tierLimitsKwh = [600]),
			lines: ['Energy, June–September: tier limits 500 kWh → 600 kWh']
		},
		{
			name: 'a price above the limit of a period',
			change: (t) => (season(t).periods[0]!.abovePerKwh = [0.45]),
			lines: ['Energy, June–September, On-peak above 500 kWh: $0.40 → $0.45 per kWh']
		},
		{
			name: 'a price above the limit at other times',
			change: (t) => (season(t).otherAbovePerKwh = [0.16]),
			lines: ['Energy, June–September, other times above 500 kWh: $0.15 → $0.16 per kWh']
		},
		{
			name: 'a price below the limit of a period',
			change: (t) => (season(t).periods[0]!.perKwh = 0.31),
			lines: ['Energy, June–September, On-peak up to 500 kWh: $0.30 → $0.31 per kWh']
		},
		{
			name: 'a daily tier price',
			change: (t) => {
				const delivery = t.energyCharges?.[1];
				if (delivery?.type === 'tiered') delivery.tiers[1]!.perKwh = 0.075;
			},
			lines: ['Delivery, 10 to 20 kWh a day: $0.07 → $0.075 per kWh']
		},
		{
			name: 'a ratchet percent',
			change: (t) => (demand(t).ratchet!.percent = 75),
			lines: ['Demand: ratchet 80% → 75% of the highest peak of the 11 billing periods before']
		},
		{
			name: 'a ratchet that looks back fewer periods',
			change: (t) => (demand(t).ratchet!.monthsBack = 6),
			lines: ['Demand: ratchet now looks at the 6 billing periods before (was the 11 billing periods before)']
		},
		{
			name: 'a removed ratchet',
			change: (t) => delete demand(t, 1).ratchet,
			lines: ['Summer demand: ratchet removed']
		},
		{
			name: 'a demand tier price',
			change: (t) => (demand(t).tiers![1]!.perKw = 16),
			lines: ['Demand, above 100 kW: $15.00 → $16.00 per kW']
		},
		{
			name: 'a demand tier bound',
			change: (t) => (demand(t).tiers![0]!.uptoKw = 150),
			lines: ['Demand: demand tiers now $10.00 per kW for the first 150 kW, then $15.00 per kW']
		},
		{
			name: 'a single demand price that becomes tiers',
			change: (t) => {
				const charge = demand(t, 1);
				delete charge.perKw;
				charge.tiers = [
					{ uptoKw: 50, perKw: 4 },
					{ uptoKw: null, perKw: 5 }
				];
			},
			lines: ['Summer demand: now $4.00 per kW for the first 50 kW, then $5.00 per kW (was $4.00 per kW)']
		},
		{
			name: 'a yearly fixed charge',
			change: (t) => (t.fixedCharges = [{ label: 'Meter charge', perYear: 132 }]),
			lines: ['Meter charge: $120.00 → $132.00 a year']
		},
		{
			name: 'a yearly fixed charge that becomes daily',
			change: (t) => (t.fixedCharges = [{ label: 'Meter charge', perDay: 0.4 }]),
			lines: ['Meter charge: $120.00 a year (a twelfth each billing period) → $0.40 a day']
		},
		{
			name: 'daily and yearly minimums',
			change: (t) => {
				t.minimumPerDay = 0.6;
				t.minimumPerYear = null;
				t.minimumMonthly = 15;
			},
			lines: [
				'Added minimum bill $15.00 a month',
				'Daily minimum bill: $0.50 → $0.60 a day',
				'Yearly minimum bill removed'
			]
		},
		{
			name: 'tier bounds that become daily',
			change: (t) => {
				const energy = t.energyCharges?.[0];
				if (energy?.type === 'tou') energy.tiersPer = 'day';
			},
			lines: [
				'Energy: tier bounds now per day (were per billing period)',
				'Energy, June–September: On-peak on weekdays 16:00–21:00, $0.30 per kWh up to 500 kWh a day (× the days of the billing period) of the use across all periods, then $0.40; at other times, $0.10 per kWh up to 500 kWh a day, then $0.15.'
			]
		}
	];
	it.each(cases)('reads $name as one sentence', ({ change, lines }) => {
		expect(diffAfter(change)).toEqual(lines);
	});
});
