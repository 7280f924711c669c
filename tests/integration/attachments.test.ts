import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { crc32, deflateSync } from 'node:zlib';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { and, eq } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { auditEvents, billAttachments, bills } from '$lib/server/db/schema';
import {
	addAttachment,
	checkUpload,
	listAttachments,
	MAX_ATTACHMENT_BYTES,
	readAttachment,
	removeAttachment
} from '$lib/server/bills/attachments';
import type { Actor } from '$lib/server/workspaces/audit';
import type { SiteRow } from '$lib/server/sites/site.service';
import { createWorkspace } from '$lib/server/workspaces/workspace.service';
import { deleteObject, getObject, putObject } from '$lib/server/storage/object-store';
import { makeSite, makeUser } from './fixtures';

// Against the PostgreSQL and the local S3 stand-in that `node scripts/test.mjs integration` starts.
// Every person, site, bill and file here is invented test data.
const tag = `attach-${Date.now()}`;

/** A one-page blank PDF with a correct cross-reference table; `padTo` grows it with a comment line. */
function tinyPdf(padTo = 0): Uint8Array {
	const objects = [
		'<< /Type /Catalog /Pages 2 0 R >>',
		'<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
		'<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>'
	];
	const tail = (offsets: number[], xref: number) =>
		`xref\n0 4\n0000000000 65535 f \n${offsets.map((n) => `${String(n).padStart(10, '0')} 00000 n \n`).join('')}` +
		`trailer\n<< /Size 4 /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
	const build = (padding: string) => {
		let body = `%PDF-1.4\n${padding}`;
		const offsets = objects.map((o, i) => {
			const at = body.length;
			body += `${i + 1} 0 obj\n${o}\nendobj\n`;
			return at;
		});
		return body + tail(offsets, body.length);
	};
	// The padding moves the offsets, and longer offsets the end: settle on the length in a few rounds.
	let padding = '';
	for (let round = 0; round < 3 && padTo > 0; round++) {
		const short = padTo - build(padding).length;
		padding = `%${'x'.repeat(Math.max(0, padding.length + short - 2))}\n`;
	}
	return new TextEncoder().encode(build(padding));
}

const chunk = (type: string, data: Buffer) => {
	const typed = Buffer.concat([Buffer.from(type, 'latin1'), data]);
	const head = Buffer.alloc(4);
	head.writeUInt32BE(data.length);
	const crc = Buffer.alloc(4);
	crc.writeUInt32BE(crc32(typed));
	return Buffer.concat([head, typed, crc]);
};

/** A 1×1 grey PNG (ISO/IEC 15948): signature, IHDR, IDAT, IEND — optionally without IEND. */
function tinyPng({ withEnd = true } = {}): Uint8Array {
	const ihdr = Buffer.alloc(13);
	ihdr.writeUInt32BE(1, 0);
	ihdr.writeUInt32BE(1, 4);
	ihdr[8] = 8; // bit depth; colour type 0 (grey), no interlace
	const parts = [
		Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
		chunk('IHDR', ihdr),
		chunk('IDAT', deflateSync(Buffer.from([0, 0x80])))
	];
	return new Uint8Array(Buffer.concat(withEnd ? [...parts, chunk('IEND', Buffer.alloc(0))] : parts));
}

const segment = (marker: number, payload: number[]) => [0xff, marker, 0, payload.length + 2, ...payload];
const ascii = (s: string) => [...Buffer.from(s, 'latin1')];

/**
 * A JPEG's marker structure (ITU T.81): SOI, APP0, optionally an EXIF APP1 holding a thumbnail with its
 * own end marker, one scan with a stuffed FF 00 and a restart marker, EOI. Not a decodable picture:
 * enough for the signature and the end check.
 */
function tinyJpeg({ thumbnail = false, cut = false, trailer = false } = {}): Uint8Array {
	const scan = [0x12, 0xff, 0x00, 0x34, 0xff, 0xd0, 0x56, 0x78];
	const bytes = [
		0xff,
		0xd8,
		...segment(0xe0, [...ascii('JFIF\0'), 1, 1, 0, 0, 1, 0, 1, 0, 0]),
		...(thumbnail ? segment(0xe1, [...ascii('Exif\0\0'), 0xff, 0xd8, 0xff, 0xda, 0, 2, 9, 0xff, 0xd9]) : []),
		...segment(0xda, [1, 1, 0, 0, 63, 0]),
		...(cut ? scan.slice(0, 4) : [...scan, 0xff, 0xd9]),
		// Some phones append data after the end marker; an SOS-like pair in it must not matter.
		...(trailer ? [0x00, 0xff, 0xda, 0x11, 0x22] : [])
	];
	return new Uint8Array(bytes);
}

/** The first bytes of a 64-bit Linux program (ELF) and of a Windows one (PE, "MZ"). */
const elf = new Uint8Array([
	0x7f,
	0x45,
	0x4c,
	0x46,
	2,
	1,
	1,
	0,
	...new Array(8).fill(0),
	2,
	0,
	0x3e,
	0,
	1,
	0,
	0,
	0
]);
const pe = (() => {
	const b = Buffer.alloc(128);
	b.write('MZ', 0, 'latin1');
	b.writeUInt32LE(0x40, 0x3c);
	b.write('PE\0\0', 0x40, 'latin1');
	return new Uint8Array(b);
})();

/** A ZIP archive with one stored file (PKWARE APPNOTE: local header, central directory, end record). */
function tinyZip(): Uint8Array {
	const name = Buffer.from('bill.txt');
	const data = Buffer.from('invented test data');
	const local = Buffer.alloc(30);
	local.writeUInt32LE(0x04034b50, 0);
	local.writeUInt16LE(10, 4);
	local.writeUInt32LE(crc32(data), 14);
	local.writeUInt32LE(data.length, 18);
	local.writeUInt32LE(data.length, 22);
	local.writeUInt16LE(name.length, 26);
	const central = Buffer.alloc(46);
	central.writeUInt32LE(0x02014b50, 0);
	central.writeUInt16LE(10, 4);
	central.writeUInt16LE(10, 6);
	local.copy(central, 16, 14, 26); // crc and sizes
	central.writeUInt16LE(name.length, 28);
	const end = Buffer.alloc(22);
	end.writeUInt32LE(0x06054b50, 0);
	end.writeUInt16LE(1, 8);
	end.writeUInt16LE(1, 10);
	end.writeUInt32LE(central.length + name.length, 12);
	end.writeUInt32LE(local.length + name.length + data.length, 16);
	return new Uint8Array(Buffer.concat([local, name, data, central, name, end]));
}

// The smallest GIF89a, a 1×1 transparent pixel (from memory, common practice).
const gif = Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64');

const s3 = new S3Client({
	region: 'us-east-1',
	endpoint: process.env.S3_ENDPOINT,
	forcePathStyle: true,
	credentials: {
		accessKeyId: process.env.S3_ACCESS_KEY_ID ?? '',
		secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? ''
	}
});

async function storedKeys(): Promise<string[]> {
	const out = await s3.send(
		new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET, Prefix: 'bill-attachments/' })
	);
	return (out.Contents ?? []).map((o) => o.Key ?? '').sort();
}

const bytesOf = async (stream: ReadableStream<Uint8Array>) =>
	new Uint8Array(await new Response(stream).arrayBuffer());

let actor: Actor;
let site: SiteRow;
let otherSite: SiteRow;
let billId = '';

beforeAll(async () => {
	actor = await makeUser(`editor-${tag}@example.org`, 'Tess Rowan (invented)');
	const ws = await createWorkspace(`Attachments ${tag}`, actor.id);
	site = await makeSite(ws, actor, `Pond site ${tag}`);
	otherSite = await makeSite(ws, actor, `Greenhouse ${tag}`);
	const [bill] = await db
		.insert(bills)
		.values({ siteId: site.id, periodFrom: '2026-01-01', periodTo: '2026-01-31', kwh: 500, amount: 80 })
		.returning({ id: bills.id });
	billId = bill!.id;
});

afterAll(async () => {
	s3.destroy();
	await client.end({ timeout: 5 });
});

describe('the object store, against the local S3 stand-in', () => {
	it('gives back the bytes it was given, with their length, and nothing once deleted', async () => {
		const key = `bill-attachments/round-trip-${randomUUID()}`;
		const pdf = tinyPdf();
		await putObject(key, pdf, 'application/pdf');
		const stored = await getObject(key);
		expect(stored?.bytes).toBe(pdf.byteLength);
		expect(await bytesOf(stored!.body)).toEqual(pdf);
		await deleteObject(key);
		expect(await getObject(key)).toBeNull();
	});

	it('answers null for a key it never had, and deleting one is no error', async () => {
		const key = `bill-attachments/never-${randomUUID()}`;
		expect(await getObject(key)).toBeNull();
		await expect(deleteObject(key)).resolves.toBeUndefined();
	});
});

describe('checking an upload by its bytes', () => {
	it.each([
		['a one-page PDF', tinyPdf(), 'January bill.pdf', 'application/pdf'],
		['a PDF of exactly 10 MB', tinyPdf(MAX_ATTACHMENT_BYTES), 'scan.pdf', 'application/pdf'],
		['a 1×1 PNG', tinyPng(), 'meter.png', 'image/png'],
		['a JPEG with an EXIF thumbnail', tinyJpeg({ thumbnail: true }), 'photo.jpg', 'image/jpeg'],
		['a JPEG with data after its end marker', tinyJpeg({ trailer: true }), 'phone.jpeg', 'image/jpeg'],
		['a PNG named .pdf (the bytes decide)', tinyPng(), 'bill.pdf', 'image/png']
	])('accepts %s', async (_, bytes, name, type) => {
		expect(await checkUpload(bytes, name)).toEqual({ contentType: type });
	});

	it('builds a 10 MB PDF of exactly that size for the boundary case', () => {
		expect(tinyPdf(MAX_ATTACHMENT_BYTES).byteLength).toBe(MAX_ATTACHMENT_BYTES);
	});

	const pdf = tinyPdf();
	const png = tinyPng();
	it.each([
		['an empty file', new Uint8Array(0), 'bill.pdf', 'empty', /“bill\.pdf” is empty/],
		[
			'10 MB and one byte',
			new Uint8Array(MAX_ATTACHMENT_BYTES + 1),
			'big.pdf',
			'too-large',
			/larger than 10 MB/
		],
		[
			'a PDF cut short (no %%EOF)',
			pdf.subarray(0, pdf.byteLength - 40),
			'bill.pdf',
			'truncated',
			/cut short.*PDF/
		],
		['a PNG without its IEND chunk', tinyPng({ withEnd: false }), 'b.png', 'truncated', /PNG image/],
		['a JPEG cut inside its scan', tinyJpeg({ thumbnail: true, cut: true }), 'c.jpg', 'truncated', /JPEG/],
		['a Linux program named .pdf', elf, 'bill.pdf', 'wrong-type', /a Linux program, whatever its name says/],
		['a Windows program named .pdf', pe, 'bill.pdf', 'wrong-type', /a Windows program/],
		['a ZIP archive named .png', tinyZip(), 'bill.png', 'wrong-type', /a ZIP archive/],
		['a GIF named .jpg', new Uint8Array(gif), 'bill.jpg', 'wrong-type', /a GIF image/],
		[
			'plain text named .pdf',
			new TextEncoder().encode('kWh 500'),
			'bill.pdf',
			'wrong-type',
			/not a PDF, PNG or JPEG/
		],
		['the first half of a PNG', png.subarray(0, 20), 'half.png', 'truncated', /cut short/]
	])('refuses %s', async (_, bytes, name, reason, message) => {
		const result = await checkUpload(bytes, name);
		expect(result).toMatchObject({ reason });
		expect('message' in result && result.message).toMatch(message);
	});
});

describe('attaching a file to a bill', () => {
	it('stores it under a random key with nothing of its name, and the row points at it', async () => {
		const pdf = tinyPdf();
		const result = await addAttachment(site, billId, { bytes: pdf, name: 'Fernhollow January.pdf' }, actor);
		if (!('attachment' in result)) throw new Error(result.message);
		const [row] = await db.select().from(billAttachments).where(eq(billAttachments.id, result.attachment.id));
		expect(row).toMatchObject({
			billId,
			contentType: 'application/pdf',
			bytes: pdf.byteLength,
			uploadedBy: actor.id
		});
		expect(row!.fileName).toBe('Fernhollow January.pdf');
		expect(row!.storageKey).toMatch(
			/^bill-attachments\/[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[0-9a-f]{4}-[0-9a-f]{12}$/
		);
		expect(await storedKeys()).toContain(row!.storageKey);
		expect(await bytesOf((await getObject(row!.storageKey))!.body)).toEqual(pdf);
	});

	it('records the upload in the site’s audit trail as a change to the bill', async () => {
		await addAttachment(site, billId, { bytes: tinyPng(), name: 'meter.png' }, actor);
		const trail = await db
			.select()
			.from(auditEvents)
			.where(and(eq(auditEvents.siteId, site.id), eq(auditEvents.action, 'attached')));
		expect(
			trail.some((e) => e.entity === 'bill' && e.entityId === billId && e.summary.includes('meter.png'))
		).toBe(true);
	});

	it('gives two uploads of the same name two different keys', async () => {
		const before = await storedKeys();
		await addAttachment(site, billId, { bytes: tinyPng(), name: 'same.png' }, actor);
		await addAttachment(site, billId, { bytes: tinyPng(), name: 'same.png' }, actor);
		expect((await storedKeys()).filter((k) => !before.includes(k))).toHaveLength(2);
	});

	it('refuses a renamed program and stores nothing', async () => {
		const before = await storedKeys();
		const rows = (await listAttachments(billId)).length;
		expect(await addAttachment(site, billId, { bytes: elf, name: 'bill.pdf' }, actor)).toMatchObject({
			reason: 'wrong-type'
		});
		expect(await storedKeys()).toEqual(before);
		expect(await listAttachments(billId)).toHaveLength(rows);
	});

	it('removes the stored object again when the insert fails', async () => {
		const before = await storedKeys();
		// No such bill: the foreign key refuses the row after the object was stored.
		await expect(
			addAttachment(site, randomUUID(), { bytes: tinyPdf(), name: 'orphan.pdf' }, actor)
		).rejects.toThrow();
		expect(await storedKeys()).toEqual(before);
	});

	it('lists the bill’s files oldest first and reads one back byte for byte', async () => {
		const png = tinyPng();
		const added = await addAttachment(site, billId, { bytes: png, name: 'C:\\fakepath\\last.png' }, actor);
		if (!('attachment' in added)) throw new Error(added.message);
		const list = await listAttachments(billId);
		expect(list.at(-1)).toMatchObject({
			id: added.attachment.id,
			fileName: 'last.png',
			contentType: 'image/png'
		});
		expect(list.every((a) => !('storageKey' in a))).toBe(true);
		const read = await readAttachment(added.attachment.id);
		expect(read?.attachment.contentType).toBe('image/png');
		expect(await bytesOf(read!.object.body)).toEqual(png);
	});

	it('removes the row and the object, and only through the bill’s own site', async () => {
		const added = await addAttachment(site, billId, { bytes: tinyPdf(), name: 'remove me.pdf' }, actor);
		if (!('attachment' in added)) throw new Error(added.message);
		const [row] = await db.select().from(billAttachments).where(eq(billAttachments.id, added.attachment.id));
		expect(await removeAttachment(otherSite, added.attachment.id, actor)).toBe(false);
		expect(await storedKeys()).toContain(row!.storageKey);
		expect(await removeAttachment(site, added.attachment.id, actor)).toBe(true);
		expect(
			await db.select().from(billAttachments).where(eq(billAttachments.id, added.attachment.id))
		).toEqual([]);
		expect(await storedKeys()).not.toContain(row!.storageKey);
		expect(await readAttachment(added.attachment.id)).toBeNull();
	});
});
