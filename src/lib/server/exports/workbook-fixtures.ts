/**
 * Invented comparisons for the workbook's tests: "Demo Valley Power", "Alder Creek hatchery" and
 * "Birchway school garden" are fictional, and so are all their rates and equipment.
 */
import type { CompareRequestInput, EquipmentInput } from '$lib/calc';
import { TIERED_MINIMUM_TARIFF, TOU_DEMAND_TARIFF, pump } from './workbook-tariffs';

type WindowsSchedule = Extract<EquipmentInput['schedule'], { type: 'windows' }>;

/** The hatchery's 1.5 kW tank heater, run in the cold months only; both scenarios keep it. */
const tankHeater = (dutyPercent: number, schedule: EquipmentInput['schedule']): EquipmentInput => ({
	name: 'Tank heater',
	category: 'heater',
	power: { watts: 1500 },
	dutyPercent,
	months: [1, 2, 3, 11, 12],
	schedule
});

/** The hatchery's four grow lights on one clock window; the scenarios differ in lamp and hours. */
const growLights = (
	watts: number,
	standbyWatts: number,
	window: WindowsSchedule['windows'][number],
	days: WindowsSchedule['days']
): EquipmentInput => ({
	name: 'Grow lights',
	category: 'lighting',
	quantity: 4,
	power: { watts },
	standbyWatts,
	schedule: { type: 'windows', windows: [window], days }
});

export function hatcheryRequest(more: Partial<CompareRequestInput> = {}): CompareRequestInput {
	return {
		period: { start: '2027-01', months: 12 },
		timezone: 'America/Chicago',
		holidays: { country: 'US', region: 'TX' },
		tariff: TOU_DEMAND_TARIFF,
		scenarios: [
			{
				// What is installed now: already paid for, so only its one-off cost is its year 0.
				name: 'Today: one large blower',
				status: 'installed',
				oneOffCosts: [
					{
						label: 'Electrician’s check of the blower circuit',
						amount: 40,
						note: 'Invented: a yearly visit booked now'
					}
				],
				equipment: [
					pump(),
					{
						name: 'Regenerative blower',
						category: 'air-pump',
						power: { amps: 4.1, volts: 208, powerFactor: 0.86, phases: 3 },
						schedule: { type: 'always' },
						purchaseCost: 1150,
						lifeYears: 8,
						maintenancePerYear: 60
					},
					tankHeater(35, { type: 'always' }),
					growLights(95, 1.5, { start: '06:00', end: '20:00' }, 'all')
				]
			},
			{
				name: 'Two small air pumps and a timer',
				equipment: [
					pump({ schedule: { type: 'cycle', onMinutes: 45, offMinutes: 15 } }),
					{
						name: '=HYPERLINK("http://example.org")',
						category: 'air-pump',
						quantity: 2,
						power: { watts: 120 },
						schedule: { type: 'always' },
						purchaseCost: 210,
						installCost: 60,
						lifeYears: 3,
						maintenancePerYear: 25
					},
					tankHeater(30, { type: 'hours', hoursPerDay: 18, days: 'all' }),
					growLights(60, 1, { start: '20:00', end: '06:00' }, 'weekdays'),
					{
						name: 'UV steriliser',
						category: 'uv',
						power: { watts: 40 },
						schedule: {
							type: 'runs',
							runsPerDay: 3,
							minutesPerRun: 45,
							windows: [{ start: '21:00', end: '05:00' }]
						},
						purchaseCost: 180
					}
				],
				status: 'proposed',
				oneOffCosts: [
					{
						label: 'Outdoor circuit with ground-fault protection',
						amount: 850,
						note: 'Invented quote; a licensed electrician does this work'
					}
				]
			}
		],
		baseline: 0,
		finance: { horizonYears: 10, discountPercent: 4.5, escalationPercent: 2.75 },
		emissionFactorKgPerKwh: 0.41,
		...more
	};
}

export function gardenRequest(more: Partial<CompareRequestInput> = {}): CompareRequestInput {
	return {
		period: { start: '2027-03', months: 12 },
		timezone: 'Europe/Berlin',
		holidays: { dates: ['2027-04-05', '2027-12-25', '2027-12-26'] },
		tariff: TIERED_MINIMUM_TARIFF,
		scenarios: [
			{ name: 'Pond pump all day', equipment: [pump({ name: 'Pond pump', power: { watts: 310 } })] },
			{
				name: 'Smaller pump and air-lift',
				equipment: [
					pump({
						name: 'Small pond pump',
						power: { watts: 95 },
						schedule: { type: 'hours', hoursPerDay: 14, days: 'all' },
						purchaseCost: 240,
						installCost: 90,
						lifeYears: 4
					}),
					{
						name: 'Air-lift pump',
						category: 'air-pump',
						power: { watts: 38 },
						schedule: { type: 'always' },
						purchaseCost: 95,
						lifeYears: 5,
						maintenancePerYear: 12
					}
				]
			},
			{
				name: 'Solar-hours pump, own tariff',
				tariff: {
					...TIERED_MINIMUM_TARIFF,
					minimumMonthly: 25,
					taxes: [{ label: 'Value added tax', percent: 19 }]
				},
				equipment: [
					pump({
						name: 'Day pump',
						power: { watts: 180 },
						schedule: { type: 'windows', windows: [{ start: '09:00', end: '17:00' }], days: 'all' },
						months: [4, 5, 6, 7, 8, 9, 10]
					})
				]
			}
		],
		baseline: 0,
		finance: { horizonYears: 12, discountPercent: 6, escalationPercent: -1.5 },
		emissionFactorKgPerKwh: 0.38,
		...more
	};
}
