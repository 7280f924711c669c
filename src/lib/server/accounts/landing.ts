import { eq, sql } from 'drizzle-orm';
import { db } from '../db';
import { memberships } from '../db/schema';

/** Where "Your workspaces" lives: the page for a person in none or several workspaces. */
export const WORKSPACES_PAGE = '/workspaces';

/**
 * Where a person's sites are: the sites list of their only workspace, or the workspaces list when they
 * are in none or several (they pick one there). Sign-in lands here and the main navigation's "Sites"
 * link goes here outside a workspace, so a grower with one farm is one click from their equipment.
 */
export async function sitesHomeFor(userId: string): Promise<string> {
	const rows = await firstTwoWorkspaces.execute({ userId });
	return sitesHomeOf(rows.map((r) => r.workspaceId));
}

/** As `sitesHomeFor`, from up to two of the person's workspace ids (the session check reads them). */
export function sitesHomeOf(someWorkspaces: string[]): string {
	return someWorkspaces.length === 1 ? `/w/${someWorkspaces[0]}/sites` : WORKSPACES_PAGE;
}

// Built once: every signed-in page's layout runs it.
const firstTwoWorkspaces = db
	.select({ workspaceId: memberships.workspaceId })
	.from(memberships)
	.where(eq(memberships.userId, sql.placeholder('userId')))
	.limit(2)
	.prepare('first_two_workspaces');
