/** Invented tariffs of the fictional "Demo Valley Power", and an invented pump, for the workbook's tests. */
import type { EquipmentInput, TariffInput } from '$lib/calc';

/** Time-of-use with seasons, a flat delivery charge, two demand charges, riders (one a credit), two taxes. */
export const TOU_DEMAND_TARIFF: TariffInput = {
	currency: 'USD',
	fixedCharges: [{ label: 'Customer charge', perMonth: 14.5 }],
	energyCharges: [
		{
			label: 'Supply',
			type: 'tou',
			seasons: [
				{
					months: [6, 7, 8, 9],
					periods: [
						{ label: 'On-peak', perKwh: 0.29, days: 'weekdays', windows: [{ start: '14:00', end: '20:00' }] }
					],
					otherPerKwh: 0.11
				},
				{
					months: [1, 2, 3, 4, 5, 10, 11, 12],
					periods: [
						{
							label: 'Mid-peak',
							perKwh: 0.163,
							days: 'weekdays',
							windows: [{ start: '06:00', end: '10:00' }]
						}
					],
					otherPerKwh: 0.0975
				}
			]
		},
		{ label: 'Delivery', type: 'flat', perKwh: 0.0451 }
	],
	demandCharges: [
		{
			label: 'Peak demand',
			perKw: 9.5,
			intervalMinutes: 15,
			days: 'weekdays',
			windows: [{ start: '12:00', end: '20:00' }]
		},
		{ label: 'Facilities demand', perKw: 3.1, intervalMinutes: 60, months: [5, 6, 7, 8, 9] }
	],
	riders: [
		{ label: 'Fuel adjustment', perKwh: 0.0125 },
		{ label: 'Efficiency credit', perKwh: -0.002 }
	],
	taxes: [
		{ label: 'Sales tax', percent: 6.25 },
		{ label: 'City tax', percent: 1.5 }
	]
};

/** Tiers, a summer-only delivery charge, a per-day fixed charge, a minimum bill and a tax. */
export const TIERED_MINIMUM_TARIFF: TariffInput = {
	currency: 'EUR',
	fixedCharges: [{ label: 'Service charge', perDay: 0.42 }],
	energyCharges: [
		{
			label: 'Energy',
			type: 'tiered',
			tiers: [
				{ uptoKwh: 150, perKwh: 0.09 },
				{ uptoKwh: 400, perKwh: 0.125 },
				{ uptoKwh: null, perKwh: 0.16 }
			]
		},
		{ label: 'Summer delivery', type: 'flat', perKwh: 0.021, months: [5, 6, 7, 8, 9] }
	],
	riders: [{ label: 'Network levy', perKwh: 0.0087 }],
	taxes: [{ label: 'Value added tax', percent: 7 }],
	minimumMonthly: 40
};

/** An invented mains water pump with a purchase, installation, life and maintenance. */
export const pump = (more: Partial<EquipmentInput> = {}): EquipmentInput => ({
	name: 'Main water pump',
	category: 'water-pump',
	power: { amps: 6.2, volts: 230, powerFactor: 0.82 },
	schedule: { type: 'always' },
	purchaseCost: 640,
	installCost: 380,
	lifeYears: 6,
	maintenancePerYear: 45,
	...more
});

/**
 * Every charge of issue 19 at once (invented rates): a yearly and a daily fixed charge, a time-of-use
 * charge with tiers inside its periods, daily-allowance tiers, tiered demand with a 12-period ratchet,
 * a demand ratchet on listed months, monthly, daily and yearly minimums (the yearly one set to bite),
 * and a tax.
 */
export const REAL_CHARGES_TARIFF: TariffInput = {
	currency: 'USD',
	fixedCharges: [
		{ label: 'Meter charge', perYear: 150 },
		{ label: 'Service charge', perDay: 0.3 }
	],
	energyCharges: [
		{
			label: 'Supply',
			type: 'tou',
			seasons: [
				{
					months: [6, 7, 8, 9],
					tierLimitsKwh: [400, 900],
					periods: [
						{
							label: 'On-peak',
							perKwh: 0.24,
							abovePerKwh: [0.3, 0.36],
							days: 'weekdays',
							windows: [{ start: '14:00', end: '20:00' }]
						}
					],
					otherPerKwh: 0.1,
					otherAbovePerKwh: [0.13, 0.15]
				},
				{
					months: [1, 2, 3, 4, 5, 10, 11, 12],
					tierLimitsKwh: [600],
					periods: [],
					otherPerKwh: 0.09,
					otherAbovePerKwh: [0.11]
				}
			]
		},
		{
			label: 'Delivery',
			type: 'tiered',
			tiersPer: 'day',
			tiers: [
				{ uptoKwh: 12, perKwh: 0.03 },
				{ uptoKwh: 30, perKwh: 0.045 },
				{ uptoKwh: null, perKwh: 0.06 }
			]
		}
	],
	demandCharges: [
		{
			label: 'Demand',
			tiers: [
				{ uptoKw: 2, perKw: 6 },
				{ uptoKw: null, perKw: 9 }
			],
			ratchet: { percent: 80, monthsBack: 11 }
		},
		{
			label: 'Winter demand',
			perKw: 2.5,
			intervalMinutes: 60,
			months: [1, 2, 3, 11, 12],
			ratchet: { percent: 50, months: [1, 2] }
		}
	],
	taxes: [{ label: 'Sales tax', percent: 5 }],
	minimumMonthly: 20,
	minimumPerDay: 6.5,
	minimumPerYear: 4000
};
