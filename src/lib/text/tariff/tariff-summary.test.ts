import { describe, expect, it } from 'vitest';
import { type TariffInput, tariffSchema } from '$lib/calc';
import { tiered, touPeriod, twoTierDelivery, usdTariff } from '$lib/calc/tariffs.fixture';
import { describeTariff } from './tariff-summary';

// Invented tariffs for these tests only (no real utility or rate). The expected sentences are the
// wording Runrate's tariff page promises (the tariff-page brief; common practice, no source).

const supplySummer = {
	months: [6, 7, 8, 9],
	periods: [touPeriod('On-peak', 0.32, 'weekdays', '16:00', '21:00')],
	otherPerKwh: 0.12
};
const supplyRest = { months: [10, 11, 12, 1, 2, 3, 4, 5], periods: [], otherPerKwh: 0.1 };

const linesOf = (tariff: TariffInput) => describeTariff(tariff).flatMap((section) => section.lines);

describe('describeTariff, one charge at a time', () => {
	const cases: Array<{ name: string; tariff: TariffInput; line: string }> = [
		{
			name: 'a customer charge per month',
			tariff: { currency: 'USD', fixedCharges: [{ label: 'Customer charge', perMonth: 12.5 }] },
			line: 'Customer charge: $12.50 a month.'
		},
		{
			name: 'a basic charge per day',
			tariff: { currency: 'USD', fixedCharges: [{ label: 'Basic charge', perDay: 0.45 }] },
			line: 'Basic charge: $0.45 a day.'
		},
		{
			name: 'a flat energy rate with three decimals',
			tariff: { currency: 'USD', energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.185 }] },
			line: 'Energy: $0.185 per kWh.'
		},
		{
			name: 'a flat rate limited to summer months',
			tariff: {
				currency: 'USD',
				energyCharges: [{ label: 'Cooling surcharge', type: 'flat', perKwh: 0.01, months: [6, 7, 8] }]
			},
			line: 'Cooling surcharge, June–August: $0.01 per kWh.'
		},
		{
			name: 'two inclining tiers',
			tariff: twoTierDelivery(),
			line: 'Delivery: $0.05 per kWh for the first 500 kWh of each billing period, then $0.08 per kWh.'
		},
		{
			name: 'three tiers with a middle band',
			tariff: usdTariff({ energyCharges: [tiered('Delivery', [500, 0.05], [1500, 0.065], [null, 0.08])] }),
			line:
				'Delivery: $0.05 per kWh for the first 500 kWh of each billing period, ' +
				'$0.065 per kWh from 500 to 1,500 kWh, then $0.08 per kWh.'
		},
		{
			name: 'a demand charge limited to summer weekday afternoons',
			tariff: {
				currency: 'USD',
				demandCharges: [
					{
						label: 'Demand',
						perKw: 8,
						months: [6, 7, 8, 9],
						days: 'weekdays',
						windows: [{ start: '12:00', end: '20:00' }]
					}
				]
			},
			line:
				'Demand: $8.00 per kW of the highest 15-minute demand in the billing period ' +
				'(weekdays 12:00–20:00, June–September).'
		},
		{
			name: 'an hourly demand charge with no limits',
			tariff: {
				currency: 'USD',
				demandCharges: [{ label: 'Facility demand', perKw: 5.25, intervalMinutes: 60 }]
			},
			line: 'Facility demand: $5.25 per kW of the highest 60-minute demand in the billing period.'
		},
		{
			name: 'a rider',
			tariff: { currency: 'USD', riders: [{ label: 'Fuel adjustment', perKwh: 0.031 }] },
			line: 'Fuel adjustment: $0.031 per kWh on all kWh.'
		},
		{
			name: 'a negative rider (a credit)',
			tariff: { currency: 'USD', riders: [{ label: 'Hydro credit', perKwh: -0.004 }] },
			line: 'Hydro credit: a credit of $0.004 per kWh on all kWh.'
		},
		{
			name: 'a sales tax',
			tariff: { currency: 'USD', taxes: [{ label: 'Sales tax', percent: 4 }] },
			line: 'Sales tax: 4% of the bill before tax.'
		},
		{
			name: 'a minimum bill',
			tariff: { currency: 'USD', minimumMonthly: 15 },
			line: 'Minimum bill: $15.00 a month.'
		}
	];

	it.each(cases)('describes $name', ({ tariff, line }) => {
		expect(linesOf(tariff)).toContain(line);
	});
});

describe('describeTariff, time-of-use charges', () => {
	it('gives one sentence per season with the period, its days and hours, and the other rate', () => {
		const tariff: TariffInput = {
			currency: 'USD',
			energyCharges: [{ label: 'Supply', type: 'tou', seasons: [supplySummer, supplyRest] }]
		};
		expect(linesOf(tariff)).toEqual([
			'Supply, June–September: On-peak $0.32 per kWh on weekdays 16:00–21:00; $0.12 per kWh at other times.',
			'Supply, October–May: $0.10 per kWh at all times.',
			'Holidays price like weekends.'
		]);
	});

	it('leaves out the months of a single season that covers the whole year', () => {
		const tariff: TariffInput = {
			currency: 'USD',
			holidaysAsWeekends: false,
			energyCharges: [
				{
					label: 'Night saver',
					type: 'tou',
					seasons: [
						{
							months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
							periods: [{ label: 'Night', perKwh: 0.07, windows: [{ start: '22:00', end: '06:00' }] }],
							otherPerKwh: 0.15
						}
					]
				}
			]
		};
		// Every-day periods do not split weekdays from weekends, so no holiday sentence follows.
		expect(linesOf(tariff)).toEqual([
			'Night saver: Night $0.07 per kWh every day 22:00–06:00; $0.15 per kWh at other times.'
		]);
	});

	it('says holidays price like ordinary days when the tariff says so', () => {
		const tariff: TariffInput = {
			currency: 'USD',
			holidaysAsWeekends: false,
			energyCharges: [{ label: 'Supply', type: 'tou', seasons: [supplySummer, supplyRest] }]
		};
		expect(describeTariff(tariff).at(-1)).toEqual({
			heading: 'Public holidays',
			lines: ['Holidays price like the weekday they fall on.']
		});
	});
});

describe('describeTariff, a whole tariff', () => {
	const tariff: TariffInput = {
		currency: 'USD',
		fixedCharges: [{ label: 'Customer charge', perMonth: 12.5 }],
		energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.18 }],
		demandCharges: [{ label: 'Demand', perKw: 8, days: 'weekdays' }],
		riders: [{ label: 'Fuel adjustment', perKwh: 0.031 }],
		taxes: [{ label: 'Sales tax', percent: 4 }],
		minimumMonthly: 15
	};

	it('groups the sentences by kind of charge, in bill order', () => {
		expect(describeTariff(tariff).map((section) => section.heading)).toEqual([
			'Fixed charges',
			'Energy charges',
			'Demand charges',
			'Riders',
			'Taxes',
			'Minimum bill',
			'Public holidays'
		]);
	});

	it('reads the same from the parsed tariff as from its input', () => {
		expect(describeTariff(tariffSchema.parse(tariff))).toEqual(describeTariff(tariff));
	});

	it('gives nothing for a tariff without charges', () => {
		expect(describeTariff({ currency: 'USD' })).toEqual([]);
	});
});

describe('describeTariff, other currencies', () => {
	it.each([
		// en-US currency formats as the ICU data in Node's Intl prints them (from memory).
		{ currency: 'EUR', line: 'Energy: €0.2475 per kWh.' },
		{ currency: 'CAD', line: 'Energy: CA$0.2475 per kWh.' },
		{ currency: 'usd', line: 'Energy: $0.2475 per kWh.' }
	])('formats a rate in $currency', ({ currency, line }) => {
		const tariff: TariffInput = {
			currency,
			energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.2475 }]
		};
		expect(linesOf(tariff)).toEqual([line]);
	});

	it('keeps up to five decimals of a rate and rounds beyond', () => {
		const tariff: TariffInput = {
			currency: 'USD',
			energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1234567 }]
		};
		expect(linesOf(tariff)).toEqual(['Energy: $0.12346 per kWh.']);
	});
});
