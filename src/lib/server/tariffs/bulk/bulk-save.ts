import { and, eq, isNull, sql } from 'drizzle-orm';
import { db } from '../../db';
import { tariffs } from '../../db/schema';
import { insertTariff } from '../tariff.service';
import type { TariffSubmission } from '../submission';

export type Author = { id: string; name: string | null; email: string };
export type Saved = { kind: 'imported' | 'present'; id: string };

/**
 * Saves one rate as a public tariff in its own transaction, unless a public tariff with the same open
 * rate database label is already there (then nothing is written and its id comes back). A lock on the
 * label makes the check and the insert one step, so two imports of the same file at once save it once.
 */
export function savePublicRate(label: string, submission: TariffSubmission, author: Author): Promise<Saved> {
	return db.transaction(async (tx) => {
		await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${`urdb-label:${label}`}, 0))`);
		const [present] = await tx
			.select({ id: tariffs.id })
			.from(tariffs)
			.where(and(isNull(tariffs.workspaceId), eq(tariffs.urdbLabel, label)))
			.limit(1);
		if (present) return { kind: 'present', id: present.id };
		const { meta, version, structure } = submission;
		const id = await insertTariff(
			tx,
			{ meta, version, structure, workspaceId: null, urdbLabel: label },
			author
		);
		return { kind: 'imported', id };
	});
}
