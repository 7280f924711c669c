import { z } from 'zod';
import { parseIsoDate } from './dates';
import { record } from './fields';

/** Five years of 15-minute values and a little over: the most one request may price. */
export const MAX_METER_VALUES = 180_000;
const MAX_KWH_PER_INTERVAL = 1_000_000;
const PROBLEMS_SHOWN = 10;

/**
 * The values of a meter series: each a kWh figure from 0 up. Checked in one plain loop (a year of
 * 15-minute data is 35,040 values) that stops after a few problems; a gap (null, blank, text) is named
 * by its place in the series so the person can find it.
 */
const meterValues = z
	.array(z.unknown(), { error: 'Meter kWh must be a list of numbers, one per interval' })
	.min(1, { error: 'Meter kWh must not be empty' })
	.max(MAX_METER_VALUES, {
		error: `Meter kWh can hold at most ${MAX_METER_VALUES.toLocaleString('en-US')} values`
	})
	.transform((values, ctx) => {
		let problems = 0;
		for (let i = 0; i < values.length && problems < PROBLEMS_SHOWN; i++) {
			const value = values[i];
			let message: string | null = null;
			if (typeof value !== 'number' || !Number.isFinite(value)) {
				message = `Meter value number ${(i + 1).toLocaleString('en-US')} is missing or not a number (a gap in the series)`;
			} else if (value < 0) {
				message = `Meter value number ${(i + 1).toLocaleString('en-US')} is below zero`;
			} else if (value > MAX_KWH_PER_INTERVAL) {
				message = `Meter value number ${(i + 1).toLocaleString('en-US')} is over ${MAX_KWH_PER_INTERVAL.toLocaleString('en-US')} kWh`;
			}
			if (message) {
				problems++;
				ctx.addIssue({ code: 'custom', path: [i], message });
			}
		}
		return values as number[];
	});

/** A meter's measured use (POST /api/v1/calculate `meter`): kWh per real interval from a local start. */
export const meterSchema = record('Meter', {
	start: z
		.string({ error: 'Meter start must be a local time like 2027-01-01T00:00' })
		.refine(
			(value) =>
				/^\d{4}-\d{2}-\d{2}T([01]\d|2[0-3]):[0-5]\d$/.test(value) &&
				parseIsoDate(value.slice(0, 10)) !== null,
			{ error: 'Meter start must be a local time like 2027-01-01T00:00' }
		),
	intervalMinutes: z.literal([15, 30, 60], { error: 'Meter interval minutes must be 15, 30 or 60' }),
	kwh: meterValues
});

export type Meter = z.output<typeof meterSchema>;
