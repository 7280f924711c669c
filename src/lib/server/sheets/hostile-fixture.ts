import { crc32, deflateRawSync } from 'node:zlib';

/**
 * Hostile uploads built in the tests (the unit tests and the end-to-end spec), so no binary file is
 * ever committed: the heads of programs and images sent under a sheet's or a PDF's name, and ZIP
 * archives plain and hostile. Invented test data.
 */

/**
 * The head of a Windows program: the DOS header as linkers write it ("MZ", 0x90…, from memory), and at
 * 0x3C the offset of its "PE" header (Microsoft PE/COFF specification).
 */
export function windowsProgram(): Buffer {
	const head = Buffer.alloc(128);
	Buffer.from([0x4d, 0x5a, 0x90, 0, 3, 0, 0, 0, 4, 0, 0, 0, 0xff, 0xff, 0, 0]).copy(head);
	head.writeUInt32LE(0x40, 0x3c);
	head.write('PE\0\0', 0x40, 'latin1');
	return head;
}

/** The head of a 64-bit Linux program (ELF: 7F "ELF", 64-bit, little-endian, an executable for x86-64). */
export const linuxProgram = (): Buffer =>
	Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...Buffer.alloc(8), 2, 0, 0x3e, 0, 1, 0, 0, 0]);

/** The signature and first chunk header of a PNG image (ISO/IEC 15948), no more. */
export const pngHead = (): Buffer =>
	Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);

export type ZipPart = {
	name: string;
	data: Uint8Array;
	/** Deflated (method 8) rather than stored (method 0). */
	deflate?: boolean;
	/** The unpacked size the headers claim, when they are to lie about it. */
	declaredBytes?: number;
};

/**
 * The parts as an archive laid out by PKWARE APPNOTE 6.3 §4.3: local headers with their data, the
 * central directory, the end record. `listFirst` lists the first part's data that many times in the
 * central directory, under names of its own: the overlapping layout of a "non-recursive" zip bomb.
 */
export function zipOf(parts: ZipPart[], { listFirst = 1 } = {}): Buffer {
	const locals: Buffer[] = [];
	const centrals: Buffer[] = [];
	let offset = 0;
	parts.forEach((part, i) => {
		const name = Buffer.from(part.name);
		const data = part.deflate ? deflateRawSync(part.data, { level: 9 }) : Buffer.from(part.data);
		// The fields local and central headers share: method, time and date (left zero), CRC, sizes.
		const fields = Buffer.alloc(18);
		fields.writeUInt16LE(part.deflate ? 8 : 0, 0);
		fields.writeUInt32LE(crc32(part.data), 6);
		fields.writeUInt32LE(data.byteLength, 10);
		fields.writeUInt32LE(part.declaredBytes ?? part.data.byteLength, 14);
		const local = Buffer.alloc(30);
		local.writeUInt32LE(0x04034b50, 0);
		local.writeUInt16LE(20, 4); // version needed: 2.0, deflate
		fields.copy(local, 8);
		local.writeUInt16LE(name.byteLength, 26);
		const copies = i === 0 ? listFirst : 1;
		for (let copy = 0; copy < copies; copy++) {
			const listed = copy === 0 ? name : Buffer.from(`${part.name}.${copy}`);
			const central = Buffer.alloc(46);
			central.writeUInt32LE(0x02014b50, 0);
			central.writeUInt16LE(20, 4);
			central.writeUInt16LE(20, 6);
			fields.copy(central, 10);
			central.writeUInt16LE(listed.byteLength, 28);
			central.writeUInt32LE(offset, 42);
			centrals.push(central, listed);
		}
		locals.push(local, name, data);
		offset += local.byteLength + name.byteLength + data.byteLength;
	});
	const directory = Buffer.concat(centrals);
	const end = Buffer.alloc(22);
	end.writeUInt32LE(0x06054b50, 0);
	const count = centrals.length / 2;
	end.writeUInt16LE(count, 8);
	end.writeUInt16LE(count, 10);
	end.writeUInt32LE(directory.byteLength, 12);
	end.writeUInt32LE(offset, 16);
	return Buffer.concat([...locals, directory, end]);
}

/**
 * An "XLSX" whose one sheet part is `unpackedBytes` of zeros, deflated: 60 MB comes to about 60 kB.
 * `declaredBytes` makes its headers claim a harmless size instead.
 */
export function zipBomb(unpackedBytes: number, declaredBytes?: number): Buffer {
	const sheet = { name: 'xl/worksheets/sheet1.xml', data: Buffer.alloc(unpackedBytes), deflate: true };
	return zipOf([
		{ name: '[Content_Types].xml', data: Buffer.from('<?xml version="1.0"?><Types/>') },
		{ ...sheet, declaredBytes }
	]);
}

/**
 * A workbook of the given worksheets (each the XML inside its sheetData: rows of cells), written as
 * tersely as the format allows: no styles, no shared strings. `tabs` lists the sheets' numbers in the
 * order the workbook shows its tabs (by default 1, 2, …), so the first tab need not be sheet1.xml.
 */
export function workbookOf(sheetData: string[], tabs = sheetData.map((_, i) => i + 1)): Buffer {
	const xml = (body: string) =>
		Buffer.from(`<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n${body}`);
	const main = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
	const rel = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
	const pkg = 'http://schemas.openxmlformats.org/package/2006/relationships';
	const type = 'application/vnd.openxmlformats-officedocument.spreadsheetml';
	const numbers = sheetData.map((_, i) => i + 1);
	return zipOf([
		{
			name: '[Content_Types].xml',
			deflate: true,
			data: xml(
				'<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">' +
					'<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>' +
					'<Default Extension="xml" ContentType="application/xml"/>' +
					`<Override PartName="/xl/workbook.xml" ContentType="${type}.sheet.main+xml"/>` +
					numbers
						.map(
							(n) => `<Override PartName="/xl/worksheets/sheet${n}.xml" ContentType="${type}.worksheet+xml"/>`
						)
						.join('') +
					'</Types>'
			)
		},
		{
			name: '_rels/.rels',
			deflate: true,
			data: xml(
				`<Relationships xmlns="${pkg}"><Relationship Id="rId1" Type="${rel}/officeDocument" Target="xl/workbook.xml"/></Relationships>`
			)
		},
		{
			name: 'xl/workbook.xml',
			deflate: true,
			data: xml(
				`<workbook xmlns="${main}" xmlns:r="${rel}"><sheets>` +
					tabs.map((n) => `<sheet name="Sheet ${n}" sheetId="${n}" r:id="rId${n}"/>`).join('') +
					'</sheets></workbook>'
			)
		},
		{
			name: 'xl/_rels/workbook.xml.rels',
			deflate: true,
			data: xml(
				`<Relationships xmlns="${pkg}">` +
					numbers
						.map(
							(n) => `<Relationship Id="rId${n}" Type="${rel}/worksheet" Target="worksheets/sheet${n}.xml"/>`
						)
						.join('') +
					'</Relationships>'
			)
		},
		...sheetData.map((rows, i) => ({
			name: `xl/worksheets/sheet${i + 1}.xml`,
			deflate: true,
			data: xml(`<worksheet xmlns="${main}"><sheetData>${rows}</sheetData></worksheet>`)
		}))
	]);
}

/** A row of the terse sheets above: text cells inline, numbers as numbers. */
export function rowXml(line: number, cells: (string | number)[]): string {
	const cell = (value: string | number, i: number) => {
		const ref = `${String.fromCharCode(65 + i)}${line}`;
		return typeof value === 'number'
			? `<c r="${ref}"><v>${value}</v></c>`
			: `<c r="${ref}" t="inlineStr"><is><t>${value}</t></is></c>`;
	};
	return `<row r="${line}">${cells.map(cell).join('')}</row>`;
}

/**
 * One sheet far past any import's row limit while unpacking to less than the zip guard's cap: a
 * header row ("name", "watts") and `rows` rows of two number cells. 250,000 rows pack to 2.5 MB and
 * unpack to 15 MB: the "tall spreadsheet" that held the server for seconds, which only the row limit
 * stops.
 */
export function tallSheet(rows: number): Buffer {
	const lines = [rowXml(1, ['name', 'watts'])];
	for (let line = 2; line <= rows + 1; line++) lines.push(rowXml(line, [line, 5]));
	return workbookOf([lines.join('')]);
}
