import { z } from 'zod';
import { choice, list, record } from './fields';

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;

/** "HH:MM" on the 15-minute grid; "24:00" only where it may end a window. */
function clockTime(label: string, endOfDay: boolean) {
	return z.string({ error: `${label} must be a time like 06:00` }).superRefine((value, ctx) => {
		if (endOfDay && value === '24:00') return;
		const match = CLOCK.exec(value);
		if (!match) {
			ctx.addIssue({ code: 'custom', message: `${label} must be a time like 06:00 (HH:MM, 24-hour clock)` });
		} else if (Number(match[2]) % 15 !== 0) {
			ctx.addIssue({ code: 'custom', message: `${label} must be on a quarter hour (:00, :15, :30 or :45)` });
		}
	});
}

/** A wall-clock window; an end before the start (22:00–06:00) wraps past midnight. */
export const windowSchema = record('Window', {
	start: clockTime('Start', false),
	end: clockTime('End', true)
}).superRefine((window, ctx) => {
	if (window.start === window.end) {
		ctx.addIssue({
			code: 'custom',
			path: ['end'],
			message: 'A window must end at a different time than it starts'
		});
	}
});

export const windowsSchema = list('Windows', windowSchema, { max: 24 });

export const daysSchema = choice('Days', ['all', 'weekdays', 'weekends']);

/** Months 1–12, each once. */
export const monthsSchema = list(
	'Months',
	z
		.number({ error: 'Months must be numbers from 1 to 12' })
		.int({ error: 'Months must be whole numbers from 1 to 12' })
		.min(1, { error: 'Months must be from 1 to 12' })
		.max(12, { error: 'Months must be from 1 to 12' }),
	{ min: 1, max: 12 }
).superRefine((months, ctx) => {
	months.forEach((month, i) => {
		if (months.indexOf(month) !== i) {
			ctx.addIssue({ code: 'custom', path: [i], message: `Month ${month} is listed twice` });
		}
	});
});
