import { and, asc, eq, gte, lte, ne } from 'drizzle-orm';
import type { BillInput } from '$lib/forms/bill.schema';
import { db } from '../db';
import { bills } from '../db/schema';
import { audit, type Actor } from '../services/audit.service';
import { StaleWrite, type SiteRow } from '$lib/server/sites/site.service';

export type BillRow = typeof bills.$inferSelect;

export async function listBills(siteId: string) {
	return db.select().from(bills).where(eq(bills.siteId, siteId)).orderBy(asc(bills.periodFrom));
}

export async function findBill(billId: string) {
	const [bill] = await db.select().from(bills).where(eq(bills.id, billId));
	return bill ?? null;
}

/** Bills of the site whose period shares at least one day with from–to (inclusive). */
export async function overlappingBills(siteId: string, from: string, to: string, exceptId?: string) {
	return db
		.select({ id: bills.id, periodFrom: bills.periodFrom, periodTo: bills.periodTo })
		.from(bills)
		.where(
			and(
				eq(bills.siteId, siteId),
				lte(bills.periodFrom, to),
				gte(bills.periodTo, from),
				...(exceptId ? [ne(bills.id, exceptId)] : [])
			)
		);
}

const words = (b: BillInput) => `${b.periodFrom} to ${b.periodTo}: ${b.kwh} kWh, ${b.amount}`;

/** Saves several bills in one transaction (the form's one, or a sheet's rows): all of them or none. */
export async function createBills(site: SiteRow, inputs: BillInput[], actor: Actor): Promise<string[]> {
	return db.transaction(async (tx) => {
		const rows = await tx
			.insert(bills)
			.values(inputs.map((b) => ({ ...b, siteId: site.id })))
			.returning({ id: bills.id });
		for (const [i, row] of rows.entries()) {
			await audit(tx, actor, {
				workspaceId: site.workspaceId,
				siteId: site.id,
				entity: 'bill',
				entityId: row.id,
				action: 'created',
				summary: `Bill ${words(inputs[i]!)}`
			});
		}
		return rows.map((r) => r.id);
	});
}

export async function updateBill(
	site: SiteRow,
	bill: BillRow,
	expectedRevision: number,
	input: BillInput,
	actor: Actor
) {
	return db.transaction(async (tx) => {
		const [saved] = await tx
			.update(bills)
			.set({ ...input, revision: expectedRevision + 1, updatedAt: new Date() })
			.where(and(eq(bills.id, bill.id), eq(bills.revision, expectedRevision)))
			.returning({ revision: bills.revision });
		if (!saved) throw new StaleWrite(bill.revision);
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'bill',
			entityId: bill.id,
			action: 'updated',
			summary: `Bill changed to ${words(input)}`
		});
		return saved.revision;
	});
}

export async function deleteBill(site: SiteRow, bill: BillRow, actor: Actor) {
	await db.transaction(async (tx) => {
		await tx.delete(bills).where(eq(bills.id, bill.id));
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'bill',
			entityId: bill.id,
			action: 'deleted',
			summary: `Deleted the bill ${bill.periodFrom} to ${bill.periodTo}`
		});
	});
}
