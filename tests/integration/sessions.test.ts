import { afterAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import {
	extendSession,
	liveSessionUser,
	purgeEndedSessions,
	revokeAllSessions,
	revokeSession,
	startSession
} from '$lib/server/auth/sessions';
import { client, db } from '$lib/server/db';
import { userSessions, userTokens } from '$lib/server/db/schema';
import { stopJobs } from '$lib/server/jobs';
import { requestPasswordReset, resetPassword } from '$lib/server/accounts/password-reset';
import { sitesHomeFor, sitesHomeOf, WORKSPACES_PAGE } from '$lib/server/accounts/landing';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { makeUser } from './fixtures';

// Sessions that end (issue 14, item 6), against the real PostgreSQL of `npm test`. Invented people.
const tag = `sessions-${Date.now()}`;
const DAY_MS = 24 * 60 * 60 * 1000;

afterAll(async () => {
	await stopJobs();
	await client.end({ timeout: 5 });
});

const person = (who: string) => makeUser(`${who}-${tag}@example.org`, who, { emailVerified: new Date() });
const row = async (sid: string) => (await db.select().from(userSessions).where(eq(userSessions.id, sid)))[0];

describe('a recorded session', () => {
	it('signs its user in until it is ended, and never signs in anyone else', async () => {
		const user = await person('grower');
		const other = await person('other');
		const sid = await startSession(user.id);
		expect(await liveSessionUser(user.id, sid)).toMatchObject({
			user: { id: user.id, email: user.email },
			someWorkspaces: []
		});
		expect(await liveSessionUser(other.id, sid)).toBeNull();
		expect(await liveSessionUser(user.id, 'no-such-session')).toBeNull();

		await revokeSession(sid);
		expect(await liveSessionUser(user.id, sid)).toBeNull();
	});

	it('ends on sign-out alone: the user’s other sessions stay', async () => {
		const user = await person('two-devices');
		const laptop = await startSession(user.id);
		const phone = await startSession(user.id);
		await revokeSession(laptop);
		expect(await liveSessionUser(user.id, laptop)).toBeNull();
		expect(await liveSessionUser(user.id, phone)).not.toBeNull();
	});

	it('ends everywhere at once: every session of that user, no one else’s', async () => {
		const user = await person('everywhere');
		const bystander = await person('bystander');
		const sids = [await startSession(user.id), await startSession(user.id), await startSession(user.id)];
		const theirs = await startSession(bystander.id);
		expect(await revokeAllSessions(user.id)).toBe(3);
		for (const sid of sids) expect(await liveSessionUser(user.id, sid)).toBeNull();
		expect(await liveSessionUser(bystander.id, theirs)).not.toBeNull();
	});

	it('expires unless used; use moves its expiry forward at most once a day', async () => {
		const user = await person('idle');
		const longAgo = new Date(Date.now() - 31 * DAY_MS);
		const stale = await startSession(user.id, longAgo);
		expect(await liveSessionUser(user.id, stale)).toBeNull();

		const fresh = await startSession(user.id);
		const firstExpiry = (await row(fresh))!.expiresAt;
		await extendSession(fresh, new Date(Date.now() + 60_000));
		expect((await row(fresh))!.expiresAt).toEqual(firstExpiry);
		await extendSession(fresh, new Date(Date.now() + 2 * DAY_MS));
		expect((await row(fresh))!.expiresAt.getTime()).toBeGreaterThan(firstExpiry.getTime() + DAY_MS);
	});

	it('leaves the table in the hourly purge once expired or ended; live ones stay', async () => {
		const user = await person('purged');
		const expired = await startSession(user.id, new Date(Date.now() - 31 * DAY_MS));
		const ended = await startSession(user.id);
		await revokeSession(ended);
		const live = await startSession(user.id);
		expect(await purgeEndedSessions()).toBeGreaterThanOrEqual(2);
		expect(await row(expired)).toBeUndefined();
		expect(await row(ended)).toBeUndefined();
		expect(await row(live)).toBeDefined();
	});
});

describe('a password reset', () => {
	it('ends every session of the account and voids the other reset links', async () => {
		const user = await person('reset');
		const elsewhere = await startSession(user.id);
		await requestPasswordReset(user.email, 'http://127.0.0.1');
		await requestPasswordReset(user.email, 'http://127.0.0.1');
		const open = await db.select().from(userTokens).where(eq(userTokens.userId, user.id));
		expect(open.filter((t) => t.purpose === 'reset-password' && !t.usedAt)).toHaveLength(2);

		/** Both links, oldest first, from the mail catcher (only their hashes are stored). */
		const tokens = async () => {
			for (let i = 0; i < 75; i++) {
				const list = (await (
					await fetch(`${process.env.MAIL_VIEW_URL}/messages?to=${encodeURIComponent(user.email)}`)
				).json()) as { text: string }[];
				const found = list.map((m) => m.text.match(/\/reset\?token=([\w-]+)/)?.[1]).filter(Boolean);
				if (found.length >= 2) return found as string[];
				await new Promise((resolve) => setTimeout(resolve, 200));
			}
			throw new Error('the two reset mails did not arrive');
		};
		const [older, newer] = await tokens();

		expect(await resetPassword(newer!, 'a new password 123')).toBe(user.email);
		expect(await liveSessionUser(user.id, elsewhere)).toBeNull();
		expect(await resetPassword(older!, 'the attacker’s choice')).toBeNull();
		expect(await resetPassword(newer!, 'again with the same')).toBeNull();
	});
});

describe('the session check', () => {
	it('reads up to two of the person\'s workspaces with it, for where "Sites" leads', async () => {
		const user = await person('adviser');
		const sid = await startSession(user.id);
		const first = await createWorkspace(`First ${tag}`, user.id);
		expect((await liveSessionUser(user.id, sid))?.someWorkspaces).toEqual([first]);
		expect(sitesHomeOf([first])).toBe(`/w/${first}/sites`);
		await createWorkspace(`Second ${tag}`, user.id);
		await createWorkspace(`Third ${tag}`, user.id);
		const some = (await liveSessionUser(user.id, sid))?.someWorkspaces ?? [];
		expect(some).toHaveLength(2);
		expect(sitesHomeOf(some)).toBe(WORKSPACES_PAGE);
		expect(sitesHomeOf(some)).toBe(await sitesHomeFor(user.id));
	});
});
