import { Readable } from 'node:stream';
import { deleteObject, getObject, putObject } from '../../storage/object-store';

/**
 * A bulk file in the object store, in parts. The server takes no body over 11 MB (BODY_SIZE_LIMIT), so
 * the page sends a big file in parts of at most 8 MiB, each stored as it arrives; the job then reads
 * the parts one after another as one stream. No part is held longer than its own request, and the
 * file is never whole in memory anywhere.
 */

export const PART_BYTES = 8 * 1024 * 1024;
/** 125 parts of 8 MiB: a little over 1 GB, past the database's whole bulk export. */
export const MAX_PARTS = 125;
export const MAX_FILE_BYTES = PART_BYTES * MAX_PARTS;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUploadId = (id: string) => UUID.test(id);

const partKey = (uploadId: string, part: number) => `urdb-bulk/${uploadId}/${String(part).padStart(4, '0')}`;

export async function putPart(uploadId: string, part: number, bytes: Uint8Array): Promise<void> {
	await putObject(partKey(uploadId, part), bytes, 'application/octet-stream');
}

/** The stored size of each of the first `parts` parts, or the number of the first one missing (1-based). */
export async function partSizes(uploadId: string, parts: number): Promise<number[] | { missing: number }> {
	const sizes: number[] = [];
	for (let part = 0; part < parts; part += 1) {
		const found = await getObject(partKey(uploadId, part));
		if (!found) return { missing: part + 1 };
		await found.body.cancel();
		sizes.push(found.bytes);
	}
	return sizes;
}

/** The parts one after another, each fetched only when the one before is read. */
export async function* uploadBytes(uploadId: string, parts: number): AsyncGenerator<Uint8Array> {
	for (let part = 0; part < parts; part += 1) {
		const found = await getObject(partKey(uploadId, part));
		if (!found) throw new Error(`Part ${part + 1} of the upload is gone from the store`);
		for await (const chunk of Readable.fromWeb(found.body as never)) yield chunk as Uint8Array;
	}
}

/** Removes the upload's parts once the import is over (missing ones are no error). */
export async function dropUpload(uploadId: string, parts: number): Promise<void> {
	for (let part = 0; part < parts; part += 1) await deleteObject(partKey(uploadId, part));
}
