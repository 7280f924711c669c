import { timestamp, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';

/*
 * Columns many tables declare the same way. Each helper builds a fresh column (a builder belongs to one
 * table); the SQL they stand for is the same as written out, so no migration follows from using them.
 */

/** A row id the database draws at random. */
export const uuidId = () => uuid('id').primaryKey().defaultRandom();

/** When the row was written. */
export const createdAt = () => timestamp('created_at', { mode: 'date' }).notNull().defaultNow();

/** When the row last changed (the services set it on every update). */
export const updatedAt = () => timestamp('updated_at', { mode: 'date' }).notNull().defaultNow();

/** A required link to the row this one belongs to; it goes when its parent does. */
export const belongsTo = (name: string, parent: () => AnyPgColumn) =>
	uuid(name).notNull().references(parent, { onDelete: 'cascade' });
