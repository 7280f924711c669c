import { describe, expect, it } from 'vitest';
import { MAX_USAGE_BYTES } from './read-usage';
import { CHOOSE_FILE, readUsageUpload } from './upload';

const URL = 'http://localhost/api/v1/sites/s/usage';
const TOO_LARGE = {
	ok: false,
	status: 413,
	message: 'The file is over 10 MB. Download a shorter stretch of time, a year or less, and import it.'
};

const multipart = (file: Blob, name = 'usage.xml') => {
	const form = new FormData();
	form.append('file', file, name);
	return new Request(URL, { method: 'POST', body: form });
};

// Node's fetch needs `duplex` for a body that streams; the DOM types the project uses do not know it.
const STREAMING = { duplex: 'half' } as RequestInit;

/** A raw body that arrives in 1 MB pieces and never says its length. */
function streamed(bytes: number, type = 'text/csv'): Request {
	let sent = 0;
	const body = new ReadableStream<Uint8Array>({
		pull(controller) {
			if (sent >= bytes) return controller.close();
			const piece = Math.min(1024 * 1024, bytes - sent);
			sent += piece;
			controller.enqueue(new Uint8Array(piece).fill(0x61));
		}
	});
	return new Request(URL, { method: 'POST', body, headers: { 'content-type': type }, ...STREAMING });
}

/** What SvelteKit's body reader does past BODY_SIZE_LIMIT: the stream errors with status 413. */
function stoppedBySvelteKit(type: string): Request {
	const body = new ReadableStream<Uint8Array>({
		start: (controller) => controller.error(Object.assign(new Error('Payload Too Large'), { status: 413 }))
	});
	return new Request(URL, { method: 'POST', body, headers: { 'content-type': type }, ...STREAMING });
}

describe('a body over 10 MB', () => {
	it('is refused from its Content-Length before the body is read', async () => {
		const request = new Request(URL, {
			method: 'POST',
			body: 'x',
			headers: { 'content-type': 'text/csv', 'content-length': String(MAX_USAGE_BYTES + 65 * 1024) }
		});
		expect(await readUsageUpload(request, { rawBody: true })).toEqual(TOO_LARGE);
		expect(request.bodyUsed).toBe(false);
	});

	it('is refused when a raw body that gave no length runs past the limit', async () => {
		expect(await readUsageUpload(streamed(MAX_USAGE_BYTES + 1), { rawBody: true })).toEqual(TOO_LARGE);
		const exact = await readUsageUpload(streamed(MAX_USAGE_BYTES), { rawBody: true });
		expect(exact.ok && exact.bytes.byteLength).toBe(MAX_USAGE_BYTES);
	});

	it('is refused when the file of a form is over the limit', async () => {
		const big = new Blob([new Uint8Array(MAX_USAGE_BYTES + 1)]);
		expect(await readUsageUpload(multipart(big), { rawBody: false })).toEqual(TOO_LARGE);
	});

	it.each(['multipart/form-data; boundary=x', 'text/csv'])(
		'is refused when SvelteKit stops a %s body at its limit',
		async (type) => {
			expect(await readUsageUpload(stoppedBySvelteKit(type), { rawBody: true })).toEqual(TOO_LARGE);
		}
	);
});

describe('other bodies', () => {
	it('refuses another kind of body with 415, and a form without the file with 400', async () => {
		const json = new Request(URL, {
			method: 'POST',
			body: '{}',
			headers: { 'content-type': 'application/json' }
		});
		expect(await readUsageUpload(json, { rawBody: true })).toMatchObject({ ok: false, status: 415 });
		const form = new FormData();
		form.append('other', 'x');
		const empty = new Request(URL, { method: 'POST', body: form });
		expect(await readUsageUpload(empty, { rawBody: false })).toEqual({
			ok: false,
			status: 400,
			message: CHOOSE_FILE
		});
	});

	it('takes a raw body only where the caller allows it (the API, not the page’s form)', async () => {
		const raw = () =>
			new Request(URL, { method: 'POST', body: '<feed/>', headers: { 'content-type': 'text/xml' } });
		expect(await readUsageUpload(raw(), { rawBody: false })).toMatchObject({ ok: false, status: 415 });
		expect(await readUsageUpload(raw(), { rawBody: true })).toMatchObject({ ok: true });
	});
});
