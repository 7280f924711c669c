import { describe, expect, it } from 'vitest';
import type { TariffInput } from '$lib/calc';
import { tiered, tou, touPeriod } from '$lib/calc/tariffs.fixture';
import { describeTariffDiff } from './version-diff';

// Invented versions of an invented tariff; the expected lines are the wording the version history
// promises (the tariff-page brief; common practice, no source).

const base: TariffInput = {
	currency: 'USD',
	fixedCharges: [{ label: 'Customer charge', perMonth: 12.5 }],
	energyCharges: [
		{ label: 'Energy', type: 'flat', perKwh: 0.18 },
		tiered('Delivery', [500, 0.05], [null, 0.08]),
		tou(
			'Supply',
			{
				months: [6, 7, 8, 9],
				periods: [touPeriod('On-peak', 0.32, 'weekdays', '16:00', '21:00')],
				otherPerKwh: 0.12
			},
			{ months: [10, 11, 12, 1, 2, 3, 4, 5], periods: [], otherPerKwh: 0.1 }
		)
	],
	demandCharges: [{ label: 'Demand', perKw: 8 }],
	taxes: [{ label: 'Sales tax', percent: 4 }]
};

type Edit = (tariff: TariffInput) => TariffInput;
const copy = (tariff: TariffInput): TariffInput => structuredClone(tariff);
const energyAt = (tariff: TariffInput, i: number) => tariff.energyCharges?.[i];
/** An edit that changes a copy of the tariff in place. */
const editing =
	(change: (next: TariffInput) => void): Edit =>
	(t) => {
		const next = copy(t);
		change(next);
		return next;
	};

describe('describeTariffDiff, one change at a time', () => {
	const cases: Array<{ name: string; edit: Edit; lines: string[] }> = [
		{
			name: 'a flat rate that rises',
			edit: (t) => ({
				...t,
				energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.19 }, ...(t.energyCharges ?? []).slice(1)]
			}),
			lines: ['Energy: $0.18 → $0.19 per kWh']
		},
		{
			name: 'an added rider',
			edit: (t) => ({ ...t, riders: [{ label: 'Fuel adjustment', perKwh: 0.031 }] }),
			lines: ['Added rider Fuel adjustment $0.031 per kWh']
		},
		{
			name: 'a removed customer charge',
			edit: (t) => ({ ...t, fixedCharges: [] }),
			lines: ['Customer charge removed']
		},
		{
			name: 'a customer charge that rises',
			edit: (t) => ({ ...t, fixedCharges: [{ label: 'Customer charge', perMonth: 14 }] }),
			lines: ['Customer charge: $12.50 → $14.00 a month']
		},
		{
			name: 'a customer charge that becomes daily',
			edit: (t) => ({ ...t, fixedCharges: [{ label: 'Customer charge', perDay: 0.45 }] }),
			lines: ['Customer charge: $12.50 a month → $0.45 a day']
		},
		{
			name: 'a dearer second tier',
			edit: editing((next) => {
				const delivery = energyAt(next, 1);
				if (delivery?.type === 'tiered' && delivery.tiers[1]) delivery.tiers[1].perKwh = 0.085;
			}),
			lines: ['Delivery, above 500 kWh: $0.08 → $0.085 per kWh']
		},
		{
			name: 'a longer first tier',
			edit: editing((next) => {
				const delivery = energyAt(next, 1);
				if (delivery?.type === 'tiered' && delivery.tiers[0]) delivery.tiers[0].uptoKwh = 600;
			}),
			lines: [
				'Delivery: tiers now $0.05 per kWh for the first 600 kWh of each billing period, then $0.08 per kWh'
			]
		},
		{
			name: 'a dearer and shifted on-peak period',
			edit: editing((next) => {
				const supply = energyAt(next, 2);
				const period = supply?.type === 'tou' ? supply.seasons[0]?.periods[0] : undefined;
				if (period) Object.assign(period, { perKwh: 0.34, windows: [{ start: '15:00', end: '20:00' }] });
			}),
			lines: [
				'Supply, June–September, On-peak: $0.32 → $0.34 per kWh',
				'Supply, June–September, On-peak: now on weekdays 15:00–20:00'
			]
		},
		{
			name: 'a cheaper off-season',
			edit: editing((next) => {
				const supply = energyAt(next, 2);
				if (supply?.type === 'tou' && supply.seasons[1]) supply.seasons[1].otherPerKwh = 0.095;
			}),
			lines: ['Supply, October–May, other times: $0.10 → $0.095 per kWh']
		},
		{
			name: 'a demand charge that moves to weekdays',
			edit: (t) => ({ ...t, demandCharges: [{ label: 'Demand', perKw: 8, days: 'weekdays' }] }),
			lines: ['Demand: now $8.00 per kW of the highest 15-minute demand in the billing period (weekdays)']
		},
		{
			name: 'a higher tax',
			edit: (t) => ({ ...t, taxes: [{ label: 'Sales tax', percent: 4.5 }] }),
			lines: ['Sales tax: 4% → 4.5%']
		},
		{
			name: 'an added minimum bill',
			edit: (t) => ({ ...t, minimumMonthly: 15 }),
			lines: ['Added minimum bill $15.00 a month']
		},
		{
			name: 'holidays that stop pricing like weekends',
			edit: (t) => ({ ...t, holidaysAsWeekends: false }),
			lines: ['Holidays now price like the weekday they fall on']
		}
	];

	it.each(cases)('lists $name', ({ edit, lines }) => {
		expect(describeTariffDiff(base, edit(copy(base)))).toEqual(lines);
	});
});

describe('describeTariffDiff, other situations', () => {
	it('lists nothing for an unchanged copy', () => {
		expect(describeTariffDiff(base, copy(base))).toEqual([]);
	});

	it('matches charges by label whatever their case or spacing', () => {
		const after: TariffInput = { ...copy(base), demandCharges: [{ label: ' demand ', perKw: 8 }] };
		expect(describeTariffDiff(base, after)).toEqual([]);
	});

	it('spells out a charge that changes kind', () => {
		const after: TariffInput = {
			...copy(base),
			energyCharges: [tiered('Energy', [1000, 0.17], [null, 0.2]), ...(base.energyCharges ?? []).slice(1)]
		};
		expect(describeTariffDiff(base, after)).toEqual([
			'Energy: now tiered (was flat)',
			'Energy: $0.17 per kWh for the first 1,000 kWh of each billing period, then $0.20 per kWh.'
		]);
	});

	it('lists several changes in bill order', () => {
		const after: TariffInput = {
			...copy(base),
			fixedCharges: [],
			riders: [{ label: 'Fuel adjustment', perKwh: 0.031 }],
			minimumMonthly: 15
		};
		expect(describeTariffDiff(base, after)).toEqual([
			'Customer charge removed',
			'Added rider Fuel adjustment $0.031 per kWh',
			'Added minimum bill $15.00 a month'
		]);
	});
});
