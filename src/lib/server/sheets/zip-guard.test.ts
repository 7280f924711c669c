import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { linuxProgram, pngHead, windowsProgram, zipBomb, zipOf } from './hostile-fixture';
import {
	MAX_UNPACKED_BYTES,
	MAX_ZIP_ENTRIES,
	NOT_A_WORKBOOK,
	TOO_BIG_UNPACKED,
	TOO_MANY_PARTS,
	refuseZip
} from './zip-guard';

const MB = 1024 * 1024;
const text = (s: string) => Buffer.from(s);
/** The archive with one field of its end record (22 bytes at the very end) overwritten. */
function withEndField(zip: Buffer, at: number, value: number, bytes: 2 | 4): Buffer {
	const copy = Buffer.from(zip);
	const end = copy.byteLength - 22;
	if (bytes === 2) copy.writeUInt16LE(value, end + at);
	else copy.writeUInt32LE(value, end + at);
	return copy;
}
/** The archive with a 16-bit field of its first central directory record overwritten. */
function withCentralField(zip: Buffer, at: number, value: number): Buffer {
	const copy = Buffer.from(zip);
	copy.writeUInt16LE(value, copy.readUInt32LE(copy.byteLength - 22 + 16) + at);
	return copy;
}

describe('an ordinary workbook', () => {
	it('passes: a workbook exceljs wrote, with a sheet of invented rows', async () => {
		const workbook = new ExcelJS.Workbook();
		const sheet = workbook.addWorksheet('Devices');
		sheet.addRow(['name', 'watts']);
		for (let i = 1; i <= 500; i++) sheet.addRow([`Pump ${i} (invented)`, 100 + i]);
		expect(await refuseZip(new Uint8Array(await workbook.xlsx.writeBuffer()))).toBeNull();
	});

	it('passes stored and deflated parts that unpack to just under the cap', async () => {
		const zip = zipOf([
			{ name: 'a.xml', data: text('<a/>') },
			{ name: 'b.xml', data: Buffer.alloc(MAX_UNPACKED_BYTES - 4), deflate: true }
		]);
		expect(await refuseZip(zip)).toBeNull();
	});
});

describe('a zip bomb dressed as a workbook', () => {
	it('is refused once its parts unpack past 20 MB, quickly and with the message for the field', async () => {
		const bomb = zipBomb(60 * MB);
		expect(bomb.byteLength).toBeLessThan(100 * 1024);
		const started = performance.now();
		expect(await refuseZip(bomb)).toBe(TOO_BIG_UNPACKED);
		// Measured about 80 ms on the development machine; the bound leaves room for a busy one.
		expect(performance.now() - started).toBeLessThan(2000);
		expect(TOO_BIG_UNPACKED).toMatch(/^This workbook unpacks to more than 20 MB/);
	});

	it('is refused though its headers claim the sheet unpacks to 1 kB', async () => {
		expect(await refuseZip(zipBomb(60 * MB, 1024))).toBe(TOO_BIG_UNPACKED);
	});

	it('is refused when parts each under the cap add up to more than it', async () => {
		const parts = [1, 2, 3].map((n) => ({ name: `p${n}.xml`, data: Buffer.alloc(8 * MB), deflate: true }));
		expect(await refuseZip(zipOf(parts))).toBe(TOO_BIG_UNPACKED);
	});

	it('is refused when its directory lists one deflated part many times over (overlapping parts)', async () => {
		const zip = zipOf([{ name: 'sheet.xml', data: Buffer.alloc(5 * MB), deflate: true }], { listFirst: 6 });
		expect(await refuseZip(zip)).toBe(TOO_BIG_UNPACKED);
	});

	it(`is refused when it holds more than ${MAX_ZIP_ENTRIES} parts, however small`, async () => {
		const parts = Array.from({ length: MAX_ZIP_ENTRIES + 1 }, (_, i) => ({ name: `p${i}`, data: text('x') }));
		expect(await refuseZip(zipOf(parts))).toBe(TOO_MANY_PARTS);
		expect(await refuseZip(zipOf(parts.slice(1)))).toBeNull();
	});
});

describe('archives read differently by different unzippers', () => {
	const plain = zipOf([
		{ name: 'a.xml', data: text('<a/>'), deflate: true },
		{ name: 'b.xml', data: text('<b/>') }
	]);

	it('are refused as not a workbook: ZIP64 marks, a wrong count, a misplaced directory', async () => {
		const cases = [
			withEndField(plain, 10, 0xffff, 2), // ZIP64: the count is in another record
			withEndField(plain, 16, 0xffffffff, 4), // ZIP64: so is the directory's offset
			withEndField(plain, 10, 3, 2), // three parts claimed, two listed
			withEndField(plain, 16, 1, 4), // the directory is not where the end record says
			withEndField(plain, 4, 1, 2) // the second disk of a split archive
		];
		for (const zip of cases) expect(await refuseZip(zip)).toBe(NOT_A_WORKBOOK);
	});

	it('are refused as not a workbook: an encrypted part, an unknown method, data past the end', async () => {
		expect(await refuseZip(withCentralField(plain, 8, 1))).toBe(NOT_A_WORKBOOK);
		expect(await refuseZip(withCentralField(plain, 10, 12))).toBe(NOT_A_WORKBOOK); // bzip2
		const cut = Buffer.from(plain);
		cut.writeUInt32LE(10 * MB, cut.readUInt32LE(cut.byteLength - 22 + 16) + 20);
		expect(await refuseZip(cut)).toBe(NOT_A_WORKBOOK);
	});

	it('refuses a deflated part whose stream is broken', async () => {
		const broken = zipOf([{ name: 'a.xml', data: text('not deflate') }]);
		expect(await refuseZip(withCentralField(broken, 10, 8))).toBe(NOT_A_WORKBOOK);
	});
});

describe('files that are no archive at all', () => {
	const cases: [what: string, bytes: Uint8Array][] = [
		['a Windows program (MZ)', windowsProgram()],
		['a Linux program (ELF)', linuxProgram()],
		['a PNG image', pngHead()],
		['a CSV sheet', text('name,watts\nPump,100\n')],
		['a lone end record', text('PK\x05\x06')]
	];
	it.each(cases)('refuses %s as not a workbook', async (_, bytes) => {
		expect(await refuseZip(bytes)).toBe(NOT_A_WORKBOOK);
	});
});
