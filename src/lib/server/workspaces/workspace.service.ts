import { and, asc, count, eq, gt, isNull } from 'drizzle-orm';
import { db } from '../db';
import { invitations, memberships, siteGrants, sites, userTokens, users, workspaces } from '../db/schema';
import type { Role } from '../guard';
import { hashPassword } from '../auth/password';
import { HOUR_MS, hashToken, newToken } from '../auth/tokens';
import { sendMail } from '../mail';

export const INVITATION_DAYS = 7;

export async function listWorkspacesFor(userId: string) {
	return db
		.select({
			id: workspaces.id,
			name: workspaces.name,
			role: memberships.role,
			deleteAfter: workspaces.deleteAfter
		})
		.from(memberships)
		.innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
		.where(eq(memberships.userId, userId))
		.orderBy(asc(workspaces.name));
}

export async function createWorkspace(name: string, ownerId: string): Promise<string> {
	return db.transaction(async (tx) => {
		const [ws] = await tx.insert(workspaces).values({ name }).returning({ id: workspaces.id });
		await tx.insert(memberships).values({ workspaceId: ws!.id, userId: ownerId, role: 'owner' });
		return ws!.id;
	});
}

export async function renameWorkspace(workspaceId: string, name: string) {
	await db.update(workspaces).set({ name }).where(eq(workspaces.id, workspaceId));
}

/** Deletes at once; owners go through scheduleWorkspaceDeletion (workspace-deletion.service) instead. */
export async function deleteWorkspace(workspaceId: string) {
	await db.delete(workspaces).where(eq(workspaces.id, workspaceId));
}

export async function listMembers(workspaceId: string) {
	return db
		.select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
		.from(memberships)
		.innerJoin(users, eq(users.id, memberships.userId))
		.where(eq(memberships.workspaceId, workspaceId))
		.orderBy(asc(users.email));
}

export async function listPendingInvitations(workspaceId: string) {
	return db
		.select({
			id: invitations.id,
			email: invitations.email,
			role: invitations.role,
			expiresAt: invitations.expiresAt
		})
		.from(invitations)
		.where(
			and(
				eq(invitations.workspaceId, workspaceId),
				isNull(invitations.acceptedAt),
				isNull(invitations.revokedAt),
				gt(invitations.expiresAt, new Date())
			)
		)
		.orderBy(asc(invitations.email));
}

export class MembershipRuleError extends Error {}

/**
 * Changes a member's role inside a transaction that locks the workspace's owner rows, so two owners
 * demoting each other at once cannot leave the workspace without one.
 */
export async function changeRole(workspaceId: string, userId: string, role: Role) {
	await db.transaction(async (tx) => {
		const owners = await tx
			.select({ userId: memberships.userId })
			.from(memberships)
			.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')))
			.for('update');
		if (role !== 'owner' && owners.length === 1 && owners[0]!.userId === userId)
			throw new MembershipRuleError('A workspace needs an owner: make someone else owner first.');
		const updated = await tx
			.update(memberships)
			.set({ role })
			.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)))
			.returning({ userId: memberships.userId });
		if (updated.length === 0) throw new MembershipRuleError('That person is not a member of this workspace.');
	});
}

/** Removes a member (or lets one leave); the last owner can do neither. */
export async function removeMember(workspaceId: string, userId: string) {
	await db.transaction(async (tx) => {
		const owners = await tx
			.select({ userId: memberships.userId })
			.from(memberships)
			.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')))
			.for('update');
		if (owners.length === 1 && owners[0]!.userId === userId)
			throw new MembershipRuleError(
				'The last owner cannot leave: make someone else owner first, or delete the workspace.'
			);
		await tx
			.delete(memberships)
			.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
	});
}

export async function countOwners(workspaceId: string): Promise<number> {
	const [row] = await db
		.select({ n: count() })
		.from(memberships)
		.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')));
	return row?.n ?? 0;
}

export async function invite(
	input: { workspaceId: string; workspaceName: string; email: string; role: Role; invitedBy: SessionUser },
	origin: string
): Promise<'sent' | 'member'> {
	const [member] = await db
		.select({ userId: users.id })
		.from(memberships)
		.innerJoin(users, eq(users.id, memberships.userId))
		.where(and(eq(memberships.workspaceId, input.workspaceId), eq(users.email, input.email)));
	if (member) return 'member';
	const { token, tokenHash } = newToken();
	await db.insert(invitations).values({
		workspaceId: input.workspaceId,
		email: input.email,
		role: input.role,
		tokenHash,
		invitedBy: input.invitedBy.id,
		expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * HOUR_MS)
	});
	const who = input.invitedBy.name
		? `${input.invitedBy.name} (${input.invitedBy.email})`
		: input.invitedBy.email;
	await sendMail({
		to: input.email,
		subject: `You are invited to ${input.workspaceName} on Runrate`,
		text: `${who} invites you to join the workspace "${input.workspaceName}" on Runrate as ${input.role === 'editor' ? 'an editor' : `a ${input.role}`}.\n\nOpen this link to accept (it works once, for ${INVITATION_DAYS} days):\n\n${origin}/invite/${token}\n`
	});
	return 'sent';
}

export async function revokeInvitation(workspaceId: string, invitationId: string) {
	await db
		.update(invitations)
		.set({ revokedAt: new Date() })
		.where(
			and(
				eq(invitations.id, invitationId),
				eq(invitations.workspaceId, workspaceId),
				isNull(invitations.acceptedAt)
			)
		);
}

/** The invitation behind a link, with the workspace's name, or null when unknown, used, revoked or expired. */
export async function findOpenInvitation(token: string) {
	const [row] = await db
		.select({
			id: invitations.id,
			email: invitations.email,
			role: invitations.role,
			workspaceId: invitations.workspaceId,
			workspaceName: workspaces.name,
			siteId: invitations.siteId,
			siteName: sites.name,
			expiresAt: invitations.expiresAt
		})
		.from(invitations)
		.innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
		.leftJoin(sites, eq(sites.id, invitations.siteId))
		.where(
			and(
				eq(invitations.tokenHash, hashToken(token)),
				isNull(invitations.acceptedAt),
				isNull(invitations.revokedAt),
				gt(invitations.expiresAt, new Date())
			)
		);
	return row ?? null;
}

/**
 * Accepts once: the row is claimed with a conditional update, so a second click (or a race) finds nothing.
 * A person without an account creates one here; the link proves the address, so it counts as confirmed.
 */
export async function acceptInvitation(
	token: string,
	who: { userId: string } | { name: string; password: string }
): Promise<{ workspaceId: string; siteId: string | null; email: string } | null> {
	const passwordHash = 'password' in who ? await hashPassword(who.password) : null;
	return db.transaction(async (tx) => {
		const [inv] = await tx
			.update(invitations)
			.set({ acceptedAt: new Date() })
			.where(
				and(
					eq(invitations.tokenHash, hashToken(token)),
					isNull(invitations.acceptedAt),
					isNull(invitations.revokedAt),
					gt(invitations.expiresAt, new Date())
				)
			)
			.returning();
		if (!inv) return null;
		let userId: string;
		if ('userId' in who) userId = who.userId;
		else {
			// The invitation was mailed to the address, so accepting it proves the address: an unconfirmed
			// sign-up for it (possibly someone else's) is no owner, and its pending password is void.
			const [created] = await tx
				.insert(users)
				.values({ email: inv.email, name: who.name, passwordHash, emailVerified: new Date() })
				.onConflictDoUpdate({
					target: users.email,
					set: { name: who.name, passwordHash, emailVerified: new Date() },
					setWhere: isNull(users.emailVerified)
				})
				.returning({ id: users.id });
			if (!created) throw new MembershipRuleError('An account already uses this address: sign in to accept.');
			await tx
				.update(userTokens)
				.set({ usedAt: new Date() })
				.where(and(eq(userTokens.userId, created.id), isNull(userTokens.usedAt)));
			userId = created.id;
		}
		// A site-level share gives that site only; a workspace invitation makes a member.
		if (inv.siteId)
			await tx
				.insert(siteGrants)
				.values({ siteId: inv.siteId, userId, role: inv.role === 'editor' ? 'editor' : 'viewer' })
				.onConflictDoUpdate({
					target: [siteGrants.siteId, siteGrants.userId],
					set: { role: inv.role === 'editor' ? 'editor' : 'viewer' }
				});
		else
			await tx
				.insert(memberships)
				.values({ workspaceId: inv.workspaceId, userId, role: inv.role })
				.onConflictDoNothing();
		return { workspaceId: inv.workspaceId, siteId: inv.siteId, email: inv.email };
	});
}

/** Shares one site with someone outside the workspace (a client, say) as its editor or viewer, by e-mail. */
export async function inviteToSite(
	input: {
		site: { id: string; name: string; workspaceId: string };
		email: string;
		role: 'editor' | 'viewer';
		invitedBy: SessionUser;
	},
	origin: string
) {
	const { token, tokenHash } = newToken();
	await db.insert(invitations).values({
		workspaceId: input.site.workspaceId,
		siteId: input.site.id,
		email: input.email,
		role: input.role,
		tokenHash,
		invitedBy: input.invitedBy.id,
		expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * HOUR_MS)
	});
	const who = input.invitedBy.name
		? `${input.invitedBy.name} (${input.invitedBy.email})`
		: input.invitedBy.email;
	await sendMail({
		to: input.email,
		subject: `${input.site.name} is shared with you on Runrate`,
		text: `${who} shares the site "${input.site.name}" with you on Runrate, as ${input.role === 'editor' ? 'an editor' : 'a viewer'} of that site only.\n\nOpen this link to accept (it works once, for ${INVITATION_DAYS} days):\n\n${origin}/invite/${token}\n`
	});
}

export async function siteGuests(siteId: string) {
	return db
		.select({ userId: users.id, name: users.name, email: users.email, role: siteGrants.role })
		.from(siteGrants)
		.innerJoin(users, eq(users.id, siteGrants.userId))
		.where(eq(siteGrants.siteId, siteId))
		.orderBy(asc(users.email));
}

export async function removeSiteGuest(siteId: string, userId: string) {
	await db.delete(siteGrants).where(and(eq(siteGrants.siteId, siteId), eq(siteGrants.userId, userId)));
}
