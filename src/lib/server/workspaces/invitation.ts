import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '../db';
import {
	invitations,
	memberships,
	siteGrants,
	sites,
	userTokens,
	users,
	workspaces,
	type Role
} from '../db/schema';
import { hashPassword } from '../auth/password';
import { HOUR_MS, hashToken, newToken } from '../auth/tokens';
import { sendMail } from '../mail';
import { MembershipRuleError } from './membership';

/** How long an invitation link works. */
export const INVITATION_DAYS = 7;

/** An invitation nobody has accepted or withdrawn and that has not expired yet. */
const isOpen = () =>
	and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date()));

/** The open invitation behind a link's token. */
const openByToken = (token: string) => and(eq(invitations.tokenHash, hashToken(token)), isOpen());

/** Stores an invitation and mails its link; the mail's wording is the caller's (workspace or site). */
async function sendInvitation(
	row: { workspaceId: string; siteId?: string; email: string; role: Role; invitedBy: SessionUser },
	mail: (inviter: string, link: string) => { subject: string; text: string },
	origin: string
) {
	const { token, tokenHash } = newToken();
	await db.insert(invitations).values({
		...row,
		tokenHash,
		invitedBy: row.invitedBy.id,
		expiresAt: new Date(Date.now() + INVITATION_DAYS * 24 * HOUR_MS)
	});
	const inviter = row.invitedBy.name ? `${row.invitedBy.name} (${row.invitedBy.email})` : row.invitedBy.email;
	await sendMail({ to: row.email, ...mail(inviter, `${origin}/invite/${token}`) });
}

const linkNote = (link: string) =>
	`Open this link to accept (it works once, for ${INVITATION_DAYS} days):\n\n${link}\n`;

/** Invites someone into the workspace by e-mail, unless they are a member already. */
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
	const { workspaceName, ...row } = input;
	await sendInvitation(
		row,
		(who, link) => ({
			subject: `You are invited to ${workspaceName} on Runrate`,
			text: `${who} invites you to join the workspace "${workspaceName}" on Runrate as ${input.role === 'editor' ? 'an editor' : `a ${input.role}`}.\n\n${linkNote(link)}`
		}),
		origin
	);
	return 'sent';
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
	const { site, ...rest } = input;
	await sendInvitation(
		{ workspaceId: site.workspaceId, siteId: site.id, ...rest },
		(who, link) => ({
			subject: `${site.name} is shared with you on Runrate`,
			text: `${who} shares the site "${site.name}" with you on Runrate, as ${input.role === 'editor' ? 'an editor' : 'a viewer'} of that site only.\n\n${linkNote(link)}`
		}),
		origin
	);
}

/** The workspace's invitations still waiting for an answer, for its owners. */
export async function listPendingInvitations(workspaceId: string) {
	return db
		.select({
			id: invitations.id,
			email: invitations.email,
			role: invitations.role,
			expiresAt: invitations.expiresAt
		})
		.from(invitations)
		.where(and(eq(invitations.workspaceId, workspaceId), isOpen()))
		.orderBy(asc(invitations.email));
}

/** Withdraws an invitation not yet accepted; its link stops working. */
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

/** The shape of a link's token; anything else is no invitation, and the database is not asked. */
const tokenSchema = z.string().min(20).max(100);

/**
 * The invitation behind a link, with the workspace's name, or null when the token is malformed, unknown,
 * used, revoked or expired.
 */
export async function findOpenInvitation(token: string) {
	if (!tokenSchema.safeParse(token).success) return null;
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
		.where(openByToken(token));
	return row ?? null;
}

/**
 * Accepts for someone signed in, only when the invitation was sent to their address: 'closed' when the
 * link no longer works, `{ sentTo }` when it is someone else's, else where the acceptance leads.
 */
export async function acceptAsUser(
	token: string,
	user: { id: string; email: string }
): Promise<'closed' | { sentTo: string } | { home: string }> {
	const invitation = await findOpenInvitation(token);
	if (!invitation) return 'closed';
	if (invitation.email !== user.email.toLowerCase()) return { sentTo: invitation.email };
	const accepted = await acceptInvitation(token, { userId: user.id });
	return accepted ? { home: invitationHome(accepted) } : 'closed';
}

/**
 * Accepts for someone without an account, who chooses a name and password here: 'closed' when the link no
 * longer works, `{ refused }` with the reason when the owner rule turns it down, else the acceptance.
 */
export async function joinByInvitation(token: string, who: { name: string; password: string }) {
	try {
		return (await acceptInvitation(token, who)) ?? ('closed' as const);
	} catch (e: unknown) {
		if (e instanceof MembershipRuleError) return { refused: e.message };
		throw e;
	}
}

/** Where an accepted invitation leads: the shared site, or the workspace. */
export const invitationHome = (accepted: { workspaceId: string; siteId: string | null }) =>
	accepted.siteId ? `/sites/${accepted.siteId}` : `/w/${accepted.workspaceId}`;

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
			.where(openByToken(token))
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
