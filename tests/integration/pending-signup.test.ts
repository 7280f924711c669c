import { afterAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { verifyPassword } from '$lib/server/auth/password';
import { client, db } from '$lib/server/db';
import { users } from '$lib/server/db/schema';
import { stopJobs } from '$lib/server/jobs';
import {
	addressProvenBySignInLink,
	confirmationFor,
	confirmSignUp,
	pendingSignUpWith,
	resendConfirmation,
	signUp
} from '$lib/server/accounts/sign-up';
import { requestPasswordReset, resetPassword } from '$lib/server/accounts/password-reset';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { acceptInvitation, invite } from '$lib/server/workspaces/invitation';
import { makeUser } from './fixtures';

// Account pre-hijack (issue 14, item 3), against the real PostgreSQL and mail catcher of `npm test`.
// An attacker signs up with someone else's address and a password of their own; nothing the owner of
// the address does afterwards may make that password work. Invented people and addresses.
const tag = `prehijack-${Date.now()}`;
const ORIGIN = 'http://127.0.0.1';
const ATTACKER_PASSWORD = 'attacker chose this 123';

afterAll(async () => {
	await stopJobs();
	await client.end({ timeout: 5 });
});

type Mail = { subject: string; text: string };
const seen = new Map<string, number>();

/** The next message to `to` whose link goes to `path`, waiting for the queue to deliver it. */
async function nextMail(to: string, path: string, timeoutMs = 15_000): Promise<Mail> {
	const until = Date.now() + timeoutMs;
	for (;;) {
		const mails = (await (
			await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(to)}`)
		).json()) as Mail[];
		const from = seen.get(to) ?? 0;
		const index = mails.findIndex((m, i) => i >= from && m.text.includes(path));
		if (index >= 0) {
			seen.set(to, index + 1);
			return mails[index]!;
		}
		if (Date.now() > until) throw new Error(`no new mail with ${path} to ${to} within ${timeoutMs} ms`);
		await new Promise((resolve) => setTimeout(resolve, 200));
	}
}

async function linkToken(to: string, path: string): Promise<string> {
	return (await nextMail(to, path)).text.match(new RegExp(`${path}\\?token=([\\w-]+)`))![1]!;
}

const account = async (email: string) => (await db.select().from(users).where(eq(users.email, email)))[0]!;

const attackerPasswordWorks = async (email: string) => {
	const row = await account(email);
	return !!row.emailVerified && (await verifyPassword(ATTACKER_PASSWORD, row.passwordHash));
};

describe('a sign-up with someone else’s address', () => {
	it('puts no password on the account: it waits on the link', async () => {
		const victim = `victim-a-${tag}@example.org`;
		await signUp({ name: 'Attacker', email: victim, password: ATTACKER_PASSWORD }, ORIGIN);
		const row = await account(victim);
		expect(row).toMatchObject({ emailVerified: null, passwordHash: null, name: null });
	});

	it('is dropped when the owner signs in with an e-mailed link, and its link stops working', async () => {
		const victim = `victim-b-${tag}@example.org`;
		await signUp({ name: 'Attacker', email: victim, password: ATTACKER_PASSWORD }, ORIGIN);
		const squatLink = await linkToken(victim, '/signup/confirm');
		const row = await account(victim);
		// What Auth.js's adapter does when the sign-in link is used (auth/index.ts wraps updateUser).
		await addressProvenBySignInLink(row.id);
		await db.update(users).set({ emailVerified: new Date() }).where(eq(users.id, row.id));

		expect(await attackerPasswordWorks(victim)).toBe(false);
		expect((await account(victim)).passwordHash).toBeNull();
		expect(await confirmationFor(squatLink)).toBeNull();
		expect(await confirmSignUp(squatLink, ATTACKER_PASSWORD)).toBe('closed');
		expect(await attackerPasswordWorks(victim)).toBe(false);
	});

	it('cannot be confirmed by the owner opening its link without that password', async () => {
		const victim = `victim-c-${tag}@example.org`;
		await signUp({ name: 'Attacker', email: victim, password: ATTACKER_PASSWORD }, ORIGIN);
		const squatLink = await linkToken(victim, '/signup/confirm');
		expect(await confirmationFor(squatLink)).toBe(victim);
		expect(await confirmSignUp(squatLink, 'what the owner might type')).toBe('wrong-password');
		expect(await account(victim)).toMatchObject({ emailVerified: null, passwordHash: null });
		expect(await attackerPasswordWorks(victim)).toBe(false);
	});

	it('is replaced by a later sign-up: the earlier link and password no longer confirm anything', async () => {
		const email = `twice-${tag}@example.org`;
		await signUp({ name: 'First', email, password: ATTACKER_PASSWORD }, ORIGIN);
		const first = await linkToken(email, '/signup/confirm');
		await signUp({ name: 'Second', email, password: 'the owner chose this' }, ORIGIN);
		const second = await linkToken(email, '/signup/confirm');
		expect(second).not.toBe(first);

		expect(await confirmSignUp(first, ATTACKER_PASSWORD)).toBe('closed');
		expect(await confirmSignUp(second, ATTACKER_PASSWORD)).toBe('wrong-password');
		expect(await confirmSignUp(second, 'the owner chose this')).toEqual({ email });
		const row = await account(email);
		expect(row.name).toBe('Second');
		expect(await verifyPassword('the owner chose this', row.passwordHash)).toBe(true);
		expect(await confirmSignUp(second, 'the owner chose this')).toBe('closed');
	});

	it('changes nothing on a confirmed account; its owner gets a note', async () => {
		const email = `owner-${tag}@example.org`;
		await signUp({ name: 'Owner', email, password: 'the owner chose this' }, ORIGIN);
		await confirmSignUp(await linkToken(email, '/signup/confirm'), 'the owner chose this');
		const before = await account(email);

		await signUp({ name: 'Attacker', email, password: ATTACKER_PASSWORD }, ORIGIN);
		expect((await nextMail(email, '/forgot')).subject).toMatch(/Someone tried to create a Runrate account/);
		expect(await account(email)).toEqual(before);
		expect(await attackerPasswordWorks(email)).toBe(false);
	});

	it('is void after a password reset by the owner', async () => {
		const victim = `victim-d-${tag}@example.org`;
		await signUp({ name: 'Attacker', email: victim, password: ATTACKER_PASSWORD }, ORIGIN);
		const squatLink = await linkToken(victim, '/signup/confirm');
		await requestPasswordReset(victim, ORIGIN);
		expect(await resetPassword(await linkToken(victim, '/reset'), 'the owner chose this')).toBe(victim);
		expect(await confirmSignUp(squatLink, ATTACKER_PASSWORD)).toBe('closed');
		expect(await attackerPasswordWorks(victim)).toBe(false);
	});

	it('does not make its maker the owner for invitations: the invitee joins with a password of their own', async () => {
		const owner = await makeUser(`inviter-${tag}@example.org`, 'Inviter', { emailVerified: new Date() });
		const workspaceId = await createWorkspace(`Pre-hijack ${tag}`, owner.id);
		const victim = `victim-e-${tag}@example.org`;
		await signUp({ name: 'Attacker', email: victim, password: ATTACKER_PASSWORD }, ORIGIN);
		const squatLink = await linkToken(victim, '/signup/confirm');

		await invite(
			{ workspaceId, workspaceName: `Pre-hijack ${tag}`, email: victim, role: 'editor', invitedBy: owner },
			ORIGIN
		);
		const invitation = (await nextMail(victim, '/invite/')).text.match(/\/invite\/([\w-]+)/)![1]!;
		const accepted = await acceptInvitation(invitation, { name: 'Victim', password: 'the owner chose this' });
		expect(accepted).toMatchObject({ workspaceId });

		const row = await account(victim);
		expect(row.name).toBe('Victim');
		expect(await verifyPassword('the owner chose this', row.passwordHash)).toBe(true);
		expect(await attackerPasswordWorks(victim)).toBe(false);
		expect(await confirmSignUp(squatLink, ATTACKER_PASSWORD)).toBe('closed');
	});

	it('still lets the person who made it ask for a fresh link by signing in with its password', async () => {
		const email = `early-${tag}@example.org`;
		await signUp({ name: 'Early', email, password: 'my own password 1' }, ORIGIN);
		const first = await linkToken(email, '/signup/confirm');
		expect(await pendingSignUpWith(email, 'not my password')).toBeNull();
		const pending = await pendingSignUpWith(email, 'my own password 1');
		expect(pending).toMatchObject({ email, name: 'Early' });
		await resendConfirmation(pending!, ORIGIN);
		const fresh = await linkToken(email, '/signup/confirm');
		expect(fresh).not.toBe(first);
		expect(await confirmSignUp(first, 'my own password 1')).toBe('closed');
		expect(await confirmSignUp(fresh, 'my own password 1')).toEqual({ email });
	});
});
