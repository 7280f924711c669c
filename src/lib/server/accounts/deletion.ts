import { and, count, eq, inArray, ne } from 'drizzle-orm';
import { db } from '../db';
import { memberships, users, workspaces } from '../db/schema';

export type AccountDeletion =
	{ deleted: true; workspacesRemoved: string[] } | { deleted: false; blockers: string[] };

/**
 * Deletes a user's account. Refused while they are the last owner of a workspace that has other members
 * (the names of those workspaces come back, so they can hand over ownership or delete it first).
 * Otherwise the workspaces where they are the only member go at once, then the user: memberships, site
 * grants and sessions cascade; audit rows keep the name with the user id set to null.
 */
export async function deleteAccount(userId: string): Promise<AccountDeletion> {
	return db.transaction(async (tx) => {
		const mine = await tx
			.select({ workspaceId: memberships.workspaceId, role: memberships.role, name: workspaces.name })
			.from(memberships)
			.innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
			.where(eq(memberships.userId, userId))
			.for('update');
		const ids = mine.map((m) => m.workspaceId);
		const others = ids.length
			? await tx
					.select({ workspaceId: memberships.workspaceId, role: memberships.role, n: count() })
					.from(memberships)
					.where(and(inArray(memberships.workspaceId, ids), ne(memberships.userId, userId)))
					.groupBy(memberships.workspaceId, memberships.role)
			: [];
		const othersIn = (id: string) => others.filter((o) => o.workspaceId === id);
		const blockers = mine
			.filter((m) => m.role === 'owner')
			.filter((m) => {
				const rest = othersIn(m.workspaceId);
				return rest.length > 0 && !rest.some((o) => o.role === 'owner');
			})
			.map((m) => m.name)
			.sort((a, b) => a.localeCompare(b));
		if (blockers.length) return { deleted: false, blockers };
		const alone = mine.filter((m) => othersIn(m.workspaceId).length === 0).map((m) => m.workspaceId);
		if (alone.length) await tx.delete(workspaces).where(inArray(workspaces.id, alone));
		await tx.delete(users).where(eq(users.id, userId));
		return { deleted: true, workspacesRemoved: alone };
	});
}
