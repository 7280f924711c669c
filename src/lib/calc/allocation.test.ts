import { describe, expect, it } from 'vitest';
import { device, onlyPeriod, run } from './requests.fixture';
import type { TariffInput } from './tariff.schema';
import { tiered, tou, touPeriod, twoTierDelivery } from './tariffs.fixture';
import type { PeriodResult } from './types';

/** Invented tariff with one of everything (Demo Valley Power, fictional). */
const everything: TariffInput = {
	currency: 'USD',
	fixedCharges: [
		{ label: 'Customer charge', perMonth: 12.5 },
		{ label: 'Meter', perDay: 0.17 }
	],
	energyCharges: [
		{ label: 'Energy', type: 'flat', perKwh: 0.0917 },
		tiered('Delivery', [300, 0.041], [null, 0.067]),
		tou('Supply', {
			months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
			periods: [touPeriod('Peak', 0.213, 'weekdays', '17:00', '20:00')],
			otherPerKwh: 0.087
		})
	],
	demandCharges: [{ label: 'Demand', perKw: 6.33 }],
	riders: [{ label: 'Fuel adjustment', perKwh: 0.0131 }],
	taxes: [
		{ label: 'State tax', percent: 4.25 },
		{ label: 'City tax', percent: 1.1 }
	]
};

const equipment = [
	device({ name: 'Demo pump', power: { watts: 373 }, schedule: { type: 'always' } }),
	device({
		name: 'Demo lights',
		power: { amps: 4.2, volts: 240 },
		schedule: { type: 'windows', windows: [{ start: '18:00', end: '06:00' }] }
	}),
	device({
		name: 'Demo blower',
		quantity: 2,
		power: { watts: 90 },
		standbyWatts: 3,
		schedule: { type: 'cycle', onMinutes: 20, offMinutes: 10 }
	}),
	device({
		name: 'Demo heater',
		power: { watts: 1500 },
		months: [1, 2, 12],
		schedule: { type: 'hours', hoursPerDay: 6 }
	})
];

/** Cents between the total and the devices' shares plus the shared cost. */
function shareGapCents(period: PeriodResult): number {
	const cents = (money: number) => Math.round(money * 100);
	const shares =
		period.equipment.reduce((sum, share) => sum + cents(share.cost), 0) + cents(period.sharedCost);
	return shares - cents(period.total);
}

describe('each device’s share', () => {
	const period = onlyPeriod({ tariff: everything, equipment });

	it('lists devices in the request’s order with their kWh', () => {
		expect(period.equipment.map((share) => share.name)).toEqual([
			'Demo pump',
			'Demo lights',
			'Demo blower',
			'Demo heater'
		]);
		expect(period.equipment.reduce((sum, share) => sum + share.kwh, 0)).toBeCloseTo(period.kwh, 9);
	});

	it('adds up with the shared cost to the total, to the cent', () => {
		expect(shareGapCents(period)).toBe(0);
	});

	it('gives a device outside its months nothing', () => {
		expect(period.equipment[3]).toEqual({ name: 'Demo heater', kwh: 0, cost: 0 });
	});

	it('puts fixed charges and their taxes in the shared cost', () => {
		const fixed = 12.5 + 0.17 * 30;
		expect(period.sharedCost).toBeCloseTo(fixed * (1 + 0.0535), 2);
	});
});

describe('rounding the shares together', () => {
	// Rounding each share on its own used to leave this year 3 cents off its total (every month a cent
	// or none); three equal pumps and taxes on a tiered bill make each share end in a third of a cent.
	const pumps = [1, 2, 3].map((n) => device({ name: `Demo pump ${n}`, power: { watts: 333 } }));
	const year = run({
		period: { start: '2027-01', months: 12 },
		tariff: { ...everything, fixedCharges: [] },
		equipment: [...pumps, ...equipment]
	});

	it('makes every period add up to its total, to the cent', () => {
		for (const period of year.periods) expect(shareGapCents(period)).toBe(0);
	});

	it('makes the year add up to its total, to the cent', () => {
		const cents = (money: number) => Math.round(money * 100);
		const devices = year.periods.flatMap((period) => period.equipment.map((share) => cents(share.cost)));
		const shared = year.periods.map((period) => cents(period.sharedCost));
		expect([...devices, ...shared].reduce((sum, c) => sum + c, 0)).toBe(cents(year.totals.cost));
	});

	it('keeps each share within a cent of its own exact amount', () => {
		const [first, second, third] = year.periods[0]?.equipment ?? [];
		expect(Math.abs((first?.cost ?? 0) - (second?.cost ?? 0))).toBeLessThanOrEqual(0.01);
		expect(Math.abs((second?.cost ?? 0) - (third?.cost ?? 0))).toBeLessThanOrEqual(0.01);
	});
});

describe('sharing charges that are not per interval', () => {
	it('shares demand by each device’s kW at the peak', () => {
		const period = onlyPeriod({
			tariff: { currency: 'USD', demandCharges: [{ label: 'Demand', perKw: 10 }] },
			equipment: [device({ power: { watts: 3000 } }), device({ power: { watts: 1000 } })]
		});
		expect(period.equipment.map((share) => share.cost)).toEqual([30, 10]);
	});

	it('shares a tiered charge at the period’s average tier rate', () => {
		const period = onlyPeriod({
			tariff: twoTierDelivery(),
			equipment: [device({ power: { watts: 600 / 0.72 } }), device({ power: { watts: 100 / 0.72 } })]
		});
		const average = (500 * 0.05 + 200 * 0.08) / 700;
		expect(period.equipment.map((share) => share.cost)).toEqual([
			Math.round(600 * average * 100) / 100,
			Math.round(100 * average * 100) / 100
		]);
	});

	it('puts the minimum line in the shared cost', () => {
		const period = onlyPeriod({
			tariff: {
				currency: 'USD',
				energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.1 }],
				minimumMonthly: 20
			},
			equipment: [device({ power: { watts: 100 } })]
		});
		expect(period.equipment[0]?.cost).toBe(7.2);
		expect(period.sharedCost).toBe(12.8);
		expect(period.total).toBe(20);
	});
});
