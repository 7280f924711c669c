/**
 * fast-check generators of valid, invented calculation inputs for the property tests: devices on every
 * kind of schedule and tariffs with every kind of charge but no minimum bill.
 */
import fc from 'fast-check';
import type { EquipmentInput } from './equipment.schema';
import type { TariffInput } from './tariff.schema';

const clock = (quarters: number) =>
	`${String(Math.floor(quarters / 4)).padStart(2, '0')}:${String((quarters % 4) * 15).padStart(2, '0')}`;

/** A window on the 15-minute grid; it may cross midnight. */
export const windowArb = fc
	.tuple(fc.integer({ min: 0, max: 95 }), fc.integer({ min: 1, max: 95 }))
	.map(([start, length]) => ({ start: clock(start), end: clock((start + length) % 96 || 96) }));
export const daysArb = fc.constantFrom('all', 'weekdays', 'weekends') as fc.Arbitrary<
	'all' | 'weekdays' | 'weekends'
>;

export const scheduleArb: fc.Arbitrary<EquipmentInput['schedule']> = fc.oneof(
	fc.constant({ type: 'always' as const }),
	fc.record({
		type: fc.constant('hours' as const),
		hoursPerDay: fc.double({ min: 0, max: 24, noNaN: true }),
		days: daysArb
	}),
	fc.record({
		type: fc.constant('windows' as const),
		windows: fc.array(windowArb, { minLength: 1, maxLength: 3 }),
		days: daysArb
	}),
	fc.record({
		type: fc.constant('cycle' as const),
		onMinutes: fc.integer({ min: 1, max: 60 }),
		offMinutes: fc.integer({ min: 0, max: 60 }),
		days: daysArb
	}),
	fc.record({
		type: fc.constant('runs' as const),
		runsPerDay: fc.integer({ min: 0, max: 6 }),
		minutesPerRun: fc.integer({ min: 0, max: 15 }),
		windows: fc.constant(null).map(() => [{ start: '06:00', end: '08:00' }])
	})
);

export const powerArb: fc.Arbitrary<EquipmentInput['power']> = fc.oneof(
	fc.record({ watts: fc.double({ min: 0, max: 5000, noNaN: true }) }),
	fc.record({
		amps: fc.double({ min: 0, max: 30, noNaN: true }),
		volts: fc.constantFrom(120, 230, 480),
		powerFactor: fc.double({ min: 0.5, max: 1, noNaN: true }),
		phases: fc.constantFrom(1 as const, 3 as const)
	})
);

export const deviceArb: fc.Arbitrary<EquipmentInput> = fc.record({
	name: fc.constant('Demo device'),
	quantity: fc.integer({ min: 1, max: 5 }),
	power: powerArb,
	standbyWatts: fc.integer({ min: 0, max: 50 }),
	dutyPercent: fc.integer({ min: 0, max: 100 }),
	schedule: scheduleArb
});

export const rate = fc.double({ min: 0, max: 0.5, noNaN: true });

/** Invented tariffs with every kind of charge but no minimum bill. */
export const tariffArb: fc.Arbitrary<TariffInput> = fc
	.record({
		flat: rate,
		tierKwh: fc.integer({ min: 1, max: 2000 }),
		tierRates: fc.tuple(rate, rate),
		peak: fc.tuple(fc.integer({ min: 0, max: 11 }), fc.integer({ min: 12, max: 23 })),
		touRates: fc.tuple(rate, rate),
		perKw: fc.double({ min: 0, max: 20, noNaN: true }),
		intervalMinutes: fc.constantFrom(15 as const, 60 as const),
		rider: fc.double({ min: 0, max: 0.05, noNaN: true }),
		tax: fc.double({ min: 0, max: 15, noNaN: true }),
		perMonth: fc.double({ min: 0, max: 30, noNaN: true })
	})
	.map((t) => ({
		currency: 'USD',
		fixedCharges: [{ label: 'Customer charge', perMonth: t.perMonth }],
		energyCharges: [
			{ label: 'Energy', type: 'flat' as const, perKwh: t.flat },
			{
				label: 'Delivery',
				type: 'tiered' as const,
				tiers: [
					{ uptoKwh: t.tierKwh, perKwh: t.tierRates[0] },
					{ uptoKwh: null, perKwh: t.tierRates[1] }
				]
			},
			{
				label: 'Supply',
				type: 'tou' as const,
				seasons: [
					{
						months: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
						periods: [
							{
								label: 'Peak',
								perKwh: t.touRates[0],
								days: 'weekdays' as const,
								windows: [{ start: clock(t.peak[0] * 4), end: clock(t.peak[1] * 4) }]
							}
						],
						otherPerKwh: t.touRates[1]
					}
				]
			}
		],
		demandCharges: [{ label: 'Demand', perKw: t.perKw, intervalMinutes: t.intervalMinutes }],
		riders: [{ label: 'Fuel adjustment', perKwh: t.rider }],
		taxes: [{ label: 'Tax', percent: t.tax }]
	}));

export const zoneArb = fc.constantFrom('UTC', 'America/Chicago', 'Europe/Berlin', 'Australia/Sydney');
export const periodArb = fc.record({
	start: fc.constantFrom('2027-02', '2027-03', '2027-10', '2027-11'),
	months: fc.integer({ min: 1, max: 2 })
});

export const requestArb = fc.record({
	period: periodArb,
	timezone: zoneArb,
	holidays: fc.constant({ country: 'US' }),
	tariff: tariffArb,
	equipment: fc.array(deviceArb, { minLength: 0, maxLength: 4 })
});
