import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import { db } from './db';
import { memberships, workspaces } from './db/schema';

export type Role = 'owner' | 'editor' | 'viewer';
const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type WorkspaceAccess = { user: SessionUser; workspace: { id: string; name: string }; role: Role };

const isApi = (event: RequestEvent) => event.url.pathname.startsWith('/api/');

/** The signed-in user, or a redirect to sign-in (pages) / 401 (the API). */
export function requireUser(event: RequestEvent): SessionUser {
	const { user } = event.locals;
	if (user) return user;
	if (isApi(event) || event.request.method !== 'GET') error(401, 'Sign in first.');
	redirect(303, `/signin?next=${encodeURIComponent(event.url.pathname + event.url.search)}`);
}

/**
 * The one authorization check for anything inside a workspace. Someone who is not a member gets 404
 * (not 403), so nobody can learn which workspaces exist; a member below the needed role gets 403.
 */
export async function requireRole(
	event: RequestEvent,
	workspaceId: string,
	needed: Role
): Promise<WorkspaceAccess> {
	const user = requireUser(event);
	if (!UUID.test(workspaceId)) error(404, 'Not found');
	const [row] = await db
		.select({ id: workspaces.id, name: workspaces.name, role: memberships.role })
		.from(memberships)
		.innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
		.where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, user.id)));
	if (!row) error(404, 'Not found');
	if (RANK[row.role] < RANK[needed]) error(403, `This needs the ${needed} role; you are a ${row.role} here.`);
	return { user, workspace: { id: row.id, name: row.name }, role: row.role };
}

/** Platform admins curate the public tariff library. */
export function requireAdmin(event: RequestEvent): SessionUser {
	const user = requireUser(event);
	if (!user.isAdmin) error(403, 'Only platform admins may do this.');
	return user;
}

export const can = (role: Role, needed: Role) => RANK[role] >= RANK[needed];
