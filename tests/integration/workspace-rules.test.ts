import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { invitations, memberships } from '$lib/server/db/schema';
import { createHash } from 'node:crypto';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { acceptInvitation, findOpenInvitation, invite } from '$lib/server/workspaces/invitation';
import {
	changeRole,
	listMembers,
	MembershipRuleError,
	removeMember
} from '$lib/server/workspaces/membership';
import { makeUser } from './fixtures';
import { newestMailTo } from './mail-catcher';

// Against the real PostgreSQL that `npm test` starts; every row here is invented test data.
const tag = `it-${Date.now()}`;
let ownerId = '';
let otherId = '';

/** A user whose address is already confirmed. */
const verified = (name: string) =>
	makeUser(`${name}-${tag}@example.org`, name, { emailVerified: new Date() });

beforeAll(async () => {
	ownerId = (await verified('owner')).id;
	otherId = (await verified('other')).id;
});

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('the last owner', () => {
	it('cannot be demoted or removed, but can once a second owner exists', async () => {
		const ws = await createWorkspace(`Rules ${tag}`, ownerId);
		await expect(changeRole(ws, ownerId, 'viewer')).rejects.toBeInstanceOf(MembershipRuleError);
		await expect(removeMember(ws, ownerId)).rejects.toBeInstanceOf(MembershipRuleError);

		await db.insert(memberships).values({ workspaceId: ws, userId: otherId, role: 'editor' });
		await changeRole(ws, otherId, 'owner');
		await changeRole(ws, ownerId, 'viewer');
		const roles = Object.fromEntries((await listMembers(ws)).map((m) => [m.userId, m.role]));
		expect(roles).toEqual({ [ownerId]: 'viewer', [otherId]: 'owner' });
	});

	it('survives two owners demoting each other at the same moment', async () => {
		const ws = await createWorkspace(`Race ${tag}`, ownerId);
		await db.insert(memberships).values({ workspaceId: ws, userId: otherId, role: 'owner' });
		const results = await Promise.allSettled([
			changeRole(ws, ownerId, 'viewer'),
			changeRole(ws, otherId, 'viewer')
		]);
		expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
		const owners = (await listMembers(ws)).filter((m) => m.role === 'owner');
		expect(owners).toHaveLength(1);
	});
});

describe('invitations', () => {
	it('store only a hash of the token, work once, and make the invitee a member with the invited role', async () => {
		const ws = await createWorkspace(`Invite ${tag}`, ownerId);
		const owner = { id: ownerId, email: `owner-${tag}@example.org`, name: 'owner', isAdmin: false };
		const email = `guest-${tag}@example.org`;
		await invite(
			{ workspaceId: ws, workspaceName: 'Invite', email, role: 'editor', invitedBy: owner },
			'http://127.0.0.1'
		);

		// The token only travels in the e-mail: read it back from the catcher.
		const token = (await newestMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1]!;
		const [row] = await db.select().from(invitations).where(eq(invitations.email, email));
		expect(row!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
		expect(row!.tokenHash).not.toContain(token);

		expect(await findOpenInvitation(token)).toMatchObject({ email, role: 'editor' });
		const first = await acceptInvitation(token, { name: 'Guest', password: 'guest password 123' });
		expect(first).toMatchObject({ workspaceId: ws, email });
		expect(await acceptInvitation(token, { userId: otherId })).toBeNull();
		expect(await findOpenInvitation(token)).toBeNull();
		const members = await listMembers(ws);
		expect(members.find((m) => m.email === email)?.role).toBe('editor');
		expect(members.find((m) => m.userId === otherId)).toBeUndefined();
	});

	it('refuse an expired link', async () => {
		const ws = await createWorkspace(`Expired ${tag}`, ownerId);
		await db.insert(invitations).values({
			workspaceId: ws,
			email: `late-${tag}@example.org`,
			role: 'viewer',
			tokenHash: createHash('sha256').update(`expired-${tag}`).digest('hex'),
			expiresAt: new Date(Date.now() - 1000)
		});
		expect(await findOpenInvitation(`expired-${tag}`)).toBeNull();
		expect(await acceptInvitation(`expired-${tag}`, { userId: otherId })).toBeNull();
	});
});
