import { afterAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { memberships, siteGrants, users } from '$lib/server/db/schema';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { acceptInvitation, inviteToSite } from '$lib/server/workspaces/invitation';
import { makeSite, makeUser } from './fixtures';
import { newestMailTo } from './mail-catcher';

// Against the real PostgreSQL of `npm test`; invented people and sites.
const tag = `share-${Date.now()}`;

afterAll(async () => {
	await client.end({ timeout: 5 });
});

describe('sharing one site', () => {
	it('gives the invitee a grant on that site and no membership of the workspace', async () => {
		const owner = await makeUser(`owner-${tag}@example.org`, 'Owner');
		const ws = await createWorkspace(`Share ${tag}`, owner.id);
		const site = await makeSite(ws, owner, `Site ${tag}`);
		const email = `client-${tag}@example.org`;
		await inviteToSite(
			{
				site,
				email,
				role: 'viewer',
				invitedBy: owner
			},
			'http://127.0.0.1'
		);
		const token = (await newestMailTo(email)).text.match(/\/invite\/([\w-]+)/)![1]!;
		const accepted = await acceptInvitation(token, { name: 'Client', password: 'client password 123' });
		expect(accepted).toMatchObject({ siteId: site.id, workspaceId: ws });
		const [guest] = await db.select().from(users).where(eq(users.email, email));
		expect(
			await db
				.select()
				.from(memberships)
				.where(and(eq(memberships.workspaceId, ws), eq(memberships.userId, guest!.id)))
		).toEqual([]);
		expect(
			await db.select({ role: siteGrants.role }).from(siteGrants).where(eq(siteGrants.userId, guest!.id))
		).toEqual([{ role: 'viewer' }]);
	});
});
