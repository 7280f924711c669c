import type { RequestEvent } from '@sveltejs/kit';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { linuxProgram, windowsProgram, zipBomb } from '$lib/server/sheets/hostile-fixture';
import { MAX_ATTACHMENT_BYTES, checkUpload } from './attachments-check';
import { receiveUpload } from './attachments-upload';

// Nothing refused may reach the store or the database; neither exists in a unit test.
const stored = vi.hoisted(() => ({ putObject: vi.fn(), transaction: vi.fn() }));
vi.mock('../db', () => ({ db: { transaction: stored.transaction } }));
vi.mock('../storage/object-store', () => ({
	putObject: stored.putObject,
	getObject: vi.fn(),
	deleteObject: vi.fn()
}));

const URL = 'http://localhost/sites/s/bills/b/attachments';
const TARGET = {
	site: { id: 'site-1', workspaceId: 'ws-1' },
	bill: { id: 'bill-1' },
	user: { id: 'user-1', name: 'Tess Rowan (invented)', email: 'editor@example.org' }
};
const eventOf = (request: Request) => ({ request }) as unknown as RequestEvent;
const upload = (bytes: Uint8Array, name: string) => {
	const form = new FormData();
	form.append('file', new Blob([new Uint8Array(bytes)]), name);
	return receiveUpload(eventOf(new Request(URL, { method: 'POST', body: form })), TARGET);
};
// The 1×1 transparent PNG often used as a placeholder (from memory, common practice).
const png = Buffer.from(
	'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=',
	'base64'
);

beforeEach(() => {
	stored.putObject.mockClear();
	stored.transaction.mockClear();
});

describe('a body over 10 MB', () => {
	it('is refused with 413 from its Content-Length, before the body is read', async () => {
		const request = new Request(URL, {
			method: 'POST',
			body: 'x',
			headers: { 'content-length': String(MAX_ATTACHMENT_BYTES + 65 * 1024) }
		});
		expect(await receiveUpload(eventOf(request), TARGET)).toMatchObject({
			ok: false,
			status: 413,
			reason: 'too-large'
		});
		expect(request.bodyUsed).toBe(false);
	});

	it('is refused with 413 when SvelteKit stops a body that gave no length', async () => {
		const body = new ReadableStream({
			start: (controller) => controller.error(Object.assign(new Error('Payload Too Large'), { status: 413 }))
		});
		const request = new Request(URL, {
			method: 'POST',
			body,
			headers: { 'content-type': 'multipart/form-data; boundary=x' },
			...({ duplex: 'half' } as RequestInit) // Node's fetch needs it for a streamed body
		});
		expect(await receiveUpload(eventOf(request), TARGET)).toMatchObject({ ok: false, status: 413 });
	});

	it('is refused with 413 when the file itself is 10 MB and one byte', async () => {
		const outcome = await upload(new Uint8Array(MAX_ATTACHMENT_BYTES + 1), 'scan.pdf');
		expect(outcome).toMatchObject({ ok: false, status: 413 });
		expect(!outcome.ok && outcome.message).toMatch(/^“scan\.pdf” is larger than 10 MB/);
		expect(stored.putObject).not.toHaveBeenCalled();
	});
});

describe('a file that is not what its name says', () => {
	it.each([
		[
			'a Windows program named .pdf',
			windowsProgram(),
			/^“bill\.pdf” is a Windows program, whatever its name says/
		],
		['a Linux program named .pdf', linuxProgram(), /^“bill\.pdf” is a Linux program, whatever its name says/],
		['a zip bomb named .pdf', zipBomb(1024 * 1024), /^“bill\.pdf” is a ZIP archive, whatever its name says/]
	])('refuses %s with 400, storing nothing', async (_, bytes, message) => {
		const outcome = await upload(bytes, 'bill.pdf');
		expect(outcome).toMatchObject({ ok: false, status: 400, reason: 'wrong-type' });
		expect(!outcome.ok && outcome.message).toMatch(message);
		expect(stored.putObject).not.toHaveBeenCalled();
		expect(stored.transaction).not.toHaveBeenCalled();
	});

	it('takes a PNG named .pdf as the PNG its bytes say it is', async () => {
		expect(await checkUpload(png, 'bill.pdf')).toEqual({ contentType: 'image/png' });
	});

	it('asks for the file when the form has none, with 400', async () => {
		const request = new Request(URL, { method: 'POST', body: new FormData() });
		expect(await receiveUpload(eventOf(request), TARGET)).toMatchObject({
			ok: false,
			status: 400,
			reason: 'missing'
		});
	});
});
