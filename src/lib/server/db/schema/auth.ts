import { boolean, integer, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';

// The tables @auth/drizzle-adapter expects, with Runrate's own columns on `user`.
// Sessions are JWTs (the credentials provider requires it); the session table exists for the adapter.

export const users = pgTable('user', {
	id: text('id')
		.primaryKey()
		.$defaultFn(() => crypto.randomUUID()),
	name: text('name'),
	email: text('email').notNull().unique(),
	emailVerified: timestamp('emailVerified', { mode: 'date' }),
	image: text('image'),
	passwordHash: text('password_hash'),
	isAdmin: boolean('is_admin').notNull().default(false),
	createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow()
});

export const accounts = pgTable(
	'account',
	{
		userId: text('userId')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		type: text('type').notNull(),
		provider: text('provider').notNull(),
		providerAccountId: text('providerAccountId').notNull(),
		refresh_token: text('refresh_token'),
		access_token: text('access_token'),
		expires_at: integer('expires_at'),
		token_type: text('token_type'),
		scope: text('scope'),
		id_token: text('id_token'),
		session_state: text('session_state')
	},
	(account) => [primaryKey({ columns: [account.provider, account.providerAccountId] })]
);

export const sessions = pgTable('session', {
	sessionToken: text('sessionToken').primaryKey(),
	userId: text('userId')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	expires: timestamp('expires', { mode: 'date' }).notNull()
});

export const verificationTokens = pgTable(
	'verificationToken',
	{
		identifier: text('identifier').notNull(),
		token: text('token').notNull(),
		expires: timestamp('expires', { mode: 'date' }).notNull()
	},
	(vt) => [primaryKey({ columns: [vt.identifier, vt.token] })]
);

/** One-time links Runrate sends itself: address verification after sign-up, and password reset. */
export const userTokens = pgTable('user_token', {
	id: text('id')
		.primaryKey()
		.$defaultFn(() => crypto.randomUUID()),
	userId: text('user_id')
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' }),
	purpose: text('purpose', { enum: ['verify-email', 'reset-password'] }).notNull(),
	tokenHash: text('token_hash').notNull().unique(),
	expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
	usedAt: timestamp('used_at', { mode: 'date' }),
	createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow()
});
