import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { EquipmentInput } from '$lib/calc';
import {
	type ProfileOptions,
	dailyProfile,
	dayKwh,
	hourlyKw,
	profileLayers,
	stackLayers,
	stepAreaPath,
	totalPoints
} from './daily-profile';

// Invented devices for these tests only. The rules are the calculation contract's (issue 3); the
// expected figures are worked out by hand from them.

const weekday: ProfileOptions = { dayType: 'weekday', month: 1 };
const weekend: ProfileOptions = { dayType: 'weekend', month: 1 };
const slotOf = (hhmm: string) => (Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3))) / 15;
const kwAt = (equipment: EquipmentInput[], hhmm: string, options = weekday) =>
	dailyProfile(equipment, options)[slotOf(hhmm)]?.kw;

const device = (overrides: Partial<EquipmentInput>): EquipmentInput => ({
	name: 'Invented device',
	power: { watts: 100 },
	schedule: { type: 'always' },
	...overrides
});

describe('the day itself', () => {
	it('has 96 quarter hours from 0 to 23.75', () => {
		const points = dailyProfile([device({})], weekday);
		expect(points).toHaveLength(96);
		expect(points[0]?.hour).toBe(0);
		expect(points[1]?.hour).toBe(0.25);
		expect(points[95]?.hour).toBe(23.75);
	});

	it('is flat at zero without equipment', () => {
		expect(dailyProfile([], weekday).every((point) => point.kw === 0)).toBe(true);
	});
});

describe('power per unit', () => {
	it.each([
		// 1 A at 120 V, power factor 1: 120 W (issue 3, single-phase rule).
		['amps × volts', { amps: 1, volts: 120 }, 0.12],
		// 2 A at 230 V, power factor 0.5: 230 W.
		['with a power factor', { amps: 2, volts: 230, powerFactor: 0.5 }, 0.23],
		// √3 × 400 V × 10 A × 0.8 ≈ 5542.56 W (balanced three phase, IEEE/handbook formula).
		['three phase', { amps: 10, volts: 400, powerFactor: 0.8, phases: 3 as const }, 5.542562584220407]
	])('reads %s', (_case, power, kw) => {
		expect(kwAt([device({ power })], '12:00')).toBeCloseTo(kw, 9);
	});

	it('multiplies by quantity and duty percent', () => {
		// 3 × 200 W × 50 % = 300 W.
		expect(kwAt([device({ power: { watts: 200 }, quantity: 3, dutyPercent: 50 })], '03:00')).toBeCloseTo(
			0.3,
			12
		);
	});
});

describe('each kind of schedule', () => {
	it('spreads hours a day evenly: 6 h of a 24-hour day is a quarter of the power all day', () => {
		const pump = device({ schedule: { type: 'hours', hoursPerDay: 6 } });
		expect(kwAt([pump], '00:00')).toBeCloseTo(0.025, 12);
		expect(kwAt([pump], '23:45')).toBeCloseTo(0.025, 12);
	});

	it('runs inside windows only, a window past midnight at both ends of the day', () => {
		const light = device({ schedule: { type: 'windows', windows: [{ start: '22:00', end: '06:00' }] } });
		expect([
			kwAt([light], '05:45'),
			kwAt([light], '06:00'),
			kwAt([light], '21:45'),
			kwAt([light], '22:00')
		]).toEqual([0.1, 0, 0, 0.1]);
	});

	it('cycles at on/(on+off) inside its windows', () => {
		const aerator = device({
			schedule: { type: 'cycle', onMinutes: 15, offMinutes: 45, windows: [{ start: '08:00', end: '12:00' }] }
		});
		expect(kwAt([aerator], '09:00')).toBeCloseTo(0.025, 12);
		expect(kwAt([aerator], '13:00')).toBe(0);
	});

	it('spreads triggered runs over their windows: 4 × 30 min in 8 hours is a quarter of the time', () => {
		const filter = device({
			schedule: {
				type: 'runs',
				runsPerDay: 4,
				minutesPerRun: 30,
				windows: [{ start: '08:00', end: '16:00' }]
			}
		});
		expect(kwAt([filter], '10:00')).toBeCloseTo(0.025, 12);
		expect(kwAt([filter], '16:00')).toBe(0);
	});
});

describe('standby, days and months', () => {
	const fountain = device({
		power: { watts: 100 },
		standbyWatts: 4,
		quantity: 2,
		months: [5, 6, 7, 8, 9],
		schedule: { type: 'windows', windows: [{ start: '09:00', end: '17:00' }], days: 'weekdays' }
	});

	it('draws standby × quantity when its schedule has it off', () => {
		expect(kwAt([fountain], '12:00', { dayType: 'weekday', month: 6 })).toBeCloseTo(0.2, 12);
		expect(kwAt([fountain], '20:00', { dayType: 'weekday', month: 6 })).toBeCloseTo(0.008, 12);
	});

	it('keeps standby on the days its schedule skips, as the calculation does', () => {
		expect(kwAt([fountain], '12:00', { dayType: 'weekend', month: 6 })).toBeCloseTo(0.008, 12);
	});

	it('draws nothing outside its months', () => {
		expect(kwAt([fountain], '12:00', { dayType: 'weekday', month: 1 })).toBe(0);
	});

	it('runs an always-on device on weekends too', () => {
		expect(kwAt([device({})], '12:00', weekend)).toBe(0.1);
	});
});

describe('a list being edited', () => {
	it('leaves out a device whose fields need fixing and counts it', () => {
		const broken = device({ power: { watts: -5 } });
		const { layers, skipped } = profileLayers([device({}), broken], weekday);
		expect(skipped).toBe(1);
		expect(totalPoints(layers)[0]?.kw).toBe(0.1);
	});

	it('still draws a device that has no name yet', () => {
		expect(kwAt([device({ name: '' })], '12:00')).toBe(0.1);
	});
});

describe('stacking by category', () => {
	const list = [
		device({ category: 'air-pump', power: { watts: 50 } }),
		device({ category: 'water-pump', power: { watts: 200 } }),
		device({ category: 'water-pump', power: { watts: 100 } })
	];

	it('sums each category and lists them in the categories order', () => {
		const { layers } = profileLayers(list, weekday);
		expect(layers.map((layer) => layer.category)).toEqual(['water-pump', 'air-pump']);
		expect(layers[0]?.kw[0]).toBeCloseTo(0.3, 12);
		expect(layers[1]?.kw[0]).toBeCloseTo(0.05, 12);
	});

	it('puts each band on the one below, so the top is the total', () => {
		const stacked = stackLayers(profileLayers(list, weekday).layers);
		const band = stacked[1]?.bands[0];
		expect(band?.y0).toBeCloseTo(0.3, 12);
		expect(band?.y1).toBeCloseTo(0.35, 12);
		expect(band?.y1).toBe(totalPoints(profileLayers(list, weekday).layers)[0]?.kw);
	});
});

describe('summaries for the table', () => {
	it('gives each clock hour its mean and the day its kWh', () => {
		// 1 kW from 06:00 to 06:30: the 06:00 hour averages 0.5 kW; the day uses 0.5 kWh.
		const heater = device({
			power: { watts: 1000 },
			schedule: { type: 'windows', windows: [{ start: '06:00', end: '06:30' }] }
		});
		const points = dailyProfile([heater], weekday);
		expect(hourlyKw(points)[6]).toEqual({ hour: 6, kw: 0.5 });
		expect(hourlyKw(points)).toHaveLength(24);
		expect(dayKwh(points)).toBe(0.5);
	});
});

describe('any hours-a-day device', () => {
	it('uses running power × hours a day in kWh, never NaN', () => {
		fc.assert(
			fc.property(fc.integer({ min: 0, max: 5000 }), fc.integer({ min: 0, max: 96 }), (watts, quarters) => {
				const hoursPerDay = quarters / 4;
				const points = dailyProfile(
					[device({ power: { watts }, schedule: { type: 'hours', hoursPerDay } })],
					weekday
				);
				expect(points.some((point) => Number.isNaN(point.kw))).toBe(false);
				expect(dayKwh(points)).toBeCloseTo((watts / 1000) * hoursPerDay, 6);
			})
		);
	});
});

describe('the drawn band', () => {
	it('steps along the tops and back along the bottoms', () => {
		const bands = [
			{ hour: 0, y0: 0, y1: 1 },
			{ hour: 0.25, y0: 0, y1: 2 }
		];
		// Identity scales: the path's points are the hours and kW themselves.
		expect(
			stepAreaPath(
				bands,
				(hour) => hour,
				(kw) => kw
			)
		).toBe('M0,1L0.25,1L0.25,2L0.5,2L0.5,0L0.25,0L0.25,0L0,0Z');
	});

	it('draws nothing without bands', () => {
		expect(
			stepAreaPath(
				[],
				(hour) => hour,
				(kw) => kw
			)
		).toBe('');
	});
});
