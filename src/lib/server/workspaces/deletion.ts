import { and, eq, isNotNull, lte } from 'drizzle-orm';
import { db } from '../db';
import { workspaces } from '../db/schema';
import { purgeEndedSessions } from '../auth/sessions';
import { defineSchedule } from '../jobs';
import { logger } from '../log';

export const GRACE_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * Removes every workspace whose grace period is over; its sites, tariffs, bills, members and audit trail
 * go with it (the foreign keys cascade). Returns the ids removed.
 */
export async function purgeDeletedWorkspaces(now = new Date()): Promise<string[]> {
	const removed = await db
		.delete(workspaces)
		.where(and(isNotNull(workspaces.deleteAfter), lte(workspaces.deleteAfter, now)))
		.returning({ id: workspaces.id });
	if (removed.length) logger.info({ count: removed.length }, 'purged deleted workspaces');
	return removed.map((w) => w.id);
}

/**
 * The purge, hourly from the job queue: a workspace goes within the hour after its grace period even when
 * nobody opens the app. The queue runs each tick once across app processes; should two purges still overlap
 * (a retry), the second DELETE skips the rows the first removed, so it does no harm. The same tick clears
 * session rows that no token can use any more (expired or ended), which is just as idempotent.
 */
export const purgeJob = defineSchedule('workspace-purge', '0 * * * *', async () => {
	await purgeDeletedWorkspaces();
	const sessions = await purgeEndedSessions();
	if (sessions) logger.info({ count: sessions }, 'purged ended sessions');
});

/** Marks the workspace for deletion in GRACE_DAYS days; until then it stays whole and can be kept. */
export async function scheduleWorkspaceDeletion(workspaceId: string, now = new Date()): Promise<Date> {
	const deleteAfter = new Date(now.getTime() + GRACE_DAYS * DAY_MS);
	await db.update(workspaces).set({ deleteAfter }).where(eq(workspaces.id, workspaceId));
	return deleteAfter;
}

/** Keeps a workspace that was scheduled for deletion. */
export async function restoreWorkspace(workspaceId: string) {
	await db.update(workspaces).set({ deleteAfter: null }).where(eq(workspaces.id, workspaceId));
}

export async function deletionDate(workspaceId: string): Promise<Date | null> {
	const [row] = await db
		.select({ deleteAfter: workspaces.deleteAfter })
		.from(workspaces)
		.where(eq(workspaces.id, workspaceId));
	return row?.deleteAfter ?? null;
}
