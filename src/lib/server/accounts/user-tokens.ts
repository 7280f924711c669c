import { and, eq, gt, isNull } from 'drizzle-orm';
import { db, type Tx } from '../db';
import { userTokens } from '../db/schema';
import { HOUR_MS, hashToken, newToken } from '../auth/tokens';

/*
 * The links an account's e-mails carry (confirming a sign-up, resetting a password): a random token whose
 * hash is stored in `user_token`, working once, until it expires.
 */

/** What a link is for. */
export type Purpose = 'verify-email' | 'reset-password';
const LIFETIME_MS: Record<Purpose, number> = { 'verify-email': 48 * HOUR_MS, 'reset-password': 1 * HOUR_MS };

/**
 * Stores a new link for the user (with the sign-up's pending name and password, and the quick estimate it
 * carries, if any) and returns its token.
 */
export async function issueToken(
	tx: Tx | typeof db,
	userId: string,
	purpose: Purpose,
	pending: { name: string | null; passwordHash: string; estimate?: unknown } | null = null
): Promise<string> {
	const { token, tokenHash } = newToken();
	await tx.insert(userTokens).values({
		userId,
		purpose,
		tokenHash,
		expiresAt: new Date(Date.now() + LIFETIME_MS[purpose]),
		name: pending?.name ?? null,
		passwordHash: pending?.passwordHash ?? null,
		estimate: pending?.estimate ?? null
	});
	return token;
}

/** Marks every open link of that purpose for the user as used: none of them works any more. */
export async function voidTokens(tx: Tx | typeof db, userId: string, purpose: Purpose): Promise<void> {
	await tx
		.update(userTokens)
		.set({ usedAt: new Date() })
		.where(and(eq(userTokens.userId, userId), eq(userTokens.purpose, purpose), isNull(userTokens.usedAt)));
}

/** Every link of that purpose nobody has used and that has not expired yet. */
export const openLinks = (purpose: Purpose) =>
	and(eq(userTokens.purpose, purpose), isNull(userTokens.usedAt), gt(userTokens.expiresAt, new Date()));

/** The open link of that purpose behind a token. */
export const openToken = (token: string, purpose: Purpose) =>
	and(eq(userTokens.tokenHash, hashToken(token)), openLinks(purpose));

/** Marks the token used and returns its user, or null when it is unknown, used or expired. Single use. */
export async function consumeToken(tx: Tx, token: string, purpose: Purpose): Promise<string | null> {
	const [row] = await tx
		.update(userTokens)
		.set({ usedAt: new Date() })
		.where(openToken(token, purpose))
		.returning({ userId: userTokens.userId });
	return row?.userId ?? null;
}
