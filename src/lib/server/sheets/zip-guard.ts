import { createInflateRaw } from 'node:zlib';

/**
 * A look inside an uploaded XLSX workbook (a ZIP archive) before exceljs opens it: exceljs inflates
 * every part into memory, so a "zip bomb" — a small file whose parts unpack to gigabytes — would
 * exhaust the server. The guard reads the archive as JSZip (exceljs's unzipper) will, inflates each
 * part and counts the bytes that really come out, stopping at the cap: the sizes a file declares in
 * its headers are never trusted. Layouts JSZip would read differently from this guard (ZIP64, data
 * before the archive, split archives) are refused: no workbook Runrate takes needs them.
 */

/**
 * The cap on all parts together, unpacked. A sheet an import takes (2,000 rows of a few dozen columns)
 * unpacks to a few MB, so 20 MB still leaves room for styles, themes and a second sheet. It is this
 * tight because everything the sheet reader parses is unpacked text: the shared strings are held in
 * memory whole before the first row is read, and a sheet's XML costs parsing time by the byte. At 50 MB
 * a 2.5 MB file of 250,000 short rows (15 MB unpacked) got through to exceljs and held the server for
 * seconds; the row limit now stops that one, and this cap bounds what any one upload can cost.
 */
export const MAX_UNPACKED_BYTES = 20 * 1024 * 1024;
/** A workbook of one sheet has about a dozen parts; thousands only serve to make work. */
export const MAX_ZIP_ENTRIES = 1000;

export const NOT_A_WORKBOOK = 'The file is not a readable XLSX workbook';
export const TOO_BIG_UNPACKED = `This workbook unpacks to more than ${MAX_UNPACKED_BYTES / 1024 / 1024} MB, far more than any import sheet needs, so it was refused unread. Save just the sheet to import as a new workbook or as CSV, and import that.`;
export const TOO_MANY_PARTS = `This workbook holds more than ${MAX_ZIP_ENTRIES.toLocaleString('en-US')} parts, far more than any import sheet needs, so it was refused unread. Save just the sheet to import as a new workbook or as CSV, and import that.`;

// Record signatures and the fixed sizes of their headers (PKWARE APPNOTE 6.3, §4.3).
const END_SIGNATURE = Buffer.from([0x50, 0x4b, 0x05, 0x06]);
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
const END_BYTES = 22;
const CENTRAL_BYTES = 46;
const LOCAL_BYTES = 30;
/** A 16- or 32-bit field at its maximum means "see the ZIP64 record". */
const ZIP64_MARKS = [0xffff, 0xffffffff];
const STORED = 0;
const DEFLATED = 8;
const ENCRYPTED_FLAG = 1;

type Part = {
	name: string;
	method: number;
	flags: number;
	crc: number;
	compressedBytes: number;
	localOffset: number;
};

/** A part the guard has inflated and counted: its name, how it is packed, and its packed bytes. */
export type ZipEntry = {
	name: string;
	method: typeof STORED | typeof DEFLATED;
	crc: number;
	unpackedBytes: number;
	data: Buffer;
};

/** The parts the central directory lists, or why the archive is refused. */
function centralDirectory(zip: Buffer): Part[] | string {
	// JSZip takes the last end record in the file; so does the guard, to read the same archive.
	const end = zip.lastIndexOf(END_SIGNATURE);
	if (end < 0 || end + END_BYTES > zip.byteLength) return NOT_A_WORKBOOK;
	const [disk, startDisk, onDisk, count] = [4, 6, 8, 10].map((at) => zip.readUInt16LE(end + at));
	const size = zip.readUInt32LE(end + 12);
	const offset = zip.readUInt32LE(end + 16);
	if ([onDisk, count, size, offset].some((field) => ZIP64_MARKS.includes(field!))) return NOT_A_WORKBOOK;
	if (disk !== 0 || startDisk !== 0 || onDisk !== count || offset + size !== end) return NOT_A_WORKBOOK;
	const parts: Part[] = [];
	// Records are read while their signature holds, as JSZip does, and must end at the end record.
	let at = offset;
	while (at + CENTRAL_BYTES <= end && zip.readUInt32LE(at) === CENTRAL) {
		if (parts.length === MAX_ZIP_ENTRIES) return TOO_MANY_PARTS;
		const compressedBytes = zip.readUInt32LE(at + 20);
		const localOffset = zip.readUInt32LE(at + 42);
		if ([compressedBytes, zip.readUInt32LE(at + 24), localOffset].some((f) => ZIP64_MARKS.includes(f)))
			return NOT_A_WORKBOOK;
		const nameBytes = zip.readUInt16LE(at + 28);
		parts.push({
			name: zip.toString('utf8', at + CENTRAL_BYTES, at + CENTRAL_BYTES + nameBytes),
			flags: zip.readUInt16LE(at + 8),
			method: zip.readUInt16LE(at + 10),
			crc: zip.readUInt32LE(at + 16),
			compressedBytes,
			localOffset
		});
		at += CENTRAL_BYTES + zip.readUInt16LE(at + 28) + zip.readUInt16LE(at + 30) + zip.readUInt16LE(at + 32);
	}
	if (at !== end || parts.length !== count) return NOT_A_WORKBOOK;
	return parts;
}

/** A part's compressed bytes: after its local header, as long as the central directory says. */
function dataOf(zip: Buffer, part: Part): Buffer | null {
	const header = part.localOffset;
	if (header + LOCAL_BYTES > zip.byteLength || zip.readUInt32LE(header) !== LOCAL) return null;
	const start = header + LOCAL_BYTES + zip.readUInt16LE(header + 26) + zip.readUInt16LE(header + 28);
	const stop = start + part.compressedBytes;
	return stop > zip.byteLength ? null : zip.subarray(start, stop);
}

/**
 * How many bytes a raw deflate stream inflates to, or 'over' as soon as that passes `limit` (the
 * inflating stops there, so no more than one chunk past the limit is ever made), or 'broken'. Only
 * the count is kept; each chunk is dropped as it comes.
 */
function inflatedBytes(data: Buffer, limit: number): Promise<number | 'over' | 'broken'> {
	if (data.byteLength === 0) return Promise.resolve(0);
	return new Promise((resolve) => {
		const inflater = createInflateRaw({ chunkSize: 64 * 1024 });
		let bytes = 0;
		inflater.on('data', (chunk: Buffer) => {
			bytes += chunk.byteLength;
			if (bytes <= limit) return;
			inflater.destroy();
			resolve('over');
		});
		inflater.on('end', () => resolve(bytes));
		inflater.on('error', () => resolve('broken'));
		inflater.end(data);
	});
}

/**
 * The archive's parts as JSZip would list them, each inflated once and counted, when it is one
 * exceljs can safely open: every part stored or deflated, none encrypted, at most MAX_ZIP_ENTRIES
 * parts unpacking to at most MAX_UNPACKED_BYTES in all. Otherwise the message for the person who
 * uploaded it.
 */
export async function readZip(bytes: Uint8Array): Promise<ZipEntry[] | string> {
	const zip = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
	const parts = centralDirectory(zip);
	if (typeof parts === 'string') return parts;
	const entries: ZipEntry[] = [];
	let unpacked = 0;
	for (const part of parts) {
		const data = dataOf(zip, part);
		if (!data || part.flags & ENCRYPTED_FLAG) return NOT_A_WORKBOOK;
		let unpackedBytes: number;
		if (part.method === STORED) unpackedBytes = data.byteLength;
		else if (part.method === DEFLATED) {
			// Parts may overlap in the file (one deflate stream listed many times), so each one counts.
			const bytes = await inflatedBytes(data, MAX_UNPACKED_BYTES - unpacked);
			if (bytes === 'broken') return NOT_A_WORKBOOK;
			if (bytes === 'over') return TOO_BIG_UNPACKED;
			unpackedBytes = bytes;
		} else return NOT_A_WORKBOOK;
		unpacked += unpackedBytes;
		if (unpacked > MAX_UNPACKED_BYTES) return TOO_BIG_UNPACKED;
		entries.push({
			name: part.name,
			method: part.method === STORED ? STORED : DEFLATED,
			crc: part.crc,
			unpackedBytes,
			data
		});
	}
	return entries;
}

/** Null when readZip accepts the archive, otherwise its message. */
export async function refuseZip(bytes: Uint8Array): Promise<string | null> {
	const entries = await readZip(bytes);
	return typeof entries === 'string' ? entries : null;
}
