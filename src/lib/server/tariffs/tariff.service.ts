import { and, asc, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import type { TariffInput } from '$lib/calc';
import type { TariffMeta, VersionMeta } from '$lib/forms/tariff-meta.schema';
import { db } from '../db';
import { memberships, tariffs, tariffVersions, type HolidayRule } from '../db/schema';

export type TariffRow = typeof tariffs.$inferSelect;
export type VersionRow = typeof tariffVersions.$inferSelect;

export class TariffConflict extends Error {
	constructor(readonly currentRevision: number) {
		super('Someone else published a version of this tariff while you were editing.');
	}
}

/** The workspaces whose private tariffs this user may read. */
export async function workspaceIdsOf(userId: string | undefined): Promise<string[]> {
	if (!userId) return [];
	const rows = await db
		.select({ id: memberships.workspaceId })
		.from(memberships)
		.where(eq(memberships.userId, userId));
	return rows.map((r) => r.id);
}

const visibleTo = (workspaceIds: string[]): SQL =>
	workspaceIds.length
		? or(isNull(tariffs.workspaceId), inArray(tariffs.workspaceId, workspaceIds))!
		: isNull(tariffs.workspaceId);

export type TariffFilters = {
	q?: string;
	country?: string;
	region?: string;
	customerClass?: string;
	feature?: 'tou' | 'tiers' | 'demand';
	scope?: 'public' | 'private';
	sort?: 'name' | 'utility' | 'updated';
	page?: number;
	pageSize?: number;
};

/**
 * The library's search: text over utility, name, code, area and open-data label; filters; newest
 * version's features.
 */
export async function searchTariffs(workspaceIds: string[], f: TariffFilters) {
	const latest = sql`(select structure from tariff_version v where v.tariff_id = ${tariffs.id} order by v.number desc limit 1)`;
	const where: SQL[] = [visibleTo(workspaceIds)];
	if (f.q) {
		const like = `%${f.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
		where.push(
			or(
				ilike(tariffs.utility, like),
				ilike(tariffs.name, like),
				ilike(tariffs.code, like),
				ilike(tariffs.area, like),
				ilike(tariffs.urdbLabel, like)
			)!
		);
	}
	if (f.country) where.push(eq(tariffs.country, f.country));
	if (f.region) where.push(eq(tariffs.region, f.region));
	if (f.customerClass) where.push(eq(tariffs.customerClass, f.customerClass));
	if (f.scope === 'public') where.push(isNull(tariffs.workspaceId));
	if (f.scope === 'private') where.push(sql`${tariffs.workspaceId} is not null`);
	if (f.feature === 'tou') where.push(sql`${latest} @? '$.energyCharges[*] ? (@.type == "tou")'`);
	if (f.feature === 'tiers') where.push(sql`${latest} @? '$.energyCharges[*] ? (@.type == "tiered")'`);
	if (f.feature === 'demand')
		where.push(sql`jsonb_array_length(coalesce(${latest} -> 'demandCharges', '[]'::jsonb)) > 0`);
	const order =
		f.sort === 'utility'
			? [asc(tariffs.utility), asc(tariffs.name)]
			: f.sort === 'updated'
				? [desc(tariffs.updatedAt)]
				: [asc(tariffs.name)];
	const pageSize = Math.min(Math.max(f.pageSize ?? 20, 1), 100);
	const page = Math.max(f.page ?? 1, 1);
	const rows = await db
		.select({ tariff: tariffs, total: sql<number>`count(*) over ()`.mapWith(Number) })
		.from(tariffs)
		.where(and(...where))
		.orderBy(...order)
		.limit(pageSize)
		.offset((page - 1) * pageSize);
	return {
		page,
		pageSize,
		total: rows[0]?.total ?? 0,
		items: await withVersions(rows.map((r) => r.tariff))
	};
}

/** Each tariff with its versions, oldest first: one query for them all, grouped by tariff. */
export async function withVersions(rows: TariffRow[]) {
	const versions = rows.length
		? await db
				.select()
				.from(tariffVersions)
				.where(
					inArray(
						tariffVersions.tariffId,
						rows.map((r) => r.id)
					)
				)
				.orderBy(asc(tariffVersions.number))
		: [];
	const byTariff = new Map<string, VersionRow[]>();
	for (const version of versions) {
		const list = byTariff.get(version.tariffId);
		if (list) list.push(version);
		else byTariff.set(version.tariffId, [version]);
	}
	return rows.map((tariff) => ({ tariff, versions: byTariff.get(tariff.id) ?? [] }));
}

export async function findTariff(id: string) {
	const [tariff] = await db.select().from(tariffs).where(eq(tariffs.id, id));
	if (!tariff) return null;
	const versions = await db
		.select()
		.from(tariffVersions)
		.where(eq(tariffVersions.tariffId, id))
		.orderBy(asc(tariffVersions.number));
	return { tariff, versions };
}

type Author = { id: string; name: string | null; email: string };

export type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];
type NewTariff = {
	meta: TariffMeta & { holidays: HolidayRule };
	version: VersionMeta;
	structure: TariffInput;
	workspaceId: string | null;
	copiedFromId?: string;
	/** The open rate database's label of the rate it was imported from. */
	urdbLabel?: string | null;
};

/** Inserts a tariff and its first version inside the caller's transaction. */
export async function insertTariff(tx: Tx, input: NewTariff, author: Author): Promise<string> {
	const { holidays, ...meta } = input.meta;
	const [row] = await tx
		.insert(tariffs)
		.values({
			...meta,
			holidays,
			workspaceId: input.workspaceId,
			copiedFromId: input.copiedFromId ?? null,
			urdbLabel: input.urdbLabel ?? null,
			revision: 1,
			createdBy: author.id
		})
		.returning({ id: tariffs.id });
	await tx.insert(tariffVersions).values({
		tariffId: row!.id,
		number: 1,
		...input.version,
		structure: input.structure,
		publishedBy: author.id,
		publishedByName: author.name ?? author.email
	});
	return row!.id;
}

/** Creates a tariff with its first version, in one transaction. */
export function createTariff(input: NewTariff, author: Author): Promise<string> {
	return db.transaction((tx) => insertTariff(tx, input, author));
}

/**
 * Publishes a new version (and the tariff's details as edited). Published versions are never changed:
 * this always adds one. `expectedRevision` is the revision the editor loaded; if someone published in
 * between, nothing is written and TariffConflict tells the caller (409).
 */
export async function publishVersion(
	tariffId: string,
	expectedRevision: number,
	input: { meta: TariffMeta & { holidays: HolidayRule }; version: VersionMeta; structure: TariffInput },
	author: Author
): Promise<{ number: number; previous: VersionRow | null }> {
	return db.transaction(async (tx) => {
		const { holidays, ...meta } = input.meta;
		const [bumped] = await tx
			.update(tariffs)
			.set({ ...meta, holidays, revision: sql`${tariffs.revision} + 1`, updatedAt: new Date() })
			.where(and(eq(tariffs.id, tariffId), eq(tariffs.revision, expectedRevision)))
			.returning({ revision: tariffs.revision });
		if (!bumped) {
			const [current] = await tx
				.select({ revision: tariffs.revision })
				.from(tariffs)
				.where(eq(tariffs.id, tariffId));
			throw new TariffConflict(current?.revision ?? -1);
		}
		const [previous] = await tx
			.select()
			.from(tariffVersions)
			.where(eq(tariffVersions.tariffId, tariffId))
			.orderBy(desc(tariffVersions.number))
			.limit(1);
		const number = (previous?.number ?? 0) + 1;
		await tx.insert(tariffVersions).values({
			tariffId,
			number,
			...input.version,
			structure: input.structure,
			publishedBy: author.id,
			publishedByName: author.name ?? author.email
		});
		return { number, previous: previous ?? null };
	});
}

/** A workspace's own editable copy of a tariff (public or another of its own), from its newest version. */
export async function copyTariff(sourceId: string, workspaceId: string, author: Author): Promise<string> {
	const found = await findTariff(sourceId);
	const latest = found?.versions.at(-1);
	if (!found || !latest) throw new Error('Tariff to copy not found');
	const t = found.tariff;
	return createTariff(
		{
			meta: {
				utility: t.utility,
				name: `${t.name} (our copy)`,
				code: t.code,
				country: t.country,
				region: t.region,
				area: t.area,
				customerClass: t.customerClass as TariffMeta['customerClass'],
				currency: t.currency,
				timezone: t.timezone,
				holidays: t.holidays ?? null,
				description: t.description
			},
			version: {
				effectiveFrom: latest.effectiveFrom,
				effectiveTo: latest.effectiveTo,
				source: `Copied from the library tariff "${t.name}" version ${latest.number} (${latest.source})`,
				checkedOn: latest.checkedOn,
				changeNote: 'Copied from the public library.'
			},
			structure: latest.structure,
			workspaceId,
			copiedFromId: t.id
		},
		author
	);
}

/**
 * A batch import: every row becomes a tariff with its first version, all in one transaction, so a
 * failure part-way leaves nothing behind.
 */
export function importTariffs(
	rows: Omit<NewTariff, 'workspaceId'>[],
	workspaceId: string | null,
	author: Author
): Promise<string[]> {
	return db.transaction(async (tx) => {
		const ids: string[] = [];
		for (const row of rows) ids.push(await insertTariff(tx, { ...row, workspaceId }, author));
		return ids;
	});
}
