import { and, asc, eq, gte, lte, ne } from 'drizzle-orm';
import type { BillInput } from '$lib/forms/bill.schema';
import { db } from '../db';
import { bills } from '../db/schema';
import { audit, type Actor } from '../workspaces/audit';
import { StaleWrite, type SiteRow } from '$lib/server/sites/site.service';
import type { SheetKind } from '$lib/server/sheets/read-sheet';
import { attachmentKeys, discardObjects } from './attachments';
import { parseBillSheet } from './bill-sheet';

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

/** Another bill of the site whose period overlaps the one being saved. */
export type Overlap = { id: string; periodFrom: string; periodTo: string };

/**
 * What came of saving a bill: saved (with its id), or nothing written because its period overlaps other
 * bills and the person has not confirmed that, or because someone saved the bill since it was read.
 */
export type BillSave =
	{ ok: true; id: string } | { ok: false; overlaps: Overlap[] } | { ok: false; conflict: number };

/** Adds a bill, unless its period overlaps another bill of the site and `confirmOverlap` is not set. */
export async function addBill(
	site: SiteRow,
	input: BillInput,
	confirmOverlap: boolean,
	actor: Actor
): Promise<{ ok: true; id: string } | { ok: false; overlaps: Overlap[] }> {
	const overlaps = await overlappingBills(site.id, input.periodFrom, input.periodTo);
	if (overlaps.length && !confirmOverlap) return { ok: false, overlaps };
	const [id] = await createBills(site, [input], actor);
	return { ok: true, id: id! };
}

/**
 * Changes a bill against the revision the person edited, unless its new period overlaps another bill of
 * the site and `confirmOverlap` is not set. The form and the API both save through here.
 */
export async function changeBill(
	site: SiteRow,
	bill: BillRow,
	expectedRevision: number,
	input: BillInput,
	confirmOverlap: boolean,
	actor: Actor
): Promise<BillSave> {
	const overlaps = await overlappingBills(site.id, input.periodFrom, input.periodTo, bill.id);
	if (overlaps.length && !confirmOverlap) return { ok: false, overlaps };
	try {
		await updateBill(site, bill, expectedRevision, input, actor);
	} catch (e) {
		if (e instanceof StaleWrite) return { ok: false, conflict: e.currentRevision };
		throw e;
	}
	return { ok: true, id: bill.id };
}

/** Deletes a bill, then its stored files (once the row is gone, nothing can reach them). */
export async function removeBill(site: SiteRow, bill: BillRow, actor: Actor) {
	const keys = await attachmentKeys(bill.id);
	await deleteBill(site, bill, actor);
	await discardObjects(keys);
}

/**
 * Imports a bill sheet: every row, or none when any row is refused (each refusal as "Row n, field:
 * message") or there are no rows.
 */
export async function importBillSheet(
	site: SiteRow,
	bytes: Uint8Array,
	kind: SheetKind,
	actor: Actor
): Promise<{ ok: true; imported: number } | { ok: false; sheetError: string; refused: string[] }> {
	const sheet = await parseBillSheet(bytes, kind, await listBills(site.id));
	if ('error' in sheet) return { ok: false, sheetError: sheet.error, refused: [] };
	const refused = sheet.errors.map((e) => `Row ${e.line}, ${e.field}: ${e.message}`);
	if (refused.length || sheet.rows.length === 0) {
		const sheetError = refused.length
			? 'Nothing was imported: fix these rows and import the sheet again.'
			: 'No bill rows.';
		return { ok: false, sheetError, refused };
	}
	await createBills(
		site,
		sheet.rows.map((r) => r.bill),
		actor
	);
	return { ok: true, imported: sheet.rows.length };
}
