import { asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { memberships, workspaces } from '../db/schema';

/** The workspaces a user belongs to, with their role there, by name (the workspace switcher, the tariff forms). */
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

/** Creates a workspace with its creator as owner, in one transaction; returns its id. */
export async function createWorkspace(name: string, ownerId: string): Promise<string> {
	return db.transaction(async (tx) => {
		const [ws] = await tx.insert(workspaces).values({ name }).returning({ id: workspaces.id });
		await tx.insert(memberships).values({ workspaceId: ws!.id, userId: ownerId, role: 'owner' });
		return ws!.id;
	});
}

/** Gives the workspace a new name. */
export async function renameWorkspace(workspaceId: string, name: string) {
	await db.update(workspaces).set({ name }).where(eq(workspaces.id, workspaceId));
}

/** Deletes at once; owners go through scheduleWorkspaceDeletion (workspaces/deletion.ts) instead. */
export async function deleteWorkspace(workspaceId: string) {
	await db.delete(workspaces).where(eq(workspaces.id, workspaceId));
}

/**
 * The confirm-by-name rule: deleting a workspace needs its name typed exactly (surrounding spaces aside),
 * so a slip of the mouse cannot start it.
 */
export const confirmsWorkspaceName = (typed: unknown, workspaceName: string): boolean =>
	String(typed ?? '').trim() === workspaceName;
