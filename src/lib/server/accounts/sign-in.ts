import { eq } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';
import { verifyPassword } from '../auth/password';
import { pendingSignUpWith, type PendingSignUp } from './sign-up';

/**
 * The account with this e-mail when the password is its own, else null. One hash comparison whether or
 * not the address has an account, so the answer's timing tells nobody which addresses do.
 */
export async function accountWithPassword(email: string, password: string) {
	const [user] = await db.select().from(users).where(eq(users.email, email));
	return (await verifyPassword(password, user?.passwordHash)) && user ? user : null;
}

/** What a password sign-in attempt found: the account, a sign-up still waiting for its link, or nothing. */
export type PasswordCheck =
	{ found: 'account' } | { found: 'pending'; pending: PendingSignUp } | { found: 'none' };

/**
 * Checks an e-mail and password before Auth.js signs the person in. The caller answers "unknown address"
 * and "wrong password" alike, so the form never tells who has an account; the hash comparison runs either
 * way. A sign-up not confirmed yet keeps its password on its link, not on the account (sign-up.ts).
 */
export async function checkPassword(email: string, password: string): Promise<PasswordCheck> {
	if (await accountWithPassword(email, password)) return { found: 'account' };
	const pending = await pendingSignUpWith(email, password);
	return pending ? { found: 'pending', pending } : { found: 'none' };
}
