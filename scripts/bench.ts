/**
 * Benchmark of the calculation core (`npm run bench`): medians of calculate() for 100 and 1,000
 * devices and of a 5-scenario compare() over 12 months on a tariff with time-of-use seasons, tiers,
 * demand, riders and taxes; then a year of 15-minute meter readings (35,040 values) on a tiered
 * time-of-use tariff with ratcheted demand, alone and on 30 tariffs in turn (the "which tariff" page's
 * work). All data is invented ("Demo Valley Power" is fictional).
 * With BENCH_URL set (e.g. http://localhost:5173), it also times POST ${BENCH_URL}/api/v1/calculate.
 * Last, the growth curves (`bench/growth.ts`): calculate() by devices and by months, compare() by
 * scenarios and the comparison workbook by scenarios × devices, each with the ratio of step to step.
 */
import {
	type CalculateRequestInput,
	type CompareRequestInput,
	type EquipmentInput,
	type TariffInput,
	calculate,
	calculateRequestSchema,
	compare,
	compareRequestSchema,
	tariffSchema
} from '../src/lib/calc/index';
import { tiered, tou, touPeriod } from '../src/lib/calc/tariffs.fixture';
import { growth, median, workbookModules } from './bench/growth';

const WARM_UP = 10;
const ITERATIONS = 50;

/** A small deterministic generator (mulberry32), so every run measures the same requests. */
function random(seed: number): () => number {
	let state = seed;
	return () => {
		state = (state + 0x6d2b79f5) | 0;
		let t = Math.imul(state ^ (state >>> 15), 1 | state);
		t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

const pad = (hour: number) => `${String(hour).padStart(2, '0')}:00`;

const tariff: TariffInput = {
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
function equipment(count: number, seed: number): EquipmentInput[] {
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

function calculation(devices: number, seed = 1, months = 12): CalculateRequestInput {
	return {
		period: { start: '2027-01', months },
		timezone: 'America/Chicago',
		holidays: { country: 'US', region: 'TX' },
		tariff,
		equipment: equipment(devices, seed)
	};
}

function comparison(count = 5, devices = 100): CompareRequestInput {
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

// Growth curves: the same work at growing sizes. Requests are parsed before timing; fewer runs for the
// big sizes keep the whole bench within about three minutes on a 2-core machine.
// The two largest sizes lie past what a request may ask (2,000 devices, 36 months): they are parsed
// within those limits, 2,000 devices at a time, and then widened, to time the core beyond them.
function parsed(devices: number, months = 12) {
	const all = equipment(devices, 1);
	const chunks = Array.from({ length: Math.max(1, Math.ceil(devices / 2000)) }, (_, i) =>
		calculateRequestSchema.parse({
			...calculation(0, 1, Math.min(months, 36)),
			equipment: all.slice(i * 2000, (i + 1) * 2000)
		})
	);
	const [first] = chunks;
	if (!first || !('months' in first.period)) throw new Error('The bench request did not parse');
	return {
		...first,
		period: { ...first.period, months },
		equipment: chunks.flatMap((chunk) => chunk.equipment)
	};
}
const byDevices = [10, 100, 1000, 10_000].map((devices) => ({ devices, request: parsed(devices) }));
await growth(
	'Growth: calculate() by devices (12 months)',
	byDevices.map(({ devices, request }) => ({
		label: `${devices.toLocaleString('en-US')} devices`,
		size: devices,
		run: () => calculate(request),
		n: devices >= 10_000 ? 10 : devices >= 1000 ? 20 : 50,
		warmUp: devices >= 10_000 ? 2 : 10
	}))
);
const byMonths = [1, 12, 60].map((months) => ({ months, request: parsed(100, months) }));
await growth(
	'Growth: calculate() by months (100 devices)',
	byMonths.map(({ months, request }) => ({
		label: `${months} month${months === 1 ? '' : 's'}`,
		size: months,
		run: () => calculate(request),
		n: 30,
		warmUp: 5
	}))
);
const byScenarios = [2, 6].map((count) => ({
	count,
	request: compareRequestSchema.parse(comparison(count))
}));
await growth(
	'Growth: compare() by scenarios (100 devices each, 12 months)',
	byScenarios.map(({ count, request }) => ({
		label: `${count} scenarios`,
		size: count,
		run: () => compare(request),
		n: 30,
		warmUp: 5
	}))
);
// The workbook alone: the comparison it carries is computed once, before timing, as the route does
// before it builds the file.
const { comparisonWorkbook, exportOf } = await workbookModules();
const workbooks = [
	[2, 30],
	[6, 200]
].map(([count = 0, devices = 0]) => ({
	count,
	devices,
	input: exportOf(comparison(count, devices), 'Bench comparison (invented)')
}));
await growth(
	'Growth: the comparison workbook by scenarios × devices (12 months)',
	workbooks.map(({ count, devices, input }) => ({
		label: `${count} × ${devices} devices`,
		size: count * devices,
		run: () => comparisonWorkbook(input),
		n: count * devices > 100 ? 5 : 20,
		warmUp: 2
	}))
);
