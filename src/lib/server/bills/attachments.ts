import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import { db } from '../db';
import { billAttachments, bills } from '../db/schema';
import { logger } from '../log';
import { audit, type Actor } from '../workspaces/audit';
import { deleteObject, getObject, putObject, type StoredObject } from '../storage/object-store';
import {
	checkUpload,
	displayName,
	sizeWords,
	type AttachmentType,
	type UploadRefusal
} from './attachments-check';

export { ATTACHMENT_EXTENSIONS, checkUpload, MAX_ATTACHMENT_BYTES } from './attachments-check';
export type { AttachmentType, UploadRefusal } from './attachments-check';

type SiteRef = { id: string; workspaceId: string };
export type AttachmentRow = typeof billAttachments.$inferSelect;

/** What a page or the API shows of an attachment: never the storage key. */
export type AttachmentSummary = {
	id: string;
	fileName: string;
	contentType: AttachmentType;
	bytes: number;
	createdAt: string;
};

const summary = (row: AttachmentRow): AttachmentSummary => ({
	id: row.id,
	fileName: row.fileName,
	contentType: row.contentType as AttachmentType,
	bytes: row.bytes,
	createdAt: row.createdAt.toISOString()
});

/**
 * Checks the upload (checkUpload), stores it under a random key (no user text in it) and records the
 * row and its audit entry in one transaction. The object goes first, so a row never points at nothing;
 * if the insert fails, the object is removed again. The caller has checked that the bill is the site's.
 */
export async function addAttachment(
	site: SiteRef,
	billId: string,
	file: { bytes: Uint8Array; name: string },
	actor: Actor
): Promise<{ attachment: AttachmentSummary } | UploadRefusal> {
	const checked = await checkUpload(file.bytes, file.name);
	if ('message' in checked) return checked;
	const fileName = displayName(file.name, checked.contentType);
	const storageKey = `bill-attachments/${randomUUID()}`;
	await putObject(storageKey, file.bytes, checked.contentType);
	try {
		const row = await db.transaction(async (tx) => {
			const [row] = await tx
				.insert(billAttachments)
				.values({
					billId,
					storageKey,
					contentType: checked.contentType,
					bytes: file.bytes.byteLength,
					fileName,
					uploadedBy: actor.id
				})
				.returning();
			await audit(tx, actor, {
				workspaceId: site.workspaceId,
				siteId: site.id,
				entity: 'bill',
				entityId: billId,
				action: 'attached',
				summary: `Attached "${fileName}" (${sizeWords(file.bytes.byteLength)}) to the bill`
			});
			return row!;
		});
		return { attachment: summary(row) };
	} catch (error) {
		await discardObjects([storageKey]);
		throw error;
	}
}

/** The bill's attachments, oldest first. */
export async function listAttachments(billId: string): Promise<AttachmentSummary[]> {
	const rows = await db
		.select()
		.from(billAttachments)
		.where(eq(billAttachments.billId, billId))
		.orderBy(asc(billAttachments.createdAt), asc(billAttachments.id));
	return rows.map(summary);
}

/** One attachment with the site its bill belongs to, for the route's access check; null if unknown. */
export async function findAttachment(attachmentId: string) {
	const [found] = await db
		.select({ attachment: billAttachments, siteId: bills.siteId })
		.from(billAttachments)
		.innerJoin(bills, eq(bills.id, billAttachments.billId))
		.where(eq(billAttachments.id, attachmentId));
	return found ?? null;
}

/** The attachment's row and stored bytes (a stream), or null when either is missing. */
export async function readAttachment(
	attachmentId: string
): Promise<{ attachment: AttachmentSummary; object: StoredObject } | null> {
	const found = await findAttachment(attachmentId);
	if (!found) return null;
	const object = await getObject(found.attachment.storageKey);
	return object ? { attachment: summary(found.attachment), object } : null;
}

/**
 * Removes the row (with its audit entry) and then the object. Only an attachment of one of this site's
 * bills is touched; returns false when there is none. An object left behind by a failed removal is
 * logged: it is unreachable without its row.
 */
export async function removeAttachment(site: SiteRef, attachmentId: string, actor: Actor): Promise<boolean> {
	const removed = await db.transaction(async (tx) => {
		const [row] = await tx
			.select({ attachment: billAttachments })
			.from(billAttachments)
			.innerJoin(bills, eq(bills.id, billAttachments.billId))
			.where(and(eq(billAttachments.id, attachmentId), eq(bills.siteId, site.id)));
		if (!row) return null;
		await tx.delete(billAttachments).where(eq(billAttachments.id, attachmentId));
		await audit(tx, actor, {
			workspaceId: site.workspaceId,
			siteId: site.id,
			entity: 'bill',
			entityId: row.attachment.billId,
			action: 'detached',
			summary: `Removed the attachment "${row.attachment.fileName}" from the bill`
		});
		return row.attachment;
	});
	if (!removed) return false;
	await discardObjects([removed.storageKey]);
	return true;
}

/** The storage keys of a bill's attachments: deleting the bill cascades the rows, not the objects. */
export async function attachmentKeys(billId: string): Promise<string[]> {
	const rows = await db
		.select({ key: billAttachments.storageKey })
		.from(billAttachments)
		.where(eq(billAttachments.billId, billId));
	return rows.map((r) => r.key);
}

/** Best-effort removal of objects whose rows are gone (or never came): a failure is logged, not thrown. */
export async function discardObjects(keys: string[]): Promise<void> {
	for (const key of keys) {
		try {
			await deleteObject(key);
		} catch (error) {
			logger.error({ err: error, key }, 'could not remove a stored bill attachment');
		}
	}
}
