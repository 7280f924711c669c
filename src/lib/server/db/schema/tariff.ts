import { date, index, integer, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { belongsTo, createdAt, updatedAt, uuidId } from './columns';
import type { TariffInput } from '$lib/calc';
import { users } from './auth';
import { workspaces } from './workspace';

export type HolidayRule = { country: string; region?: string } | { dates: string[] } | null;

/**
 * A tariff of the library. `workspaceId` null means public (curated by platform admins); otherwise it is
 * private to that workspace. The charges live in versions; `revision` counts published versions and is
 * the optimistic-concurrency token of the editor.
 */
export const tariffs = pgTable(
	'tariff',
	{
		id: uuidId(),
		workspaceId: uuid('workspace_id').references(() => workspaces.id, { onDelete: 'cascade' }),
		utility: text('utility').notNull(),
		name: text('name').notNull(),
		code: text('code'),
		country: text('country').notNull(),
		region: text('region'),
		area: text('area'),
		customerClass: text('customer_class').notNull(),
		currency: text('currency').notNull(),
		timezone: text('timezone').notNull(),
		holidays: jsonb('holidays').$type<HolidayRule>(),
		description: text('description'),
		copiedFromId: uuid('copied_from_id'),
		/** The open rate database's label of the rate this tariff was imported from (null: typed in). */
		urdbLabel: text('urdb_label'),
		revision: integer('revision').notNull().default(0),
		createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		index('tariff_workspace_idx').on(t.workspaceId),
		index('tariff_country_idx').on(t.country, t.region),
		index('tariff_urdb_label_idx').on(t.urdbLabel)
	]
);

export const tariffVersions = pgTable(
	'tariff_version',
	{
		id: uuidId(),
		tariffId: belongsTo('tariff_id', () => tariffs.id),
		number: integer('number').notNull(),
		effectiveFrom: date('effective_from', { mode: 'string' }).notNull(),
		effectiveTo: date('effective_to', { mode: 'string' }),
		/** The core's Tariff shape, validated by tariffSchema before it is stored. */
		structure: jsonb('structure').$type<TariffInput>().notNull(),
		source: text('source').notNull(),
		checkedOn: date('checked_on', { mode: 'string' }).notNull(),
		changeNote: text('change_note').notNull().default(''),
		publishedBy: text('published_by').references(() => users.id, { onDelete: 'set null' }),
		publishedByName: text('published_by_name'),
		publishedAt: timestamp('published_at', { mode: 'date' }).notNull().defaultNow()
	},
	(v) => [
		unique('tariff_version_number').on(v.tariffId, v.number),
		index('tariff_version_tariff_idx').on(v.tariffId, v.effectiveFrom)
	]
);
