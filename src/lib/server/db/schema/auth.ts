import { boolean, index, integer, jsonb, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';

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

/** A required link to the user a row belongs to; it goes when the account does. */
export const belongsToUser = (name: string) =>
	text(name)
		.notNull()
		.references(() => users.id, { onDelete: 'cascade' });

export const accounts = pgTable(
	'account',
	{
		userId: belongsToUser('userId'),
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
	userId: belongsToUser('userId'),
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

/**
 * One-time links Runrate sends itself: address verification after sign-up, and password reset.
 *
 * A sign-up's name and password wait on its `verify-email` row (`name`, `password_hash`) rather than on the
 * user: until someone proves the address *and* knows that password, nobody may sign in with it. An
 * unconfirmed user row therefore never has a password (see accounts/sign-up.ts, "pending sign-ups").
 */
export const userTokens = pgTable('user_token', {
	id: text('id')
		.primaryKey()
		.$defaultFn(() => crypto.randomUUID()),
	userId: belongsToUser('user_id'),
	purpose: text('purpose', { enum: ['verify-email', 'reset-password'] }).notNull(),
	tokenHash: text('token_hash').notNull().unique(),
	expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
	usedAt: timestamp('used_at', { mode: 'date' }),
	createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow(),
	/** The name a sign-up chose; applied when its link is confirmed with its password. */
	name: text('name'),
	/** The bcrypt hash of the password a sign-up chose; pending until confirmed. */
	passwordHash: text('password_hash'),
	/**
	 * The home page's quick estimate a sign-up carried (accounts/kept-estimate.ts: checked with the core's
	 * schemas and size-capped before it is stored, and again when read); it becomes the account's first
	 * site when the sign-up is confirmed.
	 */
	estimate: jsonb('estimate').$type<unknown>()
});

/**
 * Every signed-in session: the session JWT carries this row's id (`sid`), and a request is signed in only
 * while its row is live (not revoked, not expired). Sign-out revokes one row; "sign out everywhere" and a
 * password reset revoke all of a user's rows, at once in every app process. Expired rows are purged hourly.
 */
export const userSessions = pgTable(
	'user_session',
	{
		id: text('id').primaryKey(),
		userId: belongsToUser('user_id'),
		createdAt: timestamp('created_at', { mode: 'date' }).notNull().defaultNow(),
		/** Moves forward as the session is used (Auth.js renews the JWT), at most once a day. */
		expiresAt: timestamp('expires_at', { mode: 'date' }).notNull(),
		revokedAt: timestamp('revoked_at', { mode: 'date' })
	},
	(s) => [index('user_session_user_idx').on(s.userId), index('user_session_expires_idx').on(s.expiresAt)]
);
