// Saving one imported open-rate-database rate in the library, once per label and place.
import { and, eq, inArray, isNull, or, sql } from 'drizzle-orm';
import { db } from '../db';
import { tariffs } from '../db/schema';
import type { TariffSubmission } from './submission';
import { insertTariff } from './tariff.service';

type Author = { id: string; name: string | null; email: string };

/** A tariff already imported from that label, where the new one would go. */
export type ExistingImport = { id: string; name: string };

/** The tariff imported from `label` into that workspace (null: the public library), if any. */
export async function findImported(
	label: string,
	workspaceId: string | null,
	tx: Pick<typeof db, 'select'> = db
): Promise<ExistingImport | null> {
	const [row] = await tx
		.select({ id: tariffs.id, name: tariffs.name })
		.from(tariffs)
		.where(
			and(
				eq(tariffs.urdbLabel, label),
				workspaceId ? eq(tariffs.workspaceId, workspaceId) : isNull(tariffs.workspaceId)
			)
		)
		.limit(1);
	return row ?? null;
}

/** The tariffs imported from `label` that a reader of those workspaces sees: public ones and theirs. */
export function importedCopies(label: string, workspaceIds: string[]) {
	const visible = workspaceIds.length
		? or(isNull(tariffs.workspaceId), inArray(tariffs.workspaceId, workspaceIds))
		: isNull(tariffs.workspaceId);
	return db
		.select({ id: tariffs.id, name: tariffs.name, isPublic: sql<boolean>`${tariffs.workspaceId} is null` })
		.from(tariffs)
		.where(and(eq(tariffs.urdbLabel, label), visible))
		.orderBy(tariffs.createdAt)
		.limit(10);
}

/**
 * Saves a checked submission as a tariff with its first version, carrying the rate's label — unless
 * that place (the workspace, or the public library) already holds a tariff imported from the same
 * label, which it answers instead. One transaction; an advisory lock on the label and place makes two
 * saves at once find each other rather than both insert. The caller has checked the author's right.
 */
export function saveUrdbTariff(
	submission: Pick<TariffSubmission, 'meta' | 'version' | 'structure'>,
	target: { label: string | null; workspaceId: string | null },
	author: Author
): Promise<{ saved: string } | { existing: ExistingImport }> {
	const { label, workspaceId } = target;
	return db.transaction(async (tx) => {
		if (label !== null) {
			await tx.execute(
				sql`select pg_advisory_xact_lock(hashtext(${`urdb:${workspaceId ?? 'public'}:${label}`}))`
			);
			const existing = await findImported(label, workspaceId, tx);
			if (existing) return { existing };
		}
		const { meta, version, structure } = submission;
		const saved = await insertTariff(tx, { meta, version, structure, workspaceId, urdbLabel: label }, author);
		return { saved };
	});
}
