// npm run backup — a pg_dump of the app database (custom format) to backups/runrate-<UTC time>.dump.
// DATABASE_URL picks the database (default: npm start's, on 127.0.0.1:5544); BACKUP_DIR the folder.
import { spawnSync } from 'node:child_process';
import { mkdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';

const url = process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5544/runrate';
const dir = resolve(process.env.BACKUP_DIR ?? 'backups');
mkdirSync(dir, { recursive: true });
const stamp = new Date()
	.toISOString()
	.replace(/[-:]/g, '')
	.replace(/\.\d+Z$/, 'Z');
const file = join(dir, `runrate-${stamp}.dump`);
const started = performance.now();
const dump = spawnSync(
	'pg_dump',
	['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, url],
	{
		stdio: ['ignore', 'inherit', 'inherit']
	}
);
if (dump.status !== 0) {
	console.error(`[backup] pg_dump failed (exit ${dump.status ?? dump.signal}); nothing was written to keep`);
	process.exit(1);
}
const ms = Math.round(performance.now() - started);
console.log(`[backup] ${file} (${statSync(file).size} bytes, ${ms} ms)`);
