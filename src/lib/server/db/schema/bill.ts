import {
	date,
	doublePrecision,
	index,
	integer,
	jsonb,
	pgTable,
	primaryKey,
	text,
	timestamp,
	uuid
} from 'drizzle-orm/pg-core';
import { users } from './auth';
import { sites } from './site';

export type BillLineItem = { label: string; amount: number };

/** A utility bill of a site as the grower entered it: the period (inclusive dates) and what was billed. */
export const bills = pgTable(
	'bill',
	{
		id: uuid('id').primaryKey().defaultRandom(),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id, { onDelete: 'cascade' }),
		periodFrom: date('period_from', { mode: 'string' }).notNull(),
		periodTo: date('period_to', { mode: 'string' }).notNull(),
		kwh: doublePrecision('kwh').notNull(),
		amount: doublePrecision('amount').notNull(),
		peakKw: doublePrecision('peak_kw'),
		lineItems: jsonb('line_items').$type<BillLineItem[]>().notNull().default([]),
		notes: text('notes'),
		revision: integer('revision').notNull().default(1),
		createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow(),
		updatedAt: timestamp('updated_at', { mode: 'date' }).notNull().defaultNow()
	},
	(b) => [index('bill_site_idx').on(b.siteId, b.periodFrom)]
);

/** A bill's PDF or photo, stored in object storage under a random key; never served by its name. */
export const billAttachments = pgTable(
	'bill_attachment',
	{
		id: uuid('id').primaryKey().defaultRandom(),
		billId: uuid('bill_id')
			.notNull()
			.references(() => bills.id, { onDelete: 'cascade' }),
		storageKey: text('storage_key').notNull().unique(),
		/** Checked from the bytes, not the name: application/pdf, image/png or image/jpeg. */
		contentType: text('content_type').notNull(),
		bytes: integer('bytes').notNull(),
		/** The uploaded file's name, shown to people only. */
		fileName: text('file_name').notNull(),
		uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow()
	},
	(a) => [index('bill_attachment_bill_idx').on(a.billId)]
);

/** Metered usage of a site: one row per interval (Green Button or a timestamp,kWh sheet). */
export const usageIntervals = pgTable(
	'usage_interval',
	{
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id, { onDelete: 'cascade' }),
		start: timestamp('start', { mode: 'date', withTimezone: true }).notNull(),
		seconds: integer('seconds').notNull(),
		kwh: doublePrecision('kwh').notNull()
	},
	(u) => [primaryKey({ columns: [u.siteId, u.start] })]
);
