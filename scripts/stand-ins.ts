// Local stand-ins for the hosted services, for development and tests only (loopback):
// an SMTP catcher with a small web view and JSON API, and an S3-compatible store (s3rver).
import { createServer } from 'node:http';
import { mkdirSync } from 'node:fs';
import { simpleParser } from 'mailparser';
import S3rver from 's3rver';
import { SMTPServer } from 'smtp-server';

const host = '127.0.0.1';
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const mailViewPort = Number(process.env.MAIL_VIEW_PORT ?? 3025);
const s3Port = Number(process.env.S3_PORT ?? 4569);
const s3Dir = process.env.S3_DIR ?? '.data/s3';
const bucket = process.env.S3_BUCKET ?? 'runrate-uploads';

type Captured = {
	id: number;
	to: string[];
	from: string;
	subject: string;
	text: string;
	html: string;
	date: string;
};
const messages: Captured[] = [];
let nextId = 1;

const smtp = new SMTPServer({
	// Auth.js's Nodemailer provider sends an empty login: accept mail without AUTH or STARTTLS (loopback only).
	disabledCommands: ['STARTTLS', 'AUTH'],
	logger: false,
	size: 10 * 1024 * 1024,
	onData(stream, session, callback) {
		simpleParser(stream)
			.then((mail) => {
				messages.push({
					id: nextId++,
					to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
					from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
					subject: mail.subject ?? '',
					text: mail.text ?? '',
					html: typeof mail.html === 'string' ? mail.html : '',
					date: new Date().toISOString()
				});
				if (messages.length > 500) messages.shift();
				callback();
			})
			.catch((error: Error) => callback(error));
	}
});

const escapeHtml = (s: string) =>
	s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
const linkify = (s: string) => escapeHtml(s).replace(/https?:\/\/[^\s<]+/g, (u) => `<a href="${u}">${u}</a>`);

const view = createServer((req, res) => {
	const url = new URL(req.url ?? '/', `http://${host}`);
	if (url.pathname === '/messages' && req.method === 'DELETE') {
		messages.length = 0;
		res.writeHead(204).end();
		return;
	}
	if (url.pathname === '/messages') {
		const to = url.searchParams.get('to')?.toLowerCase();
		const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
		res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(list));
		return;
	}
	const rows = [...messages]
		.reverse()
		.map(
			(m) =>
				`<article><h2>${escapeHtml(m.subject)}</h2><p class="meta">To ${escapeHtml(m.to.join(', '))} · ${m.date}</p><pre>${linkify(m.text)}</pre></article>`
		)
		.join('');
	res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' }).end(
		`<!doctype html><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>Captured e-mail (development)</title>
<style>body{font:16px/1.5 system-ui,sans-serif;max-width:46rem;margin:2rem auto;padding:0 1rem;color:#17232b}
article{border:1px solid #c9d3d8;border-radius:.5rem;padding:1rem;margin:1rem 0}h2{margin:0;font-size:1.1rem}
.meta{color:#4b5b63;margin:.25rem 0}pre{white-space:pre-wrap;font:inherit}a{color:#0b6b5d}</style>
<h1>Captured e-mail</h1><p>Development stand-in: nothing here was delivered. Newest first; reload to refresh.</p>${rows || '<p>No e-mail yet.</p>'}`
	);
});

mkdirSync(s3Dir, { recursive: true });
const s3 = new S3rver({
	address: host,
	port: s3Port,
	directory: s3Dir,
	silent: true,
	configureBuckets: [{ name: bucket, configs: [] }]
});

await new Promise<void>((resolve) => smtp.listen(smtpPort, host, resolve));
await new Promise<void>((resolve) => view.listen(mailViewPort, host, resolve));
await s3.run();
console.log(
	`[stand-ins] SMTP catcher smtp://${host}:${smtpPort}, captured e-mail at http://${host}:${mailViewPort}, S3 store http://${host}:${s3Port} (bucket ${bucket})`
);

const shutdown = async () => {
	smtp.close(() => {});
	view.close();
	await s3.close();
	process.exit(0);
};
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
