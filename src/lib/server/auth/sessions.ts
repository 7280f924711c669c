import { randomBytes } from 'node:crypto';
import { and, eq, gt, isNotNull, isNull, lt, lte, or, sql } from 'drizzle-orm';
import { db, type Tx } from '../db';
import { memberships, users, userSessions } from '../db/schema';

/**
 * Sessions that can be ended.
 *
 * Auth.js keeps sessions in an encrypted JWT (its credentials provider requires it), which on its own is
 * valid until it expires: a copied token would outlive sign-out. So each session JWT also carries a random
 * session id (`sid`, minted in the `jwt` callback at sign-in) with a row in `user_session`, and a request is
 * signed in only while that row is live. `hooks.server.ts` checks it in the same query that reads the user,
 * on every request, so ending a session holds at once in every app process; the per-process session cache
 * only saves the JWT decryption, never the liveness.
 */

export const SESSION_MAX_AGE_S = 30 * 24 * 60 * 60;
const SESSION_MAX_AGE_MS = SESSION_MAX_AGE_S * 1000;
/** A used session's row is moved forward at most this often (Auth.js renews the JWT on every read). */
const EXTEND_EVERY_MS = 24 * 60 * 60 * 1000;

/** Records a new session for the user and returns its id, for the JWT. */
export async function startSession(userId: string, now = new Date()): Promise<string> {
	const id = randomBytes(24).toString('base64url');
	await db
		.insert(userSessions)
		.values({ id, userId, createdAt: now, expiresAt: new Date(now.getTime() + SESSION_MAX_AGE_MS) });
	return id;
}

/** Keeps the row's expiry in step with the renewed JWT; writes at most once a day per session. */
export async function extendSession(sid: string, now = new Date()): Promise<void> {
	const expiresAt = new Date(now.getTime() + SESSION_MAX_AGE_MS);
	await db
		.update(userSessions)
		.set({ expiresAt })
		.where(
			and(
				eq(userSessions.id, sid),
				isNull(userSessions.revokedAt),
				lt(userSessions.expiresAt, new Date(expiresAt.getTime() - EXTEND_EVERY_MS))
			)
		);
}

/**
 * The user behind a live session, or null when the session was ended, has expired or is someone else's;
 * with up to two of their workspaces, read in the same statement, for where "Sites" leads
 * (`accounts/landing.ts`): every signed-in page shows that link.
 */
export async function liveSessionUser(
	userId: string,
	sid: string
): Promise<{ user: SessionUser; someWorkspaces: string[] } | null> {
	const [row] = await liveSessionQuery.execute({ userId, sid });
	if (!row) return null;
	const { someWorkspaces, ...user } = row;
	return { user, someWorkspaces };
}

// Built once: it runs on every signed-in request, and building a query costs more CPU than sending it.
const liveSessionQuery = db
	.select({
		id: users.id,
		email: users.email,
		name: users.name,
		isAdmin: users.isAdmin,
		someWorkspaces: sql<string[]>`array(select ${memberships.workspaceId} from ${memberships}
			where ${memberships.userId} = ${users.id} limit 2)`
	})
	.from(users)
	.innerJoin(
		userSessions,
		and(
			eq(userSessions.userId, users.id),
			eq(userSessions.id, sql.placeholder('sid')),
			isNull(userSessions.revokedAt),
			gt(userSessions.expiresAt, sql`now()`)
		)
	)
	.where(eq(users.id, sql.placeholder('userId')))
	.prepare('live_session_user');

/** Ends one session (sign-out). */
export async function revokeSession(sid: string): Promise<void> {
	await db
		.update(userSessions)
		.set({ revokedAt: new Date() })
		.where(and(eq(userSessions.id, sid), isNull(userSessions.revokedAt)));
}

/** Ends every session of the user ("sign out everywhere", a password reset); returns how many were live. */
export async function revokeAllSessions(userId: string, tx: Tx | typeof db = db): Promise<number> {
	const ended = await tx
		.update(userSessions)
		.set({ revokedAt: new Date() })
		.where(and(eq(userSessions.userId, userId), isNull(userSessions.revokedAt)))
		.returning({ id: userSessions.id });
	return ended.length;
}

/** Removes rows no JWT can use any more (expired or ended): a JWT without its row is signed out anyway. */
export async function purgeEndedSessions(now = new Date()): Promise<number> {
	const removed = await db
		.delete(userSessions)
		.where(or(lte(userSessions.expiresAt, now), isNotNull(userSessions.revokedAt)))
		.returning({ id: userSessions.id });
	return removed.length;
}
