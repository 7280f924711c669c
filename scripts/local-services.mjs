// Shared by start.mjs, test.mjs and load.mjs: how the app meets its local stand-ins and its database, so the
// three cannot drift apart.
import { rmSync } from 'node:fs';
import { run, runOrThrow, startService, stopGroup, tsNode } from './lib.mjs';

/**
 * The environment that points the app at the e-mail catcher and the S3 stand-in (scripts/stand-ins.ts), on
 * the ports the caller chose.
 */
export function standInEnv({ smtpPort, mailViewPort, s3Port, s3Dir }) {
	return {
		SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
		MAIL_VIEW_URL: `http://127.0.0.1:${mailViewPort}`,
		SMTP_PORT: String(smtpPort),
		MAIL_VIEW_PORT: String(mailViewPort),
		S3_PORT: String(s3Port),
		S3_DIR: s3Dir,
		S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
		S3_BUCKET: 'runrate-uploads',
		S3_ACCESS_KEY_ID: 'S3RVER',
		S3_SECRET_ACCESS_KEY: 'S3RVER'
	};
}

/**
 * Once PostgreSQL is up: migrates and seeds the database, then starts the stand-ins; resolves with the
 * stand-ins' child process for the caller to stop.
 */
export async function migrateSeedAndStartStandIns(env) {
	await runOrThrow(...tsNode('scripts/migrate.ts'), { env });
	await runOrThrow(...tsNode('scripts/seed.ts'), { env });
	return startService('stand-ins', ...tsNode('scripts/stand-ins.ts'), { env, ready: /\[stand-ins\]/ });
}

/**
 * Runs a script's `main` (resolving with its exit code), then stops the services it started, drops its
 * throwaway PostgreSQL (`pgEnv()`, once main has made one) and removes its folders, and exits with
 * main's code (1 when it threw).
 */
export async function runThenCleanUp(main, { children, pgEnv, folders }) {
	let code = 1;
	try {
		code = await main();
	} catch (error) {
		console.error(error);
	} finally {
		for (const child of children) stopGroup(child);
		if (pgEnv()) await run('bash', ['scripts/pg.sh', 'drop'], { env: pgEnv(), quiet: true });
		for (const folder of folders) rmSync(folder, { recursive: true, force: true });
	}
	process.exit(code);
}
