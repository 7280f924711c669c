// `npm start`: everything a person needs to try Runrate on this machine, with demo data.
// PostgreSQL on 127.0.0.1:5544 (PGPORT), the e-mail catcher and S3 stand-in, then the production build.
import { readFileSync } from 'node:fs';
import {
	ensureDependencies,
	localSecret,
	log,
	root,
	run,
	runOrThrow,
	startService,
	stopGroup
} from './lib.mjs';
import { migrateSeedAndStartStandIns, standInEnv } from './local-services.mjs';

const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.PGPORT ?? 5544);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const mailViewPort = Number(process.env.MAIL_VIEW_PORT ?? 3025);
const s3Port = Number(process.env.S3_PORT ?? 4569);
const origin = process.env.ORIGIN ?? `http://127.0.0.1:${port}`;
const databaseUrl = `postgres://postgres@127.0.0.1:${pgPort}/runrate`;

const children = [];
let stopping = false;

async function stop(code = 0) {
	if (stopping) return;
	stopping = true;
	log('start', 'stopping');
	for (const child of children.reverse()) stopGroup(child);
	await new Promise((r) => setTimeout(r, 500));
	await run('bash', ['scripts/pg.sh', 'stop'], { env: { PGPORT: String(pgPort) } });
	process.exit(code);
}
process.on('SIGINT', () => stop(0));
process.on('SIGTERM', () => stop(0));

try {
	ensureDependencies();
	const env = {
		DATABASE_URL: databaseUrl,
		AUTH_SECRET: process.env.AUTH_SECRET ?? localSecret(),
		...standInEnv({ smtpPort, mailViewPort, s3Port, s3Dir: `${root}/.data/s3` })
	};
	await runOrThrow('bash', ['scripts/pg.sh', 'start'], { env: { PGPORT: String(pgPort) } });
	// In the project's .data/pg, or in ~postgres/runrate/… when the clone sits in a private folder.
	const pgData = (await runOrThrow('bash', ['scripts/pg.sh', 'where'], { quiet: true })).output.trim();
	children.push(await migrateSeedAndStartStandIns(env));
	log('start', 'building the production bundle (about a minute)');
	await runOrThrow('npx', ['vite', 'build', '--logLevel', 'warn'], { env });
	const app = await startService('app', 'node', ['build'], {
		env: {
			...env,
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: origin,
			NODE_ENV: 'production',
			BODY_SIZE_LIMIT: '11M'
		},
		ready: /Listening on/
	});
	children.push(app);
	app.stdout.on('data', (d) => process.stdout.write(d));
	app.stderr.on('data', (d) => process.stderr.write(d));
	app.on('exit', (code) => stop(code ?? 1));

	const people = JSON.parse(readFileSync(`${root}/data/demo-people.json`, 'utf8'));
	console.log(`
  Runrate is running at ${origin}

  Demo sign-ins (invented people), password ${people.password}
${people.users.map((u) => `    ${u.email.padEnd(22)} ${u.name}`).join('\n')}

  Captured e-mail (sign-in links, invitations): ${env.MAIL_VIEW_URL}
  PostgreSQL: 127.0.0.1:${pgPort} (data in ${pgData})   S3 stand-in: ${env.S3_ENDPOINT}
  Ctrl-C stops everything.
`);
} catch (error) {
	console.error(`[start] ${error.message}`);
	await stop(1);
}
