import { expect, test } from '@playwright/test';
import { crc32, deflateSync } from 'node:zlib';
import { gotoReady } from './helpers';
import { type Caller, callerAs, callerOn, createSite } from './site-setup';

// Each test makes its own invented site and bill through the API, so the demo data stays as other tests
// see it. The files are built here: invented test data.

/** A one-page blank PDF with a correct cross-reference table. */
function tinyPdf(): Buffer {
	const objects = [
		'<< /Type /Catalog /Pages 2 0 R >>',
		'<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
		'<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>'
	];
	let body = '%PDF-1.4\n';
	const offsets = objects.map((o, i) => {
		const at = body.length;
		body += `${i + 1} 0 obj\n${o}\nendobj\n`;
		return at;
	});
	const xref = body.length;
	body += `xref\n0 4\n0000000000 65535 f \n${offsets.map((n) => `${String(n).padStart(10, '0')} 00000 n \n`).join('')}`;
	return Buffer.from(`${body}trailer\n<< /Size 4 /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`, 'latin1');
}

/** A 1×1 grey PNG (ISO/IEC 15948). */
function tinyPng(): Buffer {
	const chunk = (type: string, data: Buffer) => {
		const typed = Buffer.concat([Buffer.from(type, 'latin1'), data]);
		const frame = Buffer.alloc(8);
		frame.writeUInt32BE(data.length, 0);
		frame.writeUInt32BE(crc32(typed), 4);
		return Buffer.concat([frame.subarray(0, 4), typed, frame.subarray(4)]);
	};
	const ihdr = Buffer.alloc(13);
	ihdr.writeUInt32BE(1, 0);
	ihdr.writeUInt32BE(1, 4);
	ihdr[8] = 8;
	return Buffer.concat([
		Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
		chunk('IHDR', ihdr),
		chunk('IDAT', deflateSync(Buffer.from([0, 0x80]))),
		chunk('IEND', Buffer.alloc(0))
	]);
}

/** The head of a 64-bit Linux program (ELF), to be sent under a PDF's name and type. */
const elf = Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...new Array(8).fill(0), 2, 0, 0x3e, 0]);

/** A fresh invented site in the demo workspace with one January bill, made by the editor. */
async function siteWithBill({ request, headers }: Caller) {
	const siteId = await createSite({ request, headers }, 'Attachment test site');
	const bill = await request.post(`/api/v1/sites/${siteId}/bills`, {
		headers,
		data: { periodFrom: '2026-01-01', periodTo: '2026-01-31', kwh: 500, amount: 80 }
	});
	expect(bill.status()).toBe(201);
	const billId = (await bill.json()).id as string;
	return {
		siteId,
		billId,
		upload: `/api/v1/sites/${siteId}/bills/${billId}/attachment`,
		files: `/sites/${siteId}/bills/${billId}/attachments`
	};
}

const file = (name: string, mimeType: string, buffer: Buffer) => ({
	multipart: { file: { name, mimeType, buffer } }
});

test.describe('bill attachments', () => {
	test('bill attachments: an uploaded PDF comes back byte for byte through the checked proxy, to the site’s people only', async ({
		browser,
		baseURL
	}) => {
		const editor = await callerAs(browser, 'editor@example.org', baseURL!);
		const { upload, files } = await siteWithBill(editor);
		const pdf = tinyPdf();

		const created = await editor.request.post(upload, {
			headers: editor.headers,
			...file('January bill (invented).pdf', 'application/pdf', pdf)
		});
		expect(created.status()).toBe(201);
		const body = await created.json();
		expect(body).toEqual({
			id: expect.any(String),
			contentType: 'application/pdf',
			bytes: pdf.length,
			fileName: 'January bill (invented).pdf'
		});
		const proxy = `${files}/${body.id}`;
		expect(created.headers()['location']).toBe(proxy);

		const shown = await editor.request.get(proxy);
		expect(shown.status()).toBe(200);
		expect(Buffer.compare(await shown.body(), pdf)).toBe(0);
		expect(shown.headers()).toMatchObject({
			'content-type': 'application/pdf',
			'cache-control': 'private, no-store',
			'x-content-type-options': 'nosniff',
			'content-security-policy': 'sandbox'
		});
		expect(shown.headers()['content-disposition']).toMatch(/^inline; filename="january-bill-invented\.pdf"/);
		const saved = await editor.request.get(`${proxy}?download=1`);
		expect(saved.headers()['content-disposition']).toMatch(
			/^attachment; filename="january-bill-invented\.pdf"/
		);

		const viewer = await callerAs(browser, 'viewer@example.org', baseURL!);
		const viewed = await viewer.request.get(proxy);
		expect(viewed.status()).toBe(200);
		expect(Buffer.compare(await viewed.body(), pdf)).toBe(0);
		const viewerUpload = await viewer.request.post(upload, {
			headers: viewer.headers,
			...file('mine.pdf', 'application/pdf', pdf)
		});
		expect(viewerUpload.status()).toBe(403);
		expect((await viewer.request.delete(proxy, { headers: viewer.headers })).status()).toBe(403);

		const outsider = await callerAs(browser, 'grower@example.org', baseURL!);
		expect((await outsider.request.get(proxy)).status()).toBe(404);
		expect((await outsider.request.get(`${proxy}?download=1`)).status()).toBe(404);
		const outsiderUpload = await outsider.request.post(upload, {
			headers: outsider.headers,
			...file('theirs.pdf', 'application/pdf', pdf)
		});
		expect(outsiderUpload.status()).toBe(404);
		const outsiderForm = await outsider.request.post(files, {
			headers: { ...outsider.headers, accept: 'application/json' },
			...file('theirs.pdf', 'application/pdf', pdf)
		});
		expect(outsiderForm.status()).toBe(404);

		const anonymous = await callerAs(browser, null, baseURL!);
		const anonymousUpload = await anonymous.request.post(upload, {
			headers: anonymous.headers,
			...file('anon.pdf', 'application/pdf', pdf)
		});
		expect(anonymousUpload.status()).toBe(401);
	});

	test('bill attachments: a renamed program and an oversize file are refused with their reason, and files are removed', async ({
		browser,
		baseURL
	}) => {
		const editor = await callerAs(browser, 'editor@example.org', baseURL!);
		const { siteId, billId, upload, files } = await siteWithBill(editor);

		const program = await editor.request.post(upload, {
			headers: editor.headers,
			...file('bill.pdf', 'application/pdf', elf)
		});
		expect(program.status()).toBe(400);
		const refusal = await program.json();
		expect(refusal.message).toMatch(/“bill\.pdf” is a Linux program, whatever its name says/);
		expect(refusal.issues).toEqual([{ path: 'file', message: refusal.message }]);

		const oversize = Buffer.concat([tinyPdf(), Buffer.alloc(10 * 1024 * 1024)]);
		const big = await editor.request.post(upload, {
			headers: editor.headers,
			...file('big.pdf', 'application/pdf', oversize)
		});
		expect(big.status()).toBe(413);
		expect((await big.json()).message).toMatch(/larger than 10 MB/);

		const png = await editor.request.post(upload, {
			headers: editor.headers,
			...file('meter.png', 'image/png', tinyPng())
		});
		expect(png.status()).toBe(201);
		const proxy = `${files}/${(await png.json()).id}`;
		expect((await editor.request.get(proxy)).headers()['content-type']).toBe('image/png');
		const removed = await editor.request.delete(proxy, { headers: editor.headers });
		expect(removed.status()).toBe(204);
		expect((await editor.request.get(proxy)).status()).toBe(404);
		expect((await editor.request.get(`${files}/not-an-id`)).status()).toBe(404);

		// The page's form without script: back to the bill page, with the reason of a refusal.
		const billPage = `/sites/${siteId}/bills/${billId}`;
		const plain = (name: string, buffer: Buffer) =>
			editor.request.post(files, {
				headers: editor.headers,
				maxRedirects: 0,
				...file(name, 'image/png', buffer)
			});
		const refused = await plain('bill.png', elf);
		expect(refused.status()).toBe(303);
		expect(refused.headers()['location']).toBe(`${billPage}?attachment-error=wrong-type#attachments`);
		const accepted = await plain('meter.png', tinyPng());
		expect(accepted.status()).toBe(303);
		expect(accepted.headers()['location']).toBe(`${billPage}#attachments`);
		const again = await editor.request.post(upload, {
			headers: editor.headers,
			...file('m.png', 'image/png', tinyPng())
		});
		const formDelete = await editor.request.post(`${files}/${(await again.json()).id}`, {
			headers: editor.headers,
			form: { intent: 'delete' },
			maxRedirects: 0
		});
		expect(formDelete.status()).toBe(303);
		expect(formDelete.headers()['location']).toBe(`${billPage}#attachments`);
	});

	test('bill attachments: on the bill page an editor attaches a photo, sees it listed, and removes it', async ({
		page,
		baseURL
	}) => {
		const { siteId, billId } = await siteWithBill(await callerOn(page, 'editor@example.org', baseURL!));
		await gotoReady(page, `/sites/${siteId}/bills/${billId}`);
		const section = page.getByRole('region', { name: 'The bill itself' });
		await expect(section.getByText('No file attached yet.')).toBeVisible();

		const input = section.getByLabel('Attach the bill’s PDF or a photo');
		await input.setInputFiles({ name: 'bill.pdf', mimeType: 'application/pdf', buffer: elf });
		await section.getByRole('button', { name: 'Attach', exact: true }).click();
		await expect(section.getByText(/is a Linux program/)).toBeVisible();
		await expect(input).toHaveAttribute('aria-invalid', 'true');

		await input.setInputFiles({ name: 'meter photo.png', mimeType: 'image/png', buffer: tinyPng() });
		await section.getByRole('button', { name: 'Attach', exact: true }).click();
		const list = section.getByRole('list', { name: 'Attached files' });
		await expect(list.getByRole('link', { name: 'Open meter photo.png' })).toBeVisible();
		await expect(list.getByText('1 KB')).toBeVisible();
		await expect(input).not.toHaveAttribute('aria-invalid', 'true');
		// The thumbnail is the stored picture itself, loaded through the proxy.
		await expect(list.locator('img')).toHaveJSProperty('naturalWidth', 1);

		await list.locator('summary', { hasText: 'Remove' }).click();
		await list.getByRole('button', { name: 'Yes, remove it' }).click();
		await expect(section.getByText('No file attached yet.')).toBeVisible();
	});
});
