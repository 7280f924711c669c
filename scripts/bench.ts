/**
 * Benchmark of the calculation core (`npm run bench`): medians of calculate() for 100 and 1,000
 * devices and of a 5-scenario compare() over 12 months on the tariff of `bench/requests.ts`; then a year of 15-minute meter readings (35,040 values) on a tiered
 * time-of-use tariff with ratcheted demand, alone and on 30 tariffs in turn (the "which tariff" page's
 * work). All data is invented ("Demo Valley Power" is fictional).
 * With BENCH_URL set (e.g. http://localhost:5173), it also times POST ${BENCH_URL}/api/v1/calculate.
 * Last, the growth curves (`bench/series.ts`): calculate() by devices and by months, compare() by
 * scenarios and the comparison workbook by scenarios × devices, each with the ratio of step to step.
 */
import {
	type TariffInput,
	calculate,
	calculateRequestSchema,
	compare,
	compareRequestSchema,
	tariffSchema
} from '../src/lib/calc/index';
import { median } from './bench/growth';
import { calculation, comparison, random, tariff } from './bench/requests';
import { growthCurves } from './bench/series';

const WARM_UP = 10;
const ITERATIONS = 50;

/** Medians after a warm-up; a run may report its own duration (to leave out waits it had to make). */
async function time(label: string, run: () => unknown | Promise<unknown>, warmUp = WARM_UP): Promise<void> {
	for (let i = 0; i < warmUp; i++) await run();
	const samples: number[] = [];
	for (let i = 0; i < ITERATIONS; i++) {
		const start = performance.now();
		const reported = await run();
		samples.push(typeof reported === 'number' ? reported : performance.now() - start);
	}
	console.log(`${label.padEnd(48)} median ${median(samples).toFixed(2)} ms (n=${ITERATIONS})`);
}

/** One POST, timed; a 429 from the rate limiter is waited out and the request sent again. */
async function post(url: string, body: string): Promise<number> {
	for (;;) {
		const start = performance.now();
		const response = await fetch(url, {
			method: 'POST',
			headers: { 'content-type': 'application/json' },
			body
		});
		if (response.status === 429) {
			const seconds = Number(response.headers.get('retry-after') ?? 60);
			console.log(`  rate limited: waiting ${seconds} s (not timed)`);
			await new Promise((resolve) => setTimeout(resolve, seconds * 1000));
			continue;
		}
		if (!response.ok) throw new Error(`HTTP ${response.status}: ${await response.text()}`);
		await response.json();
		return performance.now() - start;
	}
}

const small = calculateRequestSchema.parse(calculation(100));
const large = calculateRequestSchema.parse(calculation(1000));
const scenarios = compareRequestSchema.parse(comparison());
const export6x200 = compareRequestSchema.parse(comparison(6, 200));

// The very first call also loads the holiday data and compiles the code; later calls reuse both.
const coldStart = performance.now();
calculate(small);
console.log(
	`${'first calculate() in this process (cold)'.padEnd(48)} ${(performance.now() - coldStart).toFixed(2)} ms`
);

await time('calculate(), 100 devices, 12 months', () => calculate(small));
await time('calculate(), 1,000 devices, 12 months', () => calculate(large));
await time('compare(), 5 scenarios × 100 devices', () => compare(scenarios));
await time('compare(), 6 scenarios × 200 devices (the export size)', () => compare(export6x200));
await time('parse + calculate(), 100 devices', () =>
	calculate(calculateRequestSchema.parse(calculation(100)))
);

// A year of 15-minute meter data (35,040 values, 2027 in UTC) on a tiered time-of-use tariff with a
// ratcheted whole-month demand charge: the size the "which tariff" comparison prices per tariff.
const next = random(7);
const meterTariff: TariffInput = {
	currency: 'USD',
	holidaysAsWeekends: false,
	energyCharges: [
		{
			label: 'Energy',
			type: 'tou',
			seasons: [
				{
					months: [6, 7, 8, 9],
					tierLimitsKwh: [1000],
					periods: [
						{
							label: 'On-peak',
							perKwh: 0.3,
							abovePerKwh: [0.36],
							days: 'weekdays',
							windows: [{ start: '14:00', end: '19:00' }]
						}
					],
					otherPerKwh: 0.1,
					otherAbovePerKwh: [0.13]
				},
				{
					months: [1, 2, 3, 4, 5, 10, 11, 12],
					tierLimitsKwh: [800],
					periods: [],
					otherPerKwh: 0.11,
					otherAbovePerKwh: [0.14]
				}
			]
		}
	],
	demandCharges: [
		{
			label: 'Demand',
			tiers: [
				{ uptoKw: 50, perKw: 8 },
				{ uptoKw: null, perKw: 11 }
			],
			ratchet: { percent: 80, monthsBack: 11 }
		}
	]
};
const metered = calculateRequestSchema.parse({
	period: { start: '2027-01', months: 12 },
	timezone: 'UTC',
	holidays: null,
	tariff: meterTariff,
	equipment: [],
	meter: {
		start: '2027-01-01T00:00',
		intervalMinutes: 15,
		kwh: Array.from({ length: 35_040 }, () => next() * 3)
	}
});
await time('calculate(), 35,040 meter values, tiered TOU + demand', () => calculate(metered));

// The "which tariff" page's work: the same year priced on 30 tariffs in turn (a third each of the tiered
// time-of-use tariff with demand above, the seasonal tariff of the device cases, and a flat rate), as
// `rankTariffs` does once the meter series is validated. The page adds two small queries and one read
// of the year's rows (timed in the issue note through the running app).
const flatTariff = tariffSchema.parse({
	currency: 'USD',
	fixedCharges: [{ label: 'Demo Valley Power basic charge', perMonth: 12 }],
	energyCharges: [{ label: 'Energy', type: 'flat', perKwh: 0.14 }]
});
const thirty = Array.from({ length: 30 }, (_, i) =>
	tariffSchema.parse([meterTariff, tariff, flatTariff][i % 3])
);
await time(
	'which tariff: 30 tariffs × 35,040 meter values',
	() => thirty.map((one) => calculate({ ...metered, tariff: one })),
	2
);

const url = process.env.BENCH_URL;
if (url) {
	const body = JSON.stringify(calculation(100));
	const endpoint = `${url.replace(/\/$/, '')}/api/v1/calculate`;
	await time(`POST /api/v1/calculate, 100 devices`, () => post(endpoint, body), 3);
} else {
	console.log('BENCH_URL not set: skipping the HTTP endpoint.');
}

await growthCurves();
