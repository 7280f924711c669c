import { describe, expect, it } from 'vitest';
import { render } from 'svelte/server';
import { type TariffInput, tariffSchema } from '$lib/calc';
import TariffEditor from './TariffEditor.svelte';
import { postedStructure } from './posted.fixture';
import { setDemandPricing } from './demand-blanks';
import { setFixedBasis } from './tariff-blanks';
import { tariffIssues, writeDraft } from './tariff-editor';

// An invented tariff with every charge of issue 19 (no real utility's rates), as a stored version
// would load into the editor. The rule checked: nothing a person did not touch is lost on save.
const stored = (): TariffInput => ({
	currency: 'USD',
	holidaysAsWeekends: true,
	fixedCharges: [
		{ label: 'Meter charge', perYear: 120 },
		{ label: 'Customer charge', perMonth: 10 }
	],
	energyCharges: [
		{
			label: 'Supply',
			type: 'tou',
			tiersPer: 'day',
			seasons: [
				{
					months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
					tierLimitsKwh: [10, 25],
					periods: [
						{
							label: 'On-peak',
							perKwh: 0.3,
							abovePerKwh: [0.4, 0.5],
							days: 'weekdays',
							windows: [{ start: '16:00', end: '21:00' }]
						}
					],
					otherPerKwh: 0.1,
					otherAbovePerKwh: [0.15, 0.2]
				}
			]
		},
		{
			label: 'Delivery',
			type: 'tiered',
			tiersPer: 'day',
			tiers: [
				{ uptoKwh: 12, perKwh: 0.03 },
				{ uptoKwh: null, perKwh: 0.05 }
			]
		},
		{ label: 'Adder', type: 'flat', perKwh: 0.01 }
	],
	demandCharges: [
		{
			label: 'Demand',
			tiers: [
				{ uptoKw: 100, perKw: 10 },
				{ uptoKw: null, perKw: 15 }
			],
			ratchet: { percent: 80, months: [6, 7, 8, 9] },
			intervalMinutes: 15,
			days: 'all'
		}
	],
	riders: [],
	taxes: [],
	minimumMonthly: null,
	minimumPerDay: 0.5,
	minimumPerYear: 240
});

const payload = (structure: TariffInput) => postedStructure(structure);

describe('the tariff editor on a tariff with the new charges', () => {
	it('loads it valid', () => {
		expect(tariffIssues(stored())).toEqual([]);
		expect(tariffSchema.safeParse(stored()).success).toBe(true);
	});

	it('keeps tiers inside time-of-use periods, daily tiers, demand tiers and the ratchet when another field changes', () => {
		const edited = stored();
		const adder = edited.energyCharges![2]!;
		if (adder.type !== 'flat') throw new Error('fixture changed');
		writeDraft(adder, 'perKwh', 0.012);
		const saved = payload(edited);
		const expected = stored();
		(expected.energyCharges![2] as { perKwh: number }).perKwh = 0.012;
		expect(saved).toEqual(expected);
	});

	it('moves a fixed charge to per year and back, keeping the amount', () => {
		const edited = stored();
		const charge = edited.fixedCharges![1]!;
		setFixedBasis(charge, 'perYear');
		expect(charge).toEqual({ label: 'Customer charge', perYear: 10 });
		setFixedBasis(charge, 'perDay');
		expect(charge).toEqual({ label: 'Customer charge', perDay: 10 });
	});

	it('switches demand between one price and tiers, one of them at a time', () => {
		const charge = structuredClone(stored().demandCharges![0]!);
		setDemandPricing(charge, false);
		expect(charge.perKw).toBe(10);
		expect(charge.tiers).toBeUndefined();
		setDemandPricing(charge, true);
		expect(charge.tiers).toEqual([
			{ uptoKw: 100, perKw: 10 },
			{ uptoKw: null, perKw: 10 }
		]);
		expect('perKw' in charge).toBe(false);
	});

	it('gives the schema’s message at each new field', () => {
		const broken = stored();
		broken.minimumPerDay = -1;
		broken.demandCharges![0]!.ratchet = { percent: 250, months: [6] };
		const paths = tariffIssues(broken).map((issue) => `${issue.path}: ${issue.message}`);
		expect(paths).toEqual([
			expect.stringMatching(/^demandCharges\.0\.ratchet\.percent: Ratchet percent/),
			expect.stringMatching(/^minimumPerDay: Minimum per day/)
		]);
	});

	it('shows the new fields, and the imported tiers read-only', () => {
		const body = render(TariffEditor, { props: { value: stored() } }).body;
		for (const words of [
			'Amount per year',
			'Minimum per day',
			'Minimum per year',
			'In tiers by kW',
			'Up to kW',
			'Percent of the highest earlier peak',
			'Months whose peaks count',
			'kWh a day (× the days of the month)',
			'Tiers across the periods:',
			'10 and 25 kWh a day',
			'On-peak: 0.4, 0.5 per kWh',
			'edit them by importing the rate again or'
		])
			expect(body).toContain(words);
	});
});
