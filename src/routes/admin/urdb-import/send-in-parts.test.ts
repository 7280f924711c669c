import { afterEach, describe, expect, it, vi } from 'vitest';
import { sendInParts } from './send-in-parts';

afterEach(() => vi.unstubAllGlobals());

describe('sending a file in parts', () => {
	it('puts each slice in turn under one upload id, and tells how many bytes are up', async () => {
		const sent: { url: string; body: string }[] = [];
		vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
			sent.push({ url, body: await (init.body as Blob).text() });
			return new Response('{}', { status: 201 });
		});
		const progress: number[] = [];
		const file = new File(['0123456789abcdefghijKLMNO'], 'rates.json');
		const answer = await sendInParts(file, 10, 1, (bytes) => progress.push(bytes));
		expect(answer).toMatchObject({ parts: 3 });
		const id = 'uploadId' in answer ? answer.uploadId : '';
		expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
		expect(sent).toEqual([
			{ url: `/admin/urdb-import/uploads/${id}/0`, body: '0123456789' },
			{ url: `/admin/urdb-import/uploads/${id}/1`, body: 'abcdefghij' },
			{ url: `/admin/urdb-import/uploads/${id}/2`, body: 'KLMNO' }
		]);
		expect(progress).toEqual([10, 20, 25]);
	});

	it('stops at a refused part with the server’s words, and at a file over the limit before sending', async () => {
		vi.stubGlobal('fetch', async () =>
			Response.json({ message: 'Only platform admins may do this.' }, { status: 403 })
		);
		const file = new File(['x'.repeat(30)], 'rates.json');
		expect(await sendInParts(file, 10, 1, () => {})).toEqual({ error: 'Only platform admins may do this.' });
		const big = { size: 2 * 1024 * 1024 } as File;
		expect(await sendInParts(big, 10, 1, () => {})).toEqual({ error: 'The file is over 1 MB.' });
	});
});
