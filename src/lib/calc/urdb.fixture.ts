import { readFileSync } from 'node:fs';
import { calculate } from './calculate';
import { calculateRequestSchema } from './request.schema';
import { urdbRateSchema } from './urdb.schema';

/** A sample rate of the open rate database (a public record; see tests/fixtures/urdb/README.md). */
export function sample(name: string) {
	const json = JSON.parse(
		readFileSync(new URL(`../../../tests/fixtures/urdb/${name}`, import.meta.url), 'utf8')
	);
	return urdbRateSchema.parse(json.items?.[0] ?? json);
}

/** A 12 × 24 grid holding one period everywhere, or `at(month 1–12, hour)`. */
export const grid = (at: number | ((month: number, hour: number) => number)) =>
	Array.from({ length: 12 }, (_, m) =>
		Array.from({ length: 24 }, (_, h) => (typeof at === 'number' ? at : at(m + 1, h)))
	);

/** An invented URDB rate of one flat energy period plus the given fields, checked by the URDB schema. */
export const rate = (fields: Record<string, unknown>) =>
	urdbRateSchema.parse({
		energyratestructure: [[{ rate: 0.1 }]],
		energyweekdayschedule: grid(0),
		energyweekendschedule: grid(0),
		...fields
	});

/**
 * A steady load priced on a tariff over `months` from `start`, in UTC with no holidays (as NREL's engines
 * price), with the bill's periods for their lines.
 */
export function steady(tariff: unknown, kw: number, start: string, months = 12) {
	const request = calculateRequestSchema.parse({
		period: { start, months },
		timezone: 'UTC',
		holidays: null,
		tariff,
		equipment: [{ name: 'Steady load', power: { watts: kw * 1000 }, schedule: { type: 'always' } }]
	});
	return calculate(request).periods;
}

/** The sum of one kind of line over the periods. */
export const total = (periods: ReturnType<typeof steady>, kind: string) =>
	periods
		.flatMap((p) => p.charges)
		.filter((c) => c.kind === kind)
		.reduce((sum, c) => sum + c.amount, 0);
