import { fileTypeFromBuffer } from 'file-type';

/** A bill's PDF or photo: 10 MB (10 × 1024 × 1024 bytes) is enough for a phone photo or a scanned bill. */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;

export const ATTACHMENT_TYPES = ['application/pdf', 'image/png', 'image/jpeg'] as const;
export type AttachmentType = (typeof ATTACHMENT_TYPES)[number];

/** The extension a stored file is served with: from its checked type, never from its name. */
export const ATTACHMENT_EXTENSIONS: Record<AttachmentType, string> = {
	'application/pdf': 'pdf',
	'image/png': 'png',
	'image/jpeg': 'jpg'
};

export type UploadRefusal = {
	message: string;
	reason: 'empty' | 'too-large' | 'wrong-type' | 'truncated';
};

const KIND_WORDS: Record<AttachmentType, string> = {
	'application/pdf': 'PDF',
	'image/png': 'PNG image',
	'image/jpeg': 'JPEG image'
};

// How people would call what they sent instead, by file-type's extension; anything else by its extension.
const OTHER_WORDS: Record<string, string> = {
	exe: 'a Windows program',
	elf: 'a Linux program',
	macho: 'a macOS program',
	zip: 'a ZIP archive',
	gif: 'a GIF image',
	webp: 'a WebP image',
	heic: 'a HEIC photo',
	tif: 'a TIFF image',
	apng: 'an animated PNG'
};

const isAttachmentType = (mime: string): mime is AttachmentType =>
	(ATTACHMENT_TYPES as readonly string[]).includes(mime);

const quoted = (declaredName: string) =>
	declaredName.trim() ? `“${declaredName.trim().slice(0, 100)}”` : 'The file';

/** The refusal for an empty or oversize file, from its length alone (so before reading a body). */
export function refuseBySize(bytes: number, declaredName: string): UploadRefusal | null {
	const name = quoted(declaredName);
	if (bytes === 0)
		return { reason: 'empty', message: `${name} is empty. Choose the bill’s PDF or photo again.` };
	if (bytes > MAX_ATTACHMENT_BYTES)
		return {
			reason: 'too-large',
			message: `${name} is larger than 10 MB, the most an attachment may be. A photo at a lower resolution will do.`
		};
	return null;
}

/**
 * Checks an upload by its bytes — never its name or the browser's Content-Type: not empty, at most
 * 10 MB, really a PDF, PNG or JPEG (`file-type` reads the signature), and not cut short.
 * `declaredName` only makes the message readable.
 */
export async function checkUpload(
	bytes: Uint8Array,
	declaredName: string
): Promise<{ contentType: AttachmentType } | UploadRefusal> {
	const bySize = refuseBySize(bytes.byteLength, declaredName);
	if (bySize) return bySize;
	const name = quoted(declaredName);
	const detected = await fileTypeFromBuffer(bytes);
	if (!detected || !isAttachmentType(detected.mime)) {
		const what = detected
			? (OTHER_WORDS[detected.ext] ?? `a ${detected.ext.toUpperCase()} file`)
			: 'not a PDF, PNG or JPEG';
		return {
			reason: 'wrong-type',
			message: `${name} is ${what}, whatever its name says. Attach the bill as a PDF, PNG or JPEG.`
		};
	}
	if (!isComplete(bytes, detected.mime))
		return {
			reason: 'truncated',
			message: `${name} looks cut short: the ${KIND_WORDS[detected.mime]} stops before its end. Upload it again, or save it again from the program that made it.`
		};
	return { contentType: detected.mime };
}

/** The name as people will see it: the last path part, no control characters, at most 200 characters. */
export function displayName(declared: string, type: AttachmentType): string {
	const name = (declared.split(/[\\/]/).pop() ?? '')
		.normalize('NFC')
		// eslint-disable-next-line no-control-regex -- control characters are what this removes
		.replace(/[\u0000-\u001f\u007f]/g, '')
		.trim()
		.slice(0, 200);
	return name || `bill.${ATTACHMENT_EXTENSIONS[type]}`;
}

export const sizeWords = (bytes: number) =>
	bytes < 1024 * 1024
		? `${Math.max(1, Math.round(bytes / 1024))} KB`
		: `${(bytes / 1024 / 1024).toFixed(1)} MB`;

const TAIL_BYTES = 1024;

/** Whether the file reaches its format's end marker; a broken transfer or a half-saved file does not. */
function isComplete(bytes: Uint8Array, type: AttachmentType): boolean {
	const tail = Buffer.from(bytes.subarray(Math.max(0, bytes.byteLength - TAIL_BYTES))).toString('latin1');
	// ISO 32000-1 §7.5.5: the file ends with %%EOF; readers look for it in the last 1024 bytes
	// (from memory, common practice), so some trailing bytes after it are allowed.
	if (type === 'application/pdf') return tail.includes('%%EOF');
	// PNG (ISO/IEC 15948): the last chunk is IEND, whose CRC is always AE 42 60 82.
	if (type === 'image/png') return tail.includes('IEND\xAE\x42\x60\x82');
	return jpegReachesEnd(bytes);
}

/**
 * Walks a JPEG's segments (ITU T.81, annex B) to the end-of-image marker FF D9. Segments carry their
 * length, so an EXIF thumbnail's own end marker inside APP1 is skipped; after each scan (SOS, FF DA) the
 * coded data runs to the next marker that is neither a stuffed FF 00 nor a restart marker. Data a phone
 * appends after the end marker is never read.
 */
function jpegReachesEnd(b: Uint8Array): boolean {
	let i = 2; // after the start-of-image marker that file-type matched
	while (i + 1 < b.byteLength) {
		if (b[i] !== 0xff) return false;
		const marker = b[i + 1] ?? 0;
		if (marker === 0xd9) return true;
		if (marker === 0xff) {
			i += 1; // a fill byte before a marker
			continue;
		}
		if (marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
			i += 2; // markers without a length
			continue;
		}
		i += 2 + (((b[i + 2] ?? 0) << 8) | (b[i + 3] ?? 0));
		if (marker === 0xda)
			while (i + 1 < b.byteLength && !(b[i] === 0xff && isMarkerAfterScan(b[i + 1] ?? 0))) i += 1;
	}
	return false;
}

const isMarkerAfterScan = (next: number) => next !== 0x00 && !(next >= 0xd0 && next <= 0xd7);
