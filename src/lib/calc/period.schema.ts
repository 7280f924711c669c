/** Where and when a calculation runs: its billing periods, time zone and public holidays. */
import { IANAZone } from 'luxon';
import { z } from 'zod';
import { dayNumber, parseIsoDate, parseIsoMonth } from './dates';
import { amount, list, record } from './fields';
import { isKnownCountry, isKnownRegion } from './holiday-codes';

const FIRST_YEAR = 1970;
const LAST_YEAR = 2100;
const MAX_PERIOD_DAYS = 400;

const inRange = (year: number) => year >= FIRST_YEAR && year <= LAST_YEAR;

function isoDateSchema(label: string) {
	return z.string({ error: `${label} must be a date like 2027-01-31` }).superRefine((value, ctx) => {
		const date = parseIsoDate(value);
		if (!date) ctx.addIssue({ code: 'custom', message: `${label} must be a real date like 2027-01-31` });
		else if (!inRange(date.year)) {
			ctx.addIssue({ code: 'custom', message: `${label} must be between ${FIRST_YEAR} and ${LAST_YEAR}` });
		}
	});
}

const billingPeriodSchema = record('Billing period', {
	from: isoDateSchema('From'),
	to: isoDateSchema('To')
}).superRefine((period, ctx) => {
	// Runs even when a date failed its own check; such dates are already reported.
	if (!parseIsoDate(period.from) || !parseIsoDate(period.to)) return;
	const days = dayNumber(period.to) - dayNumber(period.from) + 1;
	if (days < 1) ctx.addIssue({ code: 'custom', path: ['to'], message: 'To must be on or after From' });
	else if (days > MAX_PERIOD_DAYS) {
		ctx.addIssue({
			code: 'custom',
			path: ['to'],
			message: `A billing period can be at most ${MAX_PERIOD_DAYS} days`
		});
	}
});

/** Calendar months from a start month, or explicit billing periods with inclusive dates. */
export const periodSchema = z.union(
	[
		record('Period', {
			start: z.string({ error: 'Start must be a month like 2027-01' }).refine((value) => {
				const month = parseIsoMonth(value);
				return month !== null && inRange(month.year);
			}, `Start must be a month like 2027-01, between ${FIRST_YEAR} and ${LAST_YEAR}`),
			months: amount('Months', { integer: true, min: 1, max: 36 })
		}),
		record('Period', { billingPeriods: list('Billing periods', billingPeriodSchema, { min: 1, max: 36 }) })
	],
	{ error: 'Give the period as a start month and a number of months, or as billing periods' }
);

export type Period = z.output<typeof periodSchema>;

// Luxon builds an Intl.DateTimeFormat to test a name, which costs a third of a millisecond; the names
// found valid are remembered. Intl also accepts any upper/lower-case spelling of a name, so the set
// stops growing at 1,000 entries rather than let odd spellings fill memory.
const knownZones = new Set<string>();
const isZone = (zone: string) => {
	if (knownZones.has(zone)) return true;
	if (!IANAZone.isValidZone(zone)) return false;
	if (knownZones.size < 1000) knownZones.add(zone);
	return true;
};

/** An IANA time zone name, as Luxon (and the platform's Intl) know them. */
export const timezoneSchema = z
	.string({ error: 'Time zone must be an IANA name such as America/Chicago' })
	.refine(isZone, 'Time zone must be an IANA name such as America/Chicago');

const code = (label: string) =>
	z
		.string({ error: `${label} must be a code such as US` })
		.trim()
		.toUpperCase();

/** Public holidays by country (and region) from date-holidays, an explicit list, or none. */
export const holidaysSchema = z
	.union(
		[
			record('Holidays', { country: code('Country'), region: code('Region').optional() }).superRefine(
				(spec, ctx) => {
					if (!isKnownCountry(spec.country)) {
						ctx.addIssue({
							code: 'custom',
							path: ['country'],
							message: `No holiday calendar for country ${spec.country}`
						});
					} else if (spec.region !== undefined && !isKnownRegion(spec.country, spec.region)) {
						ctx.addIssue({
							code: 'custom',
							path: ['region'],
							message: `No holiday calendar for region ${spec.region} of ${spec.country}`
						});
					}
				}
			),
			record('Holidays', { dates: list('Dates', isoDateSchema('Holiday'), { max: 1000 }) })
		],
		{ error: 'Give holidays as a country (and region), as a list of dates, or null' }
	)
	.nullable()
	.default(null);
