import { and, asc, count, eq, sql, type SQL } from 'drizzle-orm';
import { db, type Tx } from '../db';
import { memberships, siteGrants, users, workspaces, type Role } from '../db/schema';

/** A membership change the owner rule refuses; its message is shown on the form as it is. */
export class MembershipRuleError extends Error {}

const memberOf = (workspaceId: string, userId: string) =>
	and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId));

/** The workspace and the user's role there, or null when they are not a member (the guard's one lookup). */
export async function findMembership(workspaceId: string, userId: string) {
	const [row] = await membershipQuery.execute({ workspaceId, userId });
	return row ?? null;
}

// Built once: every page inside a workspace runs it, and building a query costs more CPU than sending it.
const membershipQuery = db
	.select({ id: workspaces.id, name: workspaces.name, role: memberships.role })
	.from(memberships)
	.innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
	.where(
		and(
			eq(memberships.workspaceId, sql.placeholder('workspaceId')),
			eq(memberships.userId, sql.placeholder('userId'))
		)
	)
	.prepare('find_membership');

/** The user's role in the workspace, or null when they are not a member. */
export async function memberRole(userId: string, workspaceId: string): Promise<Role | null> {
	const [row] = await db
		.select({ role: memberships.role })
		.from(memberships)
		.where(memberOf(workspaceId, userId));
	return row?.role ?? null;
}

/** The role a site was shared with the user at (editor or viewer), or null when it was not shared with them. */
export async function siteGrantRole(siteId: string, userId: string): Promise<Role | null> {
	const [grant] = await db
		.select({ role: siteGrants.role })
		.from(siteGrants)
		.where(and(eq(siteGrants.siteId, siteId), eq(siteGrants.userId, userId)));
	return grant?.role ?? null;
}

/** The people a membership or a site grant names, with its role, by e-mail. */
function peopleIn<T extends typeof memberships | typeof siteGrants>(grants: T, where: SQL) {
	return (
		db
			.select({ userId: users.id, name: users.name, email: users.email, role: grants.role as T['role'] })
			// Both tables have the same user and role columns; Drizzle's `from` only wants one table type.
			.from(grants as typeof memberships)
			.innerJoin(users, eq(users.id, grants.userId))
			.where(where)
			.orderBy(asc(users.email))
	);
}

/** The members of a workspace with their roles, by e-mail, for the workspace page. */
export async function listMembers(workspaceId: string) {
	return peopleIn(memberships, eq(memberships.workspaceId, workspaceId));
}

/** Locks the workspace's owner rows for the transaction and returns who the owners are. */
async function lockOwners(tx: Tx, workspaceId: string): Promise<string[]> {
	const owners = await tx
		.select({ userId: memberships.userId })
		.from(memberships)
		.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')))
		.for('update');
	return owners.map((o) => o.userId);
}

/** Whether `userId` is the workspace's one owner (so they may neither step down nor leave). */
const isLastOwner = (owners: string[], userId: string) => owners.length === 1 && owners[0] === userId;

/**
 * Changes a member's role inside a transaction that locks the workspace's owner rows, so two owners
 * demoting each other at once cannot leave the workspace without one.
 */
export async function changeRole(workspaceId: string, userId: string, role: Role) {
	await db.transaction(async (tx) => {
		const owners = await lockOwners(tx, workspaceId);
		if (role !== 'owner' && isLastOwner(owners, userId))
			throw new MembershipRuleError('A workspace needs an owner: make someone else owner first.');
		const updated = await tx
			.update(memberships)
			.set({ role })
			.where(memberOf(workspaceId, userId))
			.returning({ userId: memberships.userId });
		if (updated.length === 0) throw new MembershipRuleError('That person is not a member of this workspace.');
	});
}

/** Removes a member (or lets one leave); the last owner can do neither. */
export async function removeMember(workspaceId: string, userId: string) {
	await db.transaction(async (tx) => {
		if (isLastOwner(await lockOwners(tx, workspaceId), userId))
			throw new MembershipRuleError(
				'The last owner cannot leave: make someone else owner first, or delete the workspace.'
			);
		await tx.delete(memberships).where(memberOf(workspaceId, userId));
	});
}

/** How many owners the workspace has. */
export async function countOwners(workspaceId: string): Promise<number> {
	const [row] = await db
		.select({ n: count() })
		.from(memberships)
		.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, 'owner')));
	return row?.n ?? 0;
}

/** The people one site is shared with (outside its workspace), with their grant's role. */
export async function siteGuests(siteId: string) {
	return peopleIn(siteGrants, eq(siteGrants.siteId, siteId));
}

/** Stops sharing a site with one guest. */
export async function removeSiteGuest(siteId: string, userId: string) {
	await db.delete(siteGrants).where(and(eq(siteGrants.siteId, siteId), eq(siteGrants.userId, userId)));
}
