import { z } from 'zod';
import { storableText, UNSTORABLE } from './storable';

/** A bill as its form, its sheet rows and the API take it. Dates are the bill's inclusive period. */
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
const MAX_PERIOD_DAYS = 100;

const isoDate = (label: string) =>
	z
		.string({ error: `${label} is required` })
		.trim()
		.regex(ISO_DATE, `${label} must be a date such as 2026-01-31`)
		.refine(
			(s) =>
				!Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
			`${label} is not a real date`
		)
		// The calendar has no year 0 (PostgreSQL refuses it), though JavaScript's dates accept it.
		.refine((s) => !s.startsWith('0000'), `${label} is not a real date`);

const number = (label: string, min: number, max: number) =>
	z.coerce
		.number({ error: `${label} must be a number` })
		.refine((n) => Number.isFinite(n), `${label} must be a number`)
		.refine(
			(n) => n >= min && n <= max,
			`${label} must be from ${min.toLocaleString('en-US')} to ${max.toLocaleString('en-US')}`
		);

const blankToNull = (v: unknown) => (v === '' || v === undefined ? null : v);

export const lineItemSchema = z.object({
	label: z
		.string()
		.trim()
		.min(1, 'Name the line as the bill prints it')
		.max(120, 'Use at most 120 characters')
		.refine(storableText, UNSTORABLE),
	amount: number('Line amount', -1_000_000, 1_000_000)
});

export const billSchema = z
	.object({
		periodFrom: isoDate('First day'),
		periodTo: isoDate('Last day'),
		kwh: number('kWh billed', 0, 100_000_000),
		amount: number('Amount billed', -10_000_000, 10_000_000),
		peakKw: z.preprocess(blankToNull, number('Peak kW', 0, 1_000_000).nullable()).default(null),
		lineItems: z.array(lineItemSchema).max(50, 'At most 50 line items').default([]),
		notes: z
			.preprocess(
				blankToNull,
				z
					.string()
					.trim()
					.max(2000, 'Notes must be at most 2000 characters')
					.refine(storableText, UNSTORABLE)
					.nullable()
			)
			.default(null)
	})
	.superRefine((bill, ctx) => {
		if (bill.periodTo < bill.periodFrom) {
			ctx.addIssue({
				code: 'custom',
				path: ['periodTo'],
				message: 'The last day must not be before the first day'
			});
			return;
		}
		const days = (Date.parse(bill.periodTo) - Date.parse(bill.periodFrom)) / 86_400_000 + 1;
		if (days > MAX_PERIOD_DAYS) {
			ctx.addIssue({
				code: 'custom',
				path: ['periodTo'],
				message: `A billing period is at most ${MAX_PERIOD_DAYS} days; this one is ${days}`
			});
		}
	});

export type BillInput = z.output<typeof billSchema>;

/** Days in an inclusive period of ISO dates. */
export const periodDays = (from: string, to: string) => (Date.parse(to) - Date.parse(from)) / 86_400_000 + 1;
