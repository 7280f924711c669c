import { describe, expect, it } from 'vitest';
import { type ScheduleInput, device, line, onlyPeriod } from './requests.fixture';
import type { TariffInput } from './tariff.schema';

type DemandChargeInput = NonNullable<TariffInput['demandCharges']>[number];

function demandTariff(charge: Partial<DemandChargeInput> = {}): TariffInput {
	return { currency: 'USD', demandCharges: [{ label: 'Demand', perKw: 10, ...charge }] };
}

const load = (watts: number, schedule: ScheduleInput, more: object = {}) =>
	device({ power: { watts }, schedule, ...more });
const quarterHour: ScheduleInput = { type: 'windows', windows: [{ start: '16:00', end: '16:15' }] };

describe('15-minute demand', () => {
	it('charges the largest 15-minute kW of the period', () => {
		const period = onlyPeriod({ tariff: demandTariff(), equipment: [load(4000, quarterHour)] });
		expect(line(period, 'demand')).toBe(40);
		expect(period.peakKw).toBe(4);
	});

	it('adds up devices that may run at the same time', () => {
		const period = onlyPeriod({
			tariff: demandTariff(),
			equipment: [load(4000, quarterHour), load(1500, { type: 'always' })]
		});
		expect(line(period, 'demand')).toBe(55);
	});
});

describe('60-minute demand', () => {
	it('takes the mean of the hour’s four 15-minute values', () => {
		const period = onlyPeriod({
			tariff: demandTariff({ intervalMinutes: 60 }),
			equipment: [load(4000, quarterHour)]
		});
		expect(line(period, 'demand')).toBe(10); // (4 + 0 + 0 + 0) / 4 kW × 10
	});

	it('averages a half-hour run over its clock hour', () => {
		const halfHour: ScheduleInput = { type: 'windows', windows: [{ start: '16:30', end: '17:00' }] };
		const period = onlyPeriod({
			tariff: demandTariff({ intervalMinutes: 60 }),
			equipment: [load(4000, halfHour)]
		});
		expect(line(period, 'demand')).toBe(20);
	});
});

describe('the worst case for schedules that spread their running', () => {
	it.each<[string, ScheduleInput]>([
		['hours', { type: 'hours', hoursPerDay: 1 }],
		['cycle', { type: 'cycle', onMinutes: 5, offMinutes: 55 }],
		['runs', { type: 'runs', runsPerDay: 2, minutesPerRun: 10, windows: [{ start: '06:00', end: '08:00' }] }]
	])('counts a %s schedule at full running power', (_type, schedule) => {
		const period = onlyPeriod({ tariff: demandTariff(), equipment: [load(10_000, schedule)] });
		expect(line(period, 'demand')).toBe(100);
	});

	it('counts duty percent into running power but standby when off', () => {
		const period = onlyPeriod({
			tariff: demandTariff(),
			equipment: [
				load(10_000, quarterHour, { dutyPercent: 50 }),
				load(1000, quarterHour, { standbyWatts: 200 })
			]
		});
		expect(line(period, 'demand')).toBe(60); // 5 kW + 1 kW at 16:00
	});
});

describe('demand windows, days and months', () => {
	const onPeak = { days: 'weekdays' as const, windows: [{ start: '16:00', end: '21:00' }] };

	it('measures only its windows', () => {
		const night: ScheduleInput = { type: 'windows', windows: [{ start: '22:00', end: '06:00' }] };
		const period = onlyPeriod({
			tariff: demandTariff(onPeak),
			equipment: [load(5000, night, { standbyWatts: 200 })]
		});
		expect(line(period, 'demand')).toBe(2); // standby 0.2 kW only
		expect(period.peakKw).toBe(5);
	});

	it('measures only its days', () => {
		const weekendEvening: ScheduleInput = {
			type: 'windows',
			windows: [{ start: '17:00', end: '18:00' }],
			days: 'weekends'
		};
		const period = onlyPeriod({ tariff: demandTariff(onPeak), equipment: [load(5000, weekendEvening)] });
		expect(line(period, 'demand')).toBe(0);
	});

	it('applies only in its months', () => {
		const period = onlyPeriod({
			tariff: demandTariff({ months: [1] }),
			equipment: [load(5000, { type: 'always' })]
		});
		expect(line(period, 'demand')).toBe(0);
	});
});
