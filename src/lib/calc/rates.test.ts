import Holidays from 'date-holidays';
import { describe, expect, it } from 'vitest';
import { dayNumber, isWeekend } from './dates';
import { type ScheduleInput, device, line, onlyPeriod } from './requests.fixture';
import type { TariffInput } from './tariff.schema';
import { buildCalendar } from './calendar';
import { billingSpans } from './periods';
import { RateBook } from './rates';
import { tariffSchema } from './tariff.schema';
import { tiered, tieredTouSeason, tou, touPeriod, usdTariff } from './tariffs.fixture';

/** Invented "Demo Valley Power" time-of-use supply: summer on-peak weekdays, a night rate past midnight. */
function touTariff(more: Partial<TariffInput> = {}): TariffInput {
	return {
		currency: 'USD',
		energyCharges: [
			tou(
				'Supply',
				{
					months: [6, 7, 8, 9],
					periods: [
						touPeriod('On-peak', 0.3, 'weekdays', '16:00', '21:00'),
						touPeriod('Night', 0.05, 'all', '22:00', '06:00')
					],
					otherPerKwh: 0.1
				},
				{ months: [1, 2, 3, 4, 5, 10, 11, 12], periods: [], otherPerKwh: 0.08 }
			)
		],
		...more
	};
}

const july = { start: '2027-07', months: 1 };
const kilowatt = (schedule: ScheduleInput, more: object = {}) =>
	device({ power: { watts: 1000 }, schedule, ...more });
const windows = (
	start: string,
	end: string,
	days: 'all' | 'weekdays' | 'weekends' = 'all'
): ScheduleInput => ({
	type: 'windows',
	windows: [{ start, end }],
	days
});

describe('a time-of-use charge', () => {
	// July 2027 (UTC): 22 weekdays and 9 weekend days, 744 hours.
	it('prices each interval at its season’s first matching period, otherwise the other rate', () => {
		const period = onlyPeriod({
			period: july,
			tariff: touTariff(),
			equipment: [kilowatt({ type: 'always' })]
		});
		const onPeak = 22 * 5 * 0.3;
		const night = 31 * 8 * 0.05;
		const other = (744 - 22 * 5 - 31 * 8) * 0.1;
		expect(line(period, 'energy', 'Supply')).toBe(Math.round((onPeak + night + other) * 100) / 100);
	});

	it('prices a window crossing midnight at both ends of the day', () => {
		const period = onlyPeriod({
			period: july,
			tariff: touTariff(),
			equipment: [kilowatt(windows('23:00', '01:00'))]
		});
		expect(line(period, 'energy')).toBe(3.1); // 31 days × 2 kWh × 0.05
	});

	it('prices weekends at the other rate when a period is for weekdays', () => {
		const period = onlyPeriod({
			period: july,
			tariff: touTariff(),
			equipment: [kilowatt(windows('16:00', '21:00', 'weekends'))]
		});
		expect(line(period, 'energy')).toBe(4.5); // 9 weekend days × 5 kWh × 0.10
	});

	it('uses the season of each month', () => {
		const period = onlyPeriod({
			period: { start: '2027-01', months: 1 },
			tariff: touTariff(),
			equipment: [kilowatt({ type: 'always' })]
		});
		expect(line(period, 'energy')).toBe(59.52); // 744 kWh × 0.08
	});
});

describe('a time-of-use charge in some months only', () => {
	// Invented "Demo Valley Power" summer peak adder: $0.05 per kWh on weekdays 16:00–21:00, June–September
	// only, and nothing at other hours; no dummy all-zero season for October–May.
	const summerAdder = (): TariffInput => ({
		currency: 'USD',
		energyCharges: [
			{ label: 'Energy', type: 'flat', perKwh: 0.1 },
			{
				...tou('Summer peak adder', {
					months: [6, 7, 8, 9],
					periods: [touPeriod('On-peak', 0.05, 'weekdays', '16:00', '21:00')],
					otherPerKwh: 0
				}),
				months: [6, 7, 8, 9]
			}
		]
	});

	it('charges the adder in its months: July 2027 by hand', () => {
		const period = onlyPeriod({
			period: july,
			tariff: summerAdder(),
			equipment: [kilowatt({ type: 'always' })]
		});
		// Hand-checked: July 2027 has 22 weekdays (UTC); 22 × 5 h × 1 kW × $0.05 = $5.50; 744 kWh × $0.10 = $74.40.
		expect(line(period, 'energy', 'Summer peak adder')).toBe(5.5);
		expect(line(period, 'energy', 'Energy')).toBe(74.4);
	});

	it('charges nothing for it in a month it does not apply', () => {
		const period = onlyPeriod({
			period: { start: '2027-01', months: 1 },
			tariff: summerAdder(),
			equipment: [kilowatt({ type: 'always' })]
		});
		const adder = period.charges.find((charge) => charge.label === 'Summer peak adder');
		expect(adder?.amount ?? 0).toBe(0);
		expect(line(period, 'energy', 'Energy')).toBe(74.4); // 744 kWh × $0.10
	});
});

describe('public holidays', () => {
	// The observed Independence Day of 2027 as date-holidays lists it (a substitute public holiday in July).
	const observed = new Holidays('US')
		.getHolidays(2027)
		.find((holiday) => holiday.type === 'public' && holiday.substitute && holiday.date.startsWith('2027-07'));
	const date = observed?.date.slice(0, 10) ?? 'missing';
	const holidayRequest = (holidaysAsWeekends: boolean, days: 'all' | 'weekdays' = 'all') => ({
		period: { billingPeriods: [{ from: date, to: date }] },
		timezone: 'America/Chicago',
		holidays: { country: 'US' },
		tariff: touTariff({ holidaysAsWeekends }),
		equipment: [kilowatt(windows('16:00', '21:00', days))]
	});

	it('falls on a weekday in 2027, so the holiday rule is what prices it', () => {
		expect(isWeekend(dayNumber(date))).toBe(false);
	});

	it('prices a holiday like a weekend (off-peak) when the tariff says so', () => {
		expect(line(onlyPeriod(holidayRequest(true)), 'energy')).toBe(0.5); // 5 kWh × 0.10
	});

	it('prices a holiday as a weekday otherwise', () => {
		expect(line(onlyPeriod(holidayRequest(false)), 'energy')).toBe(1.5); // 5 kWh × 0.30
	});

	it('treats a holiday as an ordinary day for equipment', () => {
		expect(onlyPeriod(holidayRequest(true, 'weekdays')).kwh).toBeCloseTo(5, 12);
	});
});

describe('the columns of energy charges', () => {
	it("finds each charge's first column, a tiered time-of-use charge taking one per season and slot", () => {
		const tariff = tariffSchema.parse(
			usdTariff({
				energyCharges: [
					tiered('Delivery', [500, 0.1], [null, 0.12]),
					tou('Supply', tieredTouSeason([6, 7, 8, 9]), {
						months: [1, 2, 3, 4, 5, 10, 11, 12],
						tierLimitsKwh: [500],
						periods: [],
						otherPerKwh: 0.08,
						otherAbovePerKwh: [0.09]
					}),
					{ label: 'Energy', type: 'flat', perKwh: 0.02 }
				]
			})
		);
		const rates = new RateBook(
			tariff,
			buildCalendar('UTC', null, billingSpans({ start: '2027-06', months: 1 }))
		);
		// Delivery: column 0; Supply: summer peak, summer other, winter other (1–3); Energy: column 4.
		expect(rates.columns).toHaveLength(5);
		expect([0, 1, 2, 3].map((e) => rates.firstColumn(e))).toEqual([0, 1, 4, -1]);
	});
});
