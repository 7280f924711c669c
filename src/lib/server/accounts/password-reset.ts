import { eq, sql } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';
import { hashPassword } from '../auth/password';
import { revokeAllSessions } from '../auth/sessions';
import { sendMail } from '../mail';
import { consumeToken, issueToken, voidTokens } from './user-tokens';

/** Always behaves the same to the caller; only an existing account gets a reset link. */
export async function requestPasswordReset(email: string, origin: string): Promise<void> {
	const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
	if (!user) return;
	const token = await issueToken(db, user.id, 'reset-password');
	await sendMail({
		to: email,
		subject: 'Reset your Runrate password',
		text: `Open this link to choose a new password (it works once, for one hour):\n\n${origin}/reset?token=${token}\n\nIf you did not ask for it, ignore this message; your password stays as it is.`
	});
}

/**
 * Sets the new password. The link proves the address, so it also counts as confirmed (any pending sign-up
 * is void). Using one reset link voids the user's other reset links, and every session of the account
 * ends: whoever knew the old password is signed out everywhere, and the person signs in again.
 */
export async function resetPassword(token: string, password: string): Promise<string | null> {
	const passwordHash = await hashPassword(password);
	return db.transaction(async (tx) => {
		const userId = await consumeToken(tx, token, 'reset-password');
		if (!userId) return null;
		await voidTokens(tx, userId, 'reset-password');
		await voidTokens(tx, userId, 'verify-email');
		const [user] = await tx
			.update(users)
			.set({ passwordHash, emailVerified: sql`coalesce(${users.emailVerified}, now())` })
			.where(eq(users.id, userId))
			.returning({ email: users.email });
		await revokeAllSessions(userId, tx);
		return user?.email ?? null;
	});
}
