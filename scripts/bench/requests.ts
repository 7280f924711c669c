/**
 * The bench's invented requests (`npm run bench`): a deterministic equipment generator and a tariff
 * with time-of-use seasons, tiers, demand, riders and taxes. "Demo Valley Power" is fictional.
 */
import type {
	CalculateRequestInput,
	CompareRequestInput,
	EquipmentInput,
	TariffInput
} from '../../src/lib/calc/index';
import { tiered, tou, touPeriod } from '../../src/lib/calc/tariffs.fixture';

/** A small deterministic generator (mulberry32), so every run measures the same requests. */
export function random(seed: number): () => number {
	let state = seed;
	return () => {
		state = (state + 0x6d2b79f5) | 0;
		let t = Math.imul(state ^ (state >>> 15), 1 | state);
		t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

const pad = (hour: number) => `${String(hour).padStart(2, '0')}:00`;

export const tariff: TariffInput = {
	currency: 'USD',
	holidaysAsWeekends: true,
	fixedCharges: [{ label: 'Demo Valley Power customer charge', perMonth: 18.5 }],
	energyCharges: [
		tou(
			'Supply',
			{
				months: [6, 7, 8, 9],
				periods: [
					touPeriod('On-peak', 0.31, 'weekdays', '16:00', '21:00'),
					touPeriod('Mid-peak', 0.19, 'weekdays', '07:00', '16:00')
				],
				otherPerKwh: 0.11
			},
			{
				months: [1, 2, 3, 4, 5, 10, 11, 12],
				periods: [touPeriod('Peak', 0.22, 'all', '17:00', '20:00')],
				otherPerKwh: 0.12
			}
		),
		tiered('Delivery', [1000, 0.045], [5000, 0.062], [null, 0.071])
	],
	demandCharges: [
		{ label: 'Demand', perKw: 7.25, intervalMinutes: 15 },
		{
			label: 'Summer peak demand',
			perKw: 4.1,
			intervalMinutes: 60,
			months: [6, 7, 8, 9],
			days: 'weekdays',
			windows: [{ start: '16:00', end: '21:00' }]
		}
	],
	riders: [{ label: 'Fuel adjustment', perKwh: 0.021 }],
	taxes: [
		{ label: 'State tax', percent: 4 },
		{ label: 'City tax', percent: 1.5 }
	],
	minimumMonthly: 25
};

const COMMON_SCHEDULES: EquipmentInput['schedule'][] = [
	{ type: 'always' },
	{ type: 'hours', hoursPerDay: 12, days: 'all' },
	{ type: 'windows', windows: [{ start: '06:00', end: '22:00' }], days: 'all' },
	{ type: 'windows', windows: [{ start: '22:00', end: '06:00' }], days: 'weekdays' },
	{ type: 'cycle', onMinutes: 15, offMinutes: 45 },
	{ type: 'runs', runsPerDay: 4, minutesPerRun: 30, windows: [{ start: '08:00', end: '18:00' }] }
];
const CATEGORIES = ['water-pump', 'air-pump', 'aerator', 'lighting', 'heater', 'fan'] as const;

/** Half the devices use common schedules, half invented windows, so load groups are many. */
export function equipment(count: number, seed: number): EquipmentInput[] {
	const next = random(seed);
	return Array.from({ length: count }, (_, i) => {
		const start = Math.floor(next() * 24);
		const schedule =
			next() < 0.5
				? (COMMON_SCHEDULES[Math.floor(next() * COMMON_SCHEDULES.length)] ?? { type: 'always' })
				: {
						type: 'windows' as const,
						windows: [{ start: pad(start), end: pad((start + 1 + Math.floor(next() * 12)) % 24) }]
					};
		return {
			name: `Demo device ${i + 1}`,
			category: CATEGORIES[i % CATEGORIES.length],
			quantity: 1 + Math.floor(next() * 4),
			power:
				next() < 0.5
					? { watts: 20 + Math.round(next() * 2000) }
					: { amps: 0.5 + next() * 10, volts: 120, powerFactor: 0.85 },
			standbyWatts: next() < 0.3 ? 2 : 0,
			dutyPercent: next() < 0.2 ? 60 : 100,
			months: next() < 0.15 ? [5, 6, 7, 8, 9] : undefined,
			schedule,
			purchaseCost: 200,
			installCost: 150,
			lifeYears: 5,
			maintenancePerYear: 20
		};
	});
}

export function calculation(devices: number, seed = 1, months = 12): CalculateRequestInput {
	return {
		period: { start: '2027-01', months },
		timezone: 'America/Chicago',
		holidays: { country: 'US', region: 'TX' },
		tariff,
		equipment: equipment(devices, seed)
	};
}

export function comparison(count = 5, devices = 100): CompareRequestInput {
	const { equipment: _, ...fields } = calculation(0);
	return {
		...fields,
		scenarios: Array.from({ length: count }, (_, i) => ({
			name: `Scenario ${i + 1}`,
			equipment: equipment(devices, 10 + i)
		})),
		baseline: 0,
		finance: { horizonYears: 10, discountPercent: 5, escalationPercent: 3 },
		emissionFactorKgPerKwh: 0.4
	};
}
