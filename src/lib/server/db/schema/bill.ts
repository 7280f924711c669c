import {
	date,
	doublePrecision,
	index,
	integer,
	jsonb,
	pgTable,
	primaryKey,
	text,
	timestamp
} from 'drizzle-orm/pg-core';
import { belongsTo, createdAt, updatedAt, uuidId } from './columns';
import { users } from './auth';
import { sites } from './site';

export type BillLineItem = { label: string; amount: number };

/** A utility bill of a site as the grower entered it: the period (inclusive dates) and what was billed. */
export const bills = pgTable(
	'bill',
	{
		id: uuidId(),
		siteId: belongsTo('site_id', () => sites.id),
		periodFrom: date('period_from', { mode: 'string' }).notNull(),
		periodTo: date('period_to', { mode: 'string' }).notNull(),
		kwh: doublePrecision('kwh').notNull(),
		amount: doublePrecision('amount').notNull(),
		peakKw: doublePrecision('peak_kw'),
		lineItems: jsonb('line_items').$type<BillLineItem[]>().notNull().default([]),
		notes: text('notes'),
		revision: integer('revision').notNull().default(1),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(b) => [index('bill_site_idx').on(b.siteId, b.periodFrom)]
);

/** A bill's PDF or photo, stored in object storage under a random key; never served by its name. */
export const billAttachments = pgTable(
	'bill_attachment',
	{
		id: uuidId(),
		billId: belongsTo('bill_id', () => bills.id),
		storageKey: text('storage_key').notNull().unique(),
		/** Checked from the bytes, not the name: application/pdf, image/png or image/jpeg. */
		contentType: text('content_type').notNull(),
		bytes: integer('bytes').notNull(),
		/** The uploaded file's name, shown to people only. */
		fileName: text('file_name').notNull(),
		uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt()
	},
	(a) => [index('bill_attachment_bill_idx').on(a.billId)]
);

/** Metered usage of a site: one row per interval (Green Button or a timestamp,kWh sheet). */
export const usageIntervals = pgTable(
	'usage_interval',
	{
		siteId: belongsTo('site_id', () => sites.id),
		start: timestamp('start', { mode: 'date', withTimezone: true }).notNull(),
		seconds: integer('seconds').notNull(),
		kwh: doublePrecision('kwh').notNull()
	},
	(u) => [primaryKey({ columns: [u.siteId, u.start] })]
);
