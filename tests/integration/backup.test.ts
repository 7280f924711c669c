import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import postgres from 'postgres';
import { afterAll, describe, expect, it } from 'vitest';

// A round trip through `npm run backup` and `npm run restore`: the restored database holds the same
// rows, checked by count and by an md5 over each key table's rows in a fixed order.
const url = process.env.DATABASE_URL!;
const KEY_TABLES = [
	'user',
	'workspace',
	'membership',
	'tariff',
	'tariff_version',
	'site',
	'scenario',
	'device',
	'bill',
	'audit_event'
];
const copyName = `runrate_restore_${process.pid}`;
const copyUrl = url.replace(/\/[^/]+$/, `/${copyName}`);
const dir = mkdtempSync(join(tmpdir(), 'runrate-backup-'));

async function fingerprint(connection: string) {
	const sql = postgres(connection, { max: 1, onnotice: () => {} });
	try {
		const out: Record<string, { rows: number; md5: string | null }> = {};
		for (const table of KEY_TABLES) {
			const [row] = await sql.unsafe(
				`select count(*)::int as rows, md5(string_agg(t::text, '|' order by t::text)) as md5 from "${table}" t`
			);
			out[table] = { rows: row!.rows as number, md5: row!.md5 as string | null };
		}
		return out;
	} finally {
		await sql.end();
	}
}

afterAll(async () => {
	const admin = postgres(url, { max: 1, onnotice: () => {} });
	await admin.unsafe(`drop database if exists ${copyName}`);
	await admin.end();
	rmSync(dir, { recursive: true, force: true });
});

describe('backup and restore', () => {
	it('restores every row of the key tables into an empty database', async () => {
		execFileSync('node', ['scripts/backup.mjs'], { env: { ...process.env, BACKUP_DIR: dir }, stdio: 'pipe' });
		const [file] = readdirSync(dir);
		expect(file).toMatch(/^runrate-\d{8}T\d{6}Z\.dump$/);

		const admin = postgres(url, { max: 1, onnotice: () => {} });
		await admin.unsafe(`drop database if exists ${copyName}`);
		await admin.unsafe(`create database ${copyName}`);
		await admin.end();
		execFileSync('node', ['scripts/restore.mjs', join(dir, file!)], {
			env: { ...process.env, DATABASE_URL: copyUrl },
			stdio: 'pipe'
		});

		const before = await fingerprint(url);
		const after = await fingerprint(copyUrl);
		expect(before.site!.rows).toBeGreaterThan(0);
		expect(after).toEqual(before);
	}, 60_000);

	it('refuses a file that is not a backup and leaves the database as it was', async () => {
		const before = await fingerprint(copyUrl);
		let failed = false;
		try {
			execFileSync('node', ['scripts/restore.mjs', 'package.json'], {
				env: { ...process.env, DATABASE_URL: copyUrl },
				stdio: 'pipe'
			});
		} catch {
			failed = true;
		}
		expect(failed).toBe(true);
		expect(await fingerprint(copyUrl)).toEqual(before);
	}, 60_000);
});
