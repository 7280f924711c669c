import { and, eq, gt, isNull } from 'drizzle-orm';
import { db } from '../db';
import { userTokens, users } from '../db/schema';
import { hashPassword } from '../auth/password';
import { HOUR_MS, hashToken, newToken } from '../auth/tokens';
import { sendMail } from '../mail';

type Purpose = 'verify-email' | 'reset-password';
const LIFETIME_MS: Record<Purpose, number> = { 'verify-email': 48 * HOUR_MS, 'reset-password': 1 * HOUR_MS };

async function issueToken(userId: string, purpose: Purpose): Promise<string> {
	const { token, tokenHash } = newToken();
	await db
		.insert(userTokens)
		.values({ userId, purpose, tokenHash, expiresAt: new Date(Date.now() + LIFETIME_MS[purpose]) });
	return token;
}

/** Marks the token used and returns its user, or null when it is unknown, used or expired. Single use. */
async function consumeToken(token: string, purpose: Purpose): Promise<string | null> {
	const [row] = await db
		.update(userTokens)
		.set({ usedAt: new Date() })
		.where(
			and(
				eq(userTokens.tokenHash, hashToken(token)),
				eq(userTokens.purpose, purpose),
				isNull(userTokens.usedAt),
				gt(userTokens.expiresAt, new Date())
			)
		)
		.returning({ userId: userTokens.userId });
	return row?.userId ?? null;
}

export type SignUpResult = 'created' | 'exists';

/**
 * Creates an unconfirmed account and mails the confirmation link. For an address that already has an
 * account the caller shows the same "check your e-mail" page, so the form does not reveal who has one;
 * that owner gets a note instead of a link.
 */
export async function signUp(
	input: { name: string; email: string; password: string },
	origin: string
): Promise<SignUpResult> {
	const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, input.email));
	if (existing) {
		await sendMail({
			to: input.email,
			subject: 'Someone tried to create a Runrate account with your address',
			text: `An account already uses this address. To get in, sign in or reset your password:\n\n${origin}/forgot\n\nIf this was not you, nothing changed.`
		});
		return 'exists';
	}
	const passwordHash = await hashPassword(input.password);
	const [user] = await db
		.insert(users)
		.values({ name: input.name, email: input.email, passwordHash })
		.returning({ id: users.id });
	await sendVerification(user!.id, input.email, origin);
	return 'created';
}

export async function sendVerification(userId: string, email: string, origin: string): Promise<void> {
	const token = await issueToken(userId, 'verify-email');
	await sendMail({
		to: email,
		subject: 'Confirm your address for Runrate',
		text: `Welcome to Runrate. Confirm your address to finish creating your account (the link works for 48 hours):\n\n${origin}/signup/confirm?token=${token}\n`
	});
}

export async function confirmEmail(token: string): Promise<string | null> {
	const userId = await consumeToken(token, 'verify-email');
	if (!userId) return null;
	const [user] = await db
		.update(users)
		.set({ emailVerified: new Date() })
		.where(eq(users.id, userId))
		.returning({ email: users.email });
	return user?.email ?? null;
}

/** Always behaves the same to the caller; only an existing account gets a reset link. */
export async function requestPasswordReset(email: string, origin: string): Promise<void> {
	const [user] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
	if (!user) return;
	const token = await issueToken(user.id, 'reset-password');
	await sendMail({
		to: email,
		subject: 'Reset your Runrate password',
		text: `Open this link to choose a new password (it works once, for one hour):\n\n${origin}/reset?token=${token}\n\nIf you did not ask for it, ignore this message; your password stays as it is.`
	});
}

/** Sets the new password; the link proves the address, so it also counts as confirmed. */
export async function resetPassword(token: string, password: string): Promise<string | null> {
	const userId = await consumeToken(token, 'reset-password');
	if (!userId) return null;
	const [user] = await db
		.update(users)
		.set({ passwordHash: await hashPassword(password), emailVerified: new Date() })
		.where(eq(users.id, userId))
		.returning({ email: users.email });
	return user?.email ?? null;
}
