import { desc, eq } from 'drizzle-orm';
import { db, type Tx } from '../db';
import { auditEvents } from '../db/schema';

export type Actor = { id: string; name: string | null; email: string };
export type AuditEntry = {
	workspaceId: string;
	siteId: string | null;
	entity: 'site' | 'scenario' | 'device' | 'bill';
	entityId: string;
	action: string;
	summary: string;
	changes?: Record<string, { from: unknown; to: unknown }>;
};

/** Records a change in the same transaction as the change itself, so the trail never misses one. */
export async function audit(tx: Tx, actor: Actor, entry: AuditEntry) {
	await tx.insert(auditEvents).values({ ...entry, userId: actor.id, userName: actor.name ?? actor.email });
}

/** The fields whose values differ, for the trail ("name: Pump → Main pump"). */
export function changedFields<T extends Record<string, unknown>>(before: T, after: Partial<T>) {
	const changes: Record<string, { from: unknown; to: unknown }> = {};
	for (const [key, to] of Object.entries(after)) {
		const from = before[key];
		if (JSON.stringify(from ?? null) !== JSON.stringify(to ?? null))
			changes[key] = { from: from ?? null, to: to ?? null };
	}
	return changes;
}

export async function siteTrail(siteId: string, limit = 100) {
	return db
		.select({
			id: auditEvents.id,
			userName: auditEvents.userName,
			entity: auditEvents.entity,
			action: auditEvents.action,
			summary: auditEvents.summary,
			changes: auditEvents.changes,
			createdAt: auditEvents.createdAt
		})
		.from(auditEvents)
		.where(eq(auditEvents.siteId, siteId))
		.orderBy(desc(auditEvents.createdAt))
		.limit(limit);
}
