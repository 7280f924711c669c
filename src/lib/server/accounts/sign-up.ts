import { and, desc, eq, isNotNull, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '../db';
import { userTokens, users } from '../db/schema';
import { hashPassword, verifyPassword } from '../auth/password';
import { sendMail } from '../mail';
import { consumeToken, issueToken, openLinks, openToken, voidTokens } from './user-tokens';
import { createFirstSite, type FirstSite } from './first-site';
import { keptEstimateSchema, readKeptEstimate, type KeptEstimate } from './kept-estimate';

/*
 * Pending sign-ups: proving an address never adopts a password someone else chose.
 *
 * Anyone can fill in the sign-up form with any address, so a sign-up's password (and name) are only a
 * proposal until the address's owner confirms them. They wait on the confirmation link's own row
 * (`user_token.password_hash`, `.name`); the unconfirmed user row holds the address and nothing else.
 *
 * - The confirmation link confirms that proposal only when whoever opens it also types the password chosen
 *   in that same sign-up: the link proves the address, the password proves it is the same person. The
 *   owner of an address who opens a link from a sign-up they did not make cannot complete it.
 * - A second sign-up for a still-unconfirmed address replaces the proposal and voids the earlier links.
 * - A sign-up for a confirmed address changes nothing; the owner gets a "someone tried" note.
 * - Proving the address any other way (an e-mailed sign-in link, a password reset, an invitation) voids
 *   every pending proposal: the account then has no password, or the one chosen with that proof.
 * - Both sign-up paths hash the password before branching and answer with the same page, so neither the
 *   answer nor its timing tells who has an account.
 * - A sign-up may carry the home page's quick estimate (kept-estimate.ts); it waits on the same row and
 *   becomes the account's first site in the confirmation's transaction (first-site.ts).
 */

/**
 * Starts a sign-up, or tells the address's owner someone tried. Returns nothing: the caller shows the same
 * "check your e-mail" page either way, and both ways cost one password hash.
 */
export async function signUp(
	input: { name: string; email: string; password: string },
	origin: string,
	estimate: KeptEstimate | null = null
): Promise<void> {
	// Checked again here, whoever calls: only a valid, size-capped estimate is stored.
	const kept = estimate ? keptEstimateSchema.parse(estimate) : null;
	// Before branching: an existing address must not answer faster than a new one.
	const passwordHash = await hashPassword(input.password);
	const [existing] = await db
		.select({ id: users.id, emailVerified: users.emailVerified })
		.from(users)
		.where(eq(users.email, input.email));
	if (existing?.emailVerified) {
		await sendMail({
			to: input.email,
			subject: 'Someone tried to create a Runrate account with your address',
			text: `Someone tried to create a Runrate account with this address, which already has one. Nothing changed. To get in, sign in or reset your password:\n\n${origin}/forgot\n\nIf this was not you, you need not do anything.`
		});
		return;
	}
	const token = await db.transaction(async (tx) => {
		let userId = existing?.id;
		if (!userId) {
			const [created] = await tx
				.insert(users)
				.values({ email: input.email })
				.onConflictDoUpdate({ target: users.email, set: { email: input.email } })
				.returning({ id: users.id });
			userId = created!.id;
		}
		// The newest sign-up's proposal replaces the earlier ones; their links stop working.
		await voidTokens(tx, userId, 'verify-email');
		return issueToken(tx, userId, 'verify-email', { name: input.name, passwordHash, estimate: kept });
	});
	await mailConfirmation(input.email, token, origin);
}

async function mailConfirmation(email: string, token: string, origin: string): Promise<void> {
	await sendMail({
		to: email,
		subject: 'Confirm your address for Runrate',
		text: `Welcome to Runrate. To finish creating your account, open this link and type the password you chose (the link works for 48 hours):\n\n${origin}/signup/confirm?token=${token}\n\nIf you did not sign up, ignore this message: nobody can use the account without the link and that password.`
	});
}

/** The pending sign-up behind an open confirmation link, with the password hash it proposes. */
async function pendingSignUp(where: ReturnType<typeof and>) {
	const [row] = await db
		.select({
			userId: userTokens.userId,
			name: userTokens.name,
			passwordHash: userTokens.passwordHash,
			estimate: userTokens.estimate,
			email: users.email
		})
		.from(userTokens)
		.innerJoin(users, eq(users.id, userTokens.userId))
		.where(and(where, isNull(users.emailVerified)))
		.orderBy(desc(userTokens.createdAt))
		.limit(1);
	return row;
}

/** Whether a confirmed account owns this address. An unconfirmed sign-up may be anyone's, so it owns nothing. */
export async function hasConfirmedAccount(email: string): Promise<boolean> {
	const [row] = await db
		.select({ id: users.id })
		.from(users)
		.where(and(eq(users.email, email), isNotNull(users.emailVerified)));
	return !!row;
}

/** The address an open confirmation link is for, or null when it is unknown, used or expired. */
export async function confirmationFor(token: string): Promise<string | null> {
	return (await pendingSignUp(openToken(token, 'verify-email')))?.email ?? null;
}

/** A confirmed sign-up: its address, and the first site when it carried a quick estimate. */
export type Confirmation = { email: string; firstSite?: FirstSite } | 'wrong-password' | 'closed';

/**
 * Confirms a sign-up: the link must be open and the password the one chosen in that same sign-up. Only
 * then does the account get that password (and name) and count as confirmed; the link is used up. A
 * quick estimate the sign-up carried becomes the account's first site in the same transaction.
 */
export async function confirmSignUp(token: string, password: string): Promise<Confirmation> {
	const pending = await pendingSignUp(openToken(token, 'verify-email'));
	// One hash comparison whether or not the link is open.
	if (!(await verifyPassword(password, pending?.passwordHash))) return pending ? 'wrong-password' : 'closed';
	const confirmed = await db.transaction(async (tx) => {
		if (!(await consumeToken(tx, token, 'verify-email'))) return null;
		const [user] = await tx
			.update(users)
			.set({ passwordHash: pending!.passwordHash, name: pending!.name, emailVerified: new Date() })
			.where(and(eq(users.id, pending!.userId), isNull(users.emailVerified)))
			.returning({ id: users.id, email: users.email, name: users.name });
		if (!user) return null;
		await voidTokens(tx, pending!.userId, 'verify-email');
		const estimate = readKeptEstimate(pending!.estimate);
		if (!estimate) return { email: user.email };
		return { email: user.email, firstSite: await createFirstSite(tx, user, estimate) };
	});
	return confirmed ?? 'closed';
}

export type PendingSignUp = NonNullable<Awaited<ReturnType<typeof pendingSignUp>>>;

/**
 * A password sign-in to an address whose sign-up is not confirmed yet: the pending sign-up when the
 * password is the one it chose, else null. Always costs one hash comparison, so a miss takes as long
 * whether or not a sign-up is pending.
 */
export async function pendingSignUpWith(email: string, password: string): Promise<PendingSignUp | null> {
	const pending = await pendingSignUp(and(eq(users.email, email), openLinks('verify-email')));
	return (await verifyPassword(password, pending?.passwordHash)) && pending ? pending : null;
}

/** Mails a fresh confirmation link for the pending sign-up; its older links stop working. */
export async function resendConfirmation(pending: PendingSignUp, origin: string): Promise<void> {
	const token = await db.transaction(async (tx) => {
		await voidTokens(tx, pending.userId, 'verify-email');
		return issueToken(tx, pending.userId, 'verify-email', {
			name: pending.name,
			passwordHash: pending.passwordHash!,
			estimate: pending.estimate
		});
	});
	await mailConfirmation(pending.email, token, origin);
}

/**
 * The address was just proven by an e-mailed sign-in link (Auth.js's adapter calls this before it sets
 * `emailVerified`). If the account was unconfirmed, whatever an unconfirmed sign-up put on it (a password,
 * a name, from before pending sign-ups) is dropped, and pending sign-up links stop working: the person
 * who proved the address chooses a password on their own, through a reset.
 */
export async function addressProvenBySignInLink(userId: string, tx: Tx | typeof db = db): Promise<void> {
	await tx
		.update(users)
		.set({
			passwordHash: sql`case when ${users.emailVerified} is null then null else ${users.passwordHash} end`,
			name: sql`case when ${users.emailVerified} is null then null else ${users.name} end`
		})
		.where(eq(users.id, userId));
	await voidTokens(tx, userId, 'verify-email');
}
