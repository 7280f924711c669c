// npm run restore FILE — puts a backup made by `npm run backup` back into the app database, replacing
// what is there, in one transaction: a restore that fails part-way leaves the database as it was.
// DATABASE_URL picks the database (default: npm start's, on 127.0.0.1:5544). Stop the app first.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const file = process.argv[2];
if (!file || !existsSync(file)) {
	console.error('[restore] usage: npm run restore backups/runrate-<time>.dump');
	process.exit(2);
}
const url = process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5544/runrate';
const started = performance.now();
const restore = spawnSync(
	'pg_restore',
	[
		'--clean',
		'--if-exists',
		'--no-owner',
		'--no-privileges',
		'--single-transaction',
		'--exit-on-error',
		`--dbname=${url}`,
		file
	],
	{ stdio: ['ignore', 'inherit', 'inherit'] }
);
if (restore.status !== 0) {
	console.error(
		`[restore] pg_restore failed (exit ${restore.status ?? restore.signal}); the database is unchanged`
	);
	process.exit(1);
}
console.log(`[restore] ${file} restored in ${Math.round(performance.now() - started)} ms`);
