import type { RequestEvent } from '@sveltejs/kit';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DRAIN_MAX_BYTES, finishReadingBody } from './unread-body';
import { uploadForm } from './upload-form';

/**
 * A Node http server that answers 413 without reading the body, through the hook, as adapter-node
 * hands requests over (`platform.req`), and a client that sends its whole declared body before it is
 * done, as a browser's form post does.
 */
let server: http.Server;
let url: string;

beforeAll(async () => {
	server = http.createServer(async (req, res) => {
		const event = { platform: { req } } as unknown as RequestEvent;
		const response = await finishReadingBody({
			event,
			resolve: async () => new Response('{"message":"The file is over 10 MB."}', { status: 413 })
		});
		res.writeHead(response.status, Object.fromEntries(response.headers));
		res.end(await response.text());
	});
	await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
	url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

function send(
	declared: number
): Promise<{ status?: number; body: string; error?: string; sent: boolean; connection?: string }> {
	return new Promise((resolve) => {
		const result: { status?: number; body: string; error?: string; sent: boolean; connection?: string } = {
			body: '',
			sent: false
		};
		let answered = false;
		const request = http.request(url, {
			method: 'POST',
			agent: new http.Agent({ keepAlive: true }),
			headers: { 'content-type': 'application/octet-stream', 'content-length': String(declared) }
		});
		request.on('response', (response) => {
			result.status = response.statusCode;
			result.connection = response.headers.connection;
			response.on('data', (chunk) => (result.body += chunk));
			response.on('end', () => {
				answered = true;
				if (result.sent) resolve(result);
			});
		});
		request.on('finish', () => {
			result.sent = true;
			if (answered) resolve(result);
		});
		request.on('error', (error: NodeJS.ErrnoException) => resolve({ ...result, error: error.code }));
		const chunk = Buffer.alloc(64 * 1024);
		let left = declared;
		const pump = () => {
			while (left > 0) {
				const piece = chunk.subarray(0, Math.min(chunk.byteLength, left));
				left -= piece.byteLength;
				if (!request.write(piece)) return void request.once('drain', pump);
			}
			if (!answered) request.end();
		};
		pump();
	});
}

describe('a body answered without being read', () => {
	it('is read and dropped first, so the client sends it all and reads the 413 on a live connection', async () => {
		const result = await send(11_000_000);
		expect(result).toEqual({
			status: 413,
			body: '{"message":"The file is over 10 MB."}',
			sent: true,
			connection: 'keep-alive'
		});
	});

	it('declared over the bound, is not waited for: the answer goes at once and closes the connection', async () => {
		const started = performance.now();
		const result = await send(DRAIN_MAX_BYTES + 1);
		// The client may see the answer or a reset; what matters is that the server did not read 16 MB first.
		if (!result.error) expect(result).toMatchObject({ status: 413, connection: 'close' });
		expect(performance.now() - started).toBeLessThan(10_000);
	});
});

describe('an upload form', () => {
	it('is "too-large" when SvelteKit stops the body at BODY_SIZE_LIMIT, and other errors pass', async () => {
		const stopped = new ReadableStream({
			start: (controller) => controller.error(Object.assign(new Error('Payload Too Large'), { status: 413 }))
		});
		const request = (body: ReadableStream) =>
			new Request('http://127.0.0.1/', {
				method: 'POST',
				headers: { 'content-type': 'multipart/form-data; boundary=x' },
				body,
				duplex: 'half'
			} as RequestInit);
		expect(await uploadForm(request(stopped))).toBe('too-large');
		const broken = new ReadableStream({ start: (controller) => controller.error(new Error('cut off')) });
		await expect(uploadForm(request(broken))).rejects.toThrow();
	});
});
