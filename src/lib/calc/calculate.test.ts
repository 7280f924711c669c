import { describe, expect, it } from 'vitest';
import { device, flatTariff, line, onlyPeriod, run, sumOfLines } from './requests.fixture';

describe('trade rules of thumb (common practice, no source)', () => {
	const amps = (current: number) =>
		device({ power: { amps: current, volts: 120 }, schedule: { type: 'always' } });

	it('costs about 29.4 a month for a 1 A load at 120 V running all of June at 0.34 per kWh', () => {
		const period = onlyPeriod({ tariff: flatTariff(0.34), equipment: [amps(1)] });
		expect(period.kwh).toBeCloseTo(0.12 * 720, 9);
		expect(period.total).toBeCloseTo(29.4, 1);
	});

	it('costs twelve times as much for twelve times the current', () => {
		const one = onlyPeriod({ tariff: flatTariff(0.34), equipment: [amps(1)] }).total;
		const twelve = onlyPeriod({ tariff: flatTariff(0.34), equipment: [amps(12)] }).total;
		expect(Math.abs(twelve - 12 * one)).toBeLessThanOrEqual(0.06);
		expect(twelve).toBe(352.51);
	});
});

describe('calendar months', () => {
	it('reports each month with its dates, days and local hours', () => {
		const result = run({ period: { start: '2027-02', months: 2 }, timezone: 'America/Chicago' });
		expect(
			result.periods.map(({ label, from, to, days, hours }) => ({ label, from, to, days, hours }))
		).toEqual([
			{ label: '2027-02', from: '2027-02-01', to: '2027-02-28', days: 28, hours: 672 },
			{ label: '2027-03', from: '2027-03-01', to: '2027-03-31', days: 31, hours: 743 }
		]);
	});

	it('gives an always-on device one kWh per kW for each real hour, 23-hour day included', () => {
		const period = onlyPeriod({ period: { start: '2027-03', months: 1 }, timezone: 'America/Chicago' });
		expect(period.kwh).toBeCloseTo(743, 9);
	});

	it('wraps into the next year', () => {
		const result = run({ period: { start: '2027-11', months: 3 } });
		expect(result.periods.map((period) => period.label)).toEqual(['2027-11', '2027-12', '2028-01']);
	});
});

describe('billing periods', () => {
	const tariff = flatTariff(0.1, {
		fixedCharges: [
			{ label: 'Customer charge', perMonth: 12.5 },
			{ label: 'Basic', perDay: 0.45 }
		]
	});

	it('counts both end dates', () => {
		const period = onlyPeriod({
			period: { billingPeriods: [{ from: '2027-01-12', to: '2027-02-10' }] },
			tariff
		});
		expect(period.label).toBe('2027-01-12/2027-02-10');
		expect(period.days).toBe(30);
		expect(period.hours).toBe(720);
		expect(line(period, 'fixed', 'Basic')).toBe(13.5);
	});

	it('charges perMonth once in each billing period', () => {
		const result = run({
			period: {
				billingPeriods: [
					{ from: '2027-01-12', to: '2027-02-10' },
					{ from: '2027-02-11', to: '2027-03-12' }
				]
			},
			tariff
		});
		expect(result.periods.map((period) => line(period, 'fixed', 'Customer charge'))).toEqual([12.5, 12.5]);
	});
});

describe('standby, duty and months', () => {
	it('draws standby power while the schedule has a device off', () => {
		const period = onlyPeriod({
			equipment: [
				device({
					power: { watts: 1000 },
					standbyWatts: 10,
					schedule: { type: 'windows', windows: [{ start: '06:00', end: '18:00' }] }
				})
			]
		});
		expect(period.kwh).toBeCloseTo(30 * (12 * 1 + 12 * 0.01), 9);
	});

	it('scales running power by duty percent', () => {
		expect(onlyPeriod({ equipment: [device({ dutyPercent: 25 })] }).kwh).toBeCloseTo(180, 9);
	});

	it('draws nothing outside its months, standby included', () => {
		const period = onlyPeriod({ equipment: [device({ standbyWatts: 5, months: [1] })] });
		expect(period.kwh).toBe(0);
	});
});

describe('the response', () => {
	it('totals kWh, cost and peak over the periods', () => {
		const result = run({
			period: { start: '2027-01', months: 3 },
			tariff: flatTariff(0.1, { taxes: [{ label: 'Tax', percent: 7 }] })
		});
		expect(result.currency).toBe('USD');
		expect(result.totals.kwh).toBeCloseTo(24 * (31 + 28 + 31), 9);
		expect(result.totals.cost).toBeCloseTo(
			result.periods.reduce((sum, period) => sum + period.total, 0),
			9
		);
		expect(result.totals.peakKw).toBe(1);
		for (const period of result.periods) expect(period.total).toBeCloseTo(sumOfLines(period), 9);
	});

	it('answers with only fixed charges when there is no equipment', () => {
		const period = onlyPeriod({
			equipment: [],
			tariff: flatTariff(0.1, { fixedCharges: [{ label: 'Customer charge', perMonth: 9 }] })
		});
		expect(period.kwh).toBe(0);
		expect(period.total).toBe(9);
		expect(period.sharedCost).toBe(9);
	});
});
