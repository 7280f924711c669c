import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { and, eq, inArray, isNull, like } from 'drizzle-orm';
import { client, db } from '$lib/server/db';
import { tariffs, tariffVersions } from '$lib/server/db/schema';
import { startJobs, stopJobs } from '$lib/server/jobs';
import { bulkImportJob } from '$lib/server/tariffs/bulk/bulk-job';
import type { BulkJobData } from '$lib/server/tariffs/bulk/bulk-status';
import { bulkStatus, type BulkStatus } from '$lib/server/tariffs/bulk/bulk-status';
import { putPart } from '$lib/server/tariffs/bulk/bulk-upload';
import { startBulkImport } from '$lib/server/tariffs/bulk/bulk-start';
import { getObject } from '$lib/server/storage/object-store';
import { makeUser } from './fixtures';

// The bulk import end to end against the PostgreSQL, job queue and S3 stand-in that `npm test` starts.
// The rates are the two public records of tests/fixtures/urdb/ (Florida Power & Light RS-1, Georgia
// Power's residential time-of-use) under labels invented for this run, plus invented broken ones.
const tag = `bulk-${Date.now()}`;
const RS1 = JSON.parse(readFileSync('tests/fixtures/urdb/fpl-rs1-2015.json', 'utf8'));
const TOU = JSON.parse(readFileSync('tests/fixtures/urdb/georgia-power-tou-reo-2013.json', 'utf8')).items[0];
const label = (n: number) => `${tag}-${n}`;
let author: { id: string; name: string | null; email: string };

/** Stores `text` as an upload in parts of `partBytes` and runs the import job on it to its end. */
async function runImport(text: string, filters: Partial<BulkJobData['filters']> = {}, partBytes = 1500) {
	const bytes = new TextEncoder().encode(text);
	const uploadId = randomUUID();
	const parts = Math.ceil(bytes.length / partBytes);
	for (let part = 0; part < parts; part += 1)
		await putPart(uploadId, part, bytes.slice(part * partBytes, (part + 1) * partBytes));
	const jobId = await bulkImportJob.send({
		uploadId,
		parts,
		bytes: bytes.length,
		fileName: 'invented-rates.json',
		filters: { sectors: [], utilityContains: '', timezone: 'America/New_York', ...filters },
		author
	});
	expect(jobId).toBeTruthy();
	let status: BulkStatus | null = null;
	for (const started = Date.now(); Date.now() - started < 30_000;) {
		status = await bulkStatus(jobId!);
		if (status?.state === 'finished' || status?.state === 'failed') break;
		await new Promise((resolve) => setTimeout(resolve, 100));
	}
	expect(status?.state).toBe('finished');
	return { report: status!.report!, uploadId, parts };
}

const publicByLabel = (labels: string[]) =>
	db
		.select({ tariff: tariffs, version: tariffVersions })
		.from(tariffs)
		.innerJoin(tariffVersions, eq(tariffVersions.tariffId, tariffs.id))
		.where(and(isNull(tariffs.workspaceId), inArray(tariffs.urdbLabel, labels)));

beforeAll(async () => {
	author = await makeUser(`admin-${tag}@example.org`, 'Bulk import admin (invented)', { isAdmin: true });
	await startJobs();
});

afterAll(async () => {
	// Hundreds of public tariffs would crowd the site form's choices in the files that run later.
	await db.delete(tariffs).where(like(tariffs.urdbLabel, `${tag}-%`));
	await stopJobs();
	await client.end({ timeout: 5 });
});

describe('a small file: 3 good rates, 1 broken, 1 duplicate label, 1 filtered out', () => {
	it('imports 3, skips 1 with its reason, finds 1 already present, and counts 1 filtered out', async () => {
		const brokenSchedule = {
			...RS1,
			label: label(4),
			name: 'Invented broken rate',
			energyweekdayschedule: RS1.energyweekdayschedule.slice(0, 11)
		};
		const rates = [
			{ ...RS1, label: label(1) },
			{ ...TOU, label: label(2) },
			brokenSchedule,
			{ ...RS1, label: label(3), name: 'RS-1 copy (invented label)' },
			{ ...RS1, label: label(1), name: 'Same label as the first (invented)' },
			{ ...RS1, label: label(6), sector: 'Lighting', name: 'Invented street lighting' }
		];
		const { report, uploadId, parts } = await runImport(JSON.stringify(rates), {
			sectors: ['Residential', 'Commercial']
		});
		expect(report).toMatchObject({
			phase: 'done',
			read: 6,
			imported: 3,
			skipped: 1,
			present: 1,
			filteredBySector: 1,
			filteredByUtility: 0,
			message: null
		});
		expect(report.bytesRead).toBe(report.bytesTotal);
		expect(report.skippedList).toEqual([
			{
				index: 2,
				label: label(4),
				name: 'Invented broken rate',
				reasons: ['Weekday schedule: A schedule must have 12 months']
			}
		]);
		expect(report.presentList.map((r) => r.label)).toEqual([label(1)]);
		expect(report.importedList.map((r) => r.label)).toEqual([label(1), label(2), label(3)]);

		const saved = await publicByLabel([label(1), label(2), label(3), label(4), label(6)]);
		expect(saved.map((s) => s.tariff.urdbLabel).sort()).toEqual([label(1), label(2), label(3)]);
		const first = saved.find((s) => s.tariff.urdbLabel === label(1))!;
		expect(first.tariff).toMatchObject({
			utility: 'Florida Power & Light Co.',
			name: 'RS-1 Residential Service',
			customerClass: 'residential',
			country: 'US',
			currency: 'USD',
			timezone: 'America/New_York',
			holidays: null
		});
		// RS-1's startdate 1433116800 and enddate 1440975600 (23:00 UTC on 30 August) as the dates entered.
		expect(first.version).toMatchObject({
			effectiveFrom: '2015-06-01',
			effectiveTo: '2015-08-31',
			source: RS1.uri
		});
		expect(first.version.structure.energyCharges?.[0]).toMatchObject({ type: 'tiered' });
		expect(report.importedList.find((r) => r.label === label(1))?.id).toBe(first.tariff.id);
		expect(report.presentList[0]!.id).toBe(first.tariff.id);
		// The upload's parts leave the store once the import is over.
		for (let part = 0; part < parts; part += 1)
			expect(await getObject(`urdb-bulk/${uploadId}/${String(part).padStart(4, '0')}`)).toBeNull();
	});

	it('imports nothing twice: the same file again finds its rates already present', async () => {
		const { report } = await runImport(JSON.stringify({ items: [{ ...RS1, label: label(1) }] }));
		expect(report).toMatchObject({ read: 1, imported: 0, present: 1 });
		expect(await publicByLabel([label(1)])).toHaveLength(1);
	});

	it('filters by utility, letters case aside', async () => {
		const rates = [
			{ ...RS1, label: label(7) },
			{ ...TOU, label: label(8) }
		];
		const { report } = await runImport(JSON.stringify(rates), { utilityContains: 'georgia POWER' });
		expect(report).toMatchObject({ read: 2, imported: 1, filteredByUtility: 1 });
		expect((await publicByLabel([label(7), label(8)])).map((s) => s.tariff.urdbLabel)).toEqual([label(8)]);
	});
});

describe('starting an import from the page’s form', () => {
	const form = (fields: Record<string, string | string[]>, file?: File) => {
		const data = new FormData();
		for (const [name, value] of Object.entries(fields))
			for (const one of [value].flat()) data.append(name, one);
		if (file) data.append('file', file);
		return data;
	};
	const filters = { sectors: ['Residential'], utilityContains: '', timezone: 'America/Chicago' };

	it('refuses bad filters beside their fields, in words, and keeps what was typed', async () => {
		const out = await startBulkImport(
			form({ sectors: ['Residential', 'Farms'], utilityContains: 'x'.repeat(130), timezone: 'Mars/Olympus' }),
			author
		);
		expect(out).toMatchObject({
			ok: false,
			status: 400,
			errors: {
				sectors: 'Pick sectors from the list',
				utilityContains: 'Utility must be at most 120 characters',
				timezone: 'Time zone must be an IANA name such as America/Chicago'
			},
			values: { sectors: ['Residential', 'Farms'], timezone: 'Mars/Olympus' }
		});
	});

	it('refuses a form without a file, and an upload whose parts did not all arrive', async () => {
		expect(await startBulkImport(form(filters), author)).toMatchObject({
			ok: false,
			errors: { file: 'Choose a JSON file of rates from the open rate database.' }
		});
		const uploadId = randomUUID();
		await putPart(uploadId, 0, new TextEncoder().encode('[{"label":'));
		expect(await startBulkImport(form({ ...filters, uploadId, parts: '2' }), author)).toMatchObject({
			ok: false,
			errors: { file: 'The upload is incomplete: part 2 of 2 did not arrive. Choose the file again.' }
		});
	});

	it('queues the import of a file sent with the form itself (the page without scripts)', async () => {
		const file = new File([JSON.stringify([{ ...RS1, label: label(20) }])], 'one-rate.json');
		const out = await startBulkImport(form(filters, file), author);
		expect(out.ok).toBe(true);
		let status: BulkStatus | null = null;
		for (const started = Date.now(); Date.now() - started < 30_000;) {
			status = await bulkStatus(out.ok ? out.jobId : '');
			if (status?.state === 'finished') break;
			await new Promise((resolve) => setTimeout(resolve, 100));
		}
		expect(status).toMatchObject({ state: 'finished', fileName: 'one-rate.json', report: { imported: 1 } });
	});
});

describe('a larger file', () => {
	it('imports 300 rates read from parts of 64 kB, each saved in its own transaction (time logged)', async () => {
		const labels = Array.from({ length: 300 }, (_, i) => `${tag}-many-${i}`);
		const text = JSON.stringify(labels.map((l) => ({ ...RS1, label: l })));
		const started = performance.now();
		const { report } = await runImport(text, {}, 64 * 1024);
		const seconds = (performance.now() - started) / 1000;
		console.log(
			`300 rates (${(text.length / 1e6).toFixed(1)} MB) imported in ${seconds.toFixed(1)} s: ${((seconds * 1000) / 300).toFixed(1)} ms a rate`
		);
		expect(report).toMatchObject({ phase: 'done', read: 300, imported: 300, skipped: 0 });
		expect(report.importedList).toHaveLength(25);
		expect(report.unlisted).toBe(275);
		expect(await publicByLabel(labels)).toHaveLength(300);
	}, 60_000);
});

describe('a file that breaks off', () => {
	it('stops at malformed JSON mid-file with a clear message, and keeps the rates imported before it', async () => {
		const good = [label(10), label(11)].map((l) => JSON.stringify({ ...RS1, label: l }));
		const text = `[${good.join(',')},{"label":"${label(12)}","name": tru, ${JSON.stringify({ ...RS1, label: label(13) })}]`;
		const { report } = await runImport(text);
		expect(report.phase).toBe('stopped');
		expect(report.message).toMatch(
			/^The file is not valid JSON after rate 2 \(about 0 MB in\): the import stopped there/
		);
		expect(report).toMatchObject({ read: 2, imported: 2 });
		expect(
			(await publicByLabel([label(10), label(11), label(12), label(13)]))
				.map((s) => s.tariff.urdbLabel)
				.sort()
		).toEqual([label(10), label(11)]);
	});
});
