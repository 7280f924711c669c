import { expect, test, type APIResponse } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { windowsProgram, zipBomb } from '../../src/lib/server/sheets/hostile-fixture';
import { gotoReady, signInWithPassword } from './helpers';

// Hostile files against the invented demo sites: each is refused before anything is stored, so the
// demo data stays as the other specs see it. The files are built here (invented test data).
const demoSites = JSON.parse(readFileSync('data/demo-sites.json', 'utf8')) as {
	sites: { id: string; scenarios: { id: string }[] }[];
};
const pond = demoSites.sites[2]!;
const greenhouse = demoSites.sites[1]!;
const billionLaughs = readFileSync('tests/fixtures/green-button/bomb.xml');

/** A stack frame ("at readSheet (file.ts:12:3)") or a server path: what no answer may show. */
const STACK = /\bat \S+ \(|\.(ts|js):\d+:\d+|node_modules/;

async function timed(send: () => Promise<APIResponse>): Promise<{ answer: APIResponse; ms: number }> {
	const started = Date.now();
	const answer = await send();
	return { answer, ms: Date.now() - started };
}

test('hostile uploads: a zip bomb, an XML bomb and a renamed program are refused with reasons, and the app keeps answering', async ({
	page,
	baseURL
}) => {
	await signInWithPassword(page, 'owner@example.org');
	const headers = { origin: baseURL! };

	// A zip bomb named .xlsx, through the equipment import's own form: the refusal sits by the field.
	const importPage = `/sites/${pond.id}/scenarios/${pond.scenarios[0]!.id}/import`;
	const bomb = { name: 'pond.xlsx', mimeType: 'application/vnd.ms-excel', buffer: zipBomb(60 * 1024 * 1024) };
	await gotoReady(page, importPage);
	const sheet = page.getByLabel(/^Sheet/);
	await sheet.setInputFiles(bomb);
	await page.getByRole('button', { name: 'Check the sheet' }).click();
	await expect(page.locator('#sheet-error')).toContainText('This workbook unpacks to more than 20 MB');
	await expect(sheet).toHaveAttribute('aria-invalid', 'true');
	await expect(sheet).toHaveAttribute('aria-describedby', 'sheet-error');
	// The same post without script: the form's failure, 400, a readable page and no stack trace.
	const posted = await timed(() =>
		page.request.post(importPage, {
			headers: { ...headers, accept: 'text/html' },
			multipart: { intent: 'check', mode: 'append', sheet: bomb }
		})
	);
	expect(posted.answer.status()).toBe(400);
	const html = await posted.answer.text();
	expect(html).toContain('This workbook unpacks to more than 20 MB');
	expect(html).not.toMatch(STACK);

	// The billion laughs as a Green Button file, through the usage API.
	const usage = await timed(() =>
		page.request.post(`/api/v1/sites/${greenhouse.id}/usage`, {
			headers,
			multipart: { file: { name: 'usage.xml', mimeType: 'application/xml', buffer: billionLaughs } }
		})
	);
	expect(usage.answer.status()).toBe(400);
	const usageBody = await usage.answer.json();
	expect(usageBody.message).toMatch(/declares a DOCTYPE or entities, which Green Button files never do/);
	expect(JSON.stringify(usageBody)).not.toMatch(STACK);

	// A Windows program named .pdf, as an attachment of one of the greenhouse's demo bills.
	const { bills } = await (await page.request.get(`/api/v1/sites/${greenhouse.id}/bills`)).json();
	const billId = bills[0].id as string;
	const program = await timed(() =>
		page.request.post(`/api/v1/sites/${greenhouse.id}/bills/${billId}/attachment`, {
			headers,
			multipart: { file: { name: 'bill.pdf', mimeType: 'application/pdf', buffer: windowsProgram() } }
		})
	);
	expect(program.answer.status()).toBe(400);
	const programBody = await program.answer.json();
	expect(programBody.message).toMatch(/“bill\.pdf” is a Windows program, whatever its name says/);
	expect(programBody.issues).toEqual([{ path: 'file', message: programBody.message }]);
	expect(JSON.stringify(programBody)).not.toMatch(STACK);
	const attached = await page.request.get(`/sites/${greenhouse.id}/bills/${billId}`);
	expect(await attached.text()).not.toContain('bill.pdf');

	console.log(
		`refused: zip bomb ${posted.ms} ms, billion laughs ${usage.ms} ms, renamed program ${program.ms} ms`
	);
	const health = await page.request.get('/health');
	expect(health.status()).toBe(200);
	expect(await health.json()).toEqual({ ok: true, database: 'up' });
});

test('hostile uploads: the tariff sheet import ties a refused workbook to its file field', async ({
	page
}) => {
	await signInWithPassword(page, 'owner@example.org');
	await gotoReady(page, '/tariffs/import');
	const sheet = page.getByLabel(/^Sheet/);
	await sheet.setInputFiles({
		name: 'tariffs.xlsx',
		mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
		buffer: zipBomb(60 * 1024 * 1024)
	});
	await page.getByRole('button', { name: 'Check only' }).click();
	await expect(page.locator('#sheet-error')).toContainText('The sheet was not imported.');
	await expect(page.locator('#sheet-error')).toContainText('This workbook unpacks to more than 20 MB');
	await expect(sheet).toHaveAttribute('aria-invalid', 'true');
	await expect(sheet).toHaveAttribute('aria-describedby', 'sheet-error');
});
