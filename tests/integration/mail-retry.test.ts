import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { env } from '$env/dynamic/private';
import { client, db } from '$lib/server/db';
import { notices, scenarios } from '$lib/server/db/schema';
import { startJobs, stopJobs } from '$lib/server/jobs';
import { saveDevices } from '$lib/server/sites/equipment.service';
import { createTariff, publishVersion } from '$lib/server/tariffs/tariff.service';
import { flat, makeSite, makeUser, tariffMeta, versionMeta } from './fixtures';

// Against the real PostgreSQL and job queue of `npm test`, with a mail server of the test's own that turns
// the first attempt away. Invented people, site and tariff; the queue keeps its production retry settings.
const tag = `retry-${Date.now()}`;
const recipient = `owner-${tag}@example.org`;
/** Someone sent a message straight from a request (an invitation, a sign-in link). */
const invitee = `invitee-${tag}@example.org`;
const attempts: { at: number; accepted: boolean }[] = [];
const inviteeAttempts: { at: number; accepted: boolean }[] = [];
const delivered: { at: number; to: string[]; subject: string; text: string }[] = [];

/** Says "451, try again later" to the first RCPT for the owner and for the invitee, then takes mail as any
 * server would. */
const smtp = new SMTPServer({
	disabledCommands: ['STARTTLS', 'AUTH'],
	logger: false,
	onRcptTo(address, _session, callback) {
		const to = address.address.toLowerCase();
		const tries = to === recipient ? attempts : to === invitee ? inviteeAttempts : null;
		if (!tries) return callback();
		const accepted = tries.length > 0;
		tries.push({ at: Date.now(), accepted });
		if (accepted) return callback();
		callback(Object.assign(new Error('Mailbox busy, try again later (test)'), { responseCode: 451 }));
	},
	onData(stream, session, callback) {
		simpleParser(stream)
			.then((mail) => {
				delivered.push({
					at: Date.now(),
					to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
					subject: mail.subject ?? '',
					text: mail.text ?? ''
				});
				callback();
			})
			.catch(callback);
	}
});

let announceVersion: (job: { tariffId: string; versionNumber: number }) => Promise<string | null>;
let tariffId = '';
let workspaceId = '';

const meta = tariffMeta(`Invented Utility ${tag}`, 'Retry test rate');
const version = (effectiveFrom: string) => versionMeta(effectiveFrom, 'Energy rate doubled (invented).');

async function until<T>(what: string, find: () => Promise<T | undefined> | T | undefined, ms: number) {
	for (const started = Date.now(); Date.now() - started < ms;) {
		const found = await find();
		if (found !== undefined) return found;
		await new Promise((resolve) => setTimeout(resolve, 100));
	}
	throw new Error(`Waited ${ms} ms for ${what}`);
}

/** The queue's row for the job whose data has `key` = `value`, once the queue has completed it. */
async function completedJob(what: string, name: string, key: string, value: string) {
	const [job] = await until(
		`${what} to complete`,
		async () => {
			const rows = await client<{ state: string; retryCount: number }[]>`
				select state, retry_count as "retryCount" from pgboss.job
				where name = ${name} and data->>${key}::text = ${value}`;
			return rows[0]?.state === 'completed' ? rows : undefined;
		},
		5_000
	);
	return job!;
}

beforeAll(async () => {
	await new Promise<void>((resolve) => smtp.listen(0, '127.0.0.1', resolve));
	// mail.ts builds its transport from SMTP_URL when first imported: point it here before anything does.
	env.SMTP_URL = `smtp://127.0.0.1:${(smtp.server.address() as AddressInfo).port}`;
	({ announceVersion } = await import('$lib/server/tariffs/tariff-notice.service'));
	const { createWorkspace } = await import('$lib/server/workspaces/workspace.service');

	const owner = await makeUser(recipient, 'Retry test owner (invented)');
	workspaceId = await createWorkspace(`Retry ${tag}`, owner.id);
	tariffId = await createTariff(
		{ meta, version: version('2026-01-01'), structure: flat(0.1), workspaceId: null },
		owner
	);
	await publishVersion(tariffId, 1, { meta, version: version('2027-01-01'), structure: flat(0.2) }, owner);
	const site = await makeSite(workspaceId, owner, `Retry pond ${tag}`, { tariffId });
	const [baseline] = await db.select().from(scenarios).where(eq(scenarios.siteId, site.id));
	const pump = { name: 'Pump', power: { watts: 1000 }, schedule: { type: 'always' as const } };
	await saveDevices(site, baseline!, baseline!.revision, [pump], owner);
	await startJobs();
});

afterAll(async () => {
	await stopJobs();
	await new Promise<void>((resolve) => smtp.close(resolve));
	await client.end({ timeout: 5 });
});

describe('a tariff notice whose first send the mail server turns away', () => {
	it('is retried by the job queue and delivered once, when the server takes mail again', async () => {
		const started = Date.now();
		await announceVersion({ tariffId, versionNumber: 2 });

		const mail = await until(
			'the notice to arrive',
			() => delivered.find((m) => m.to.includes(recipient)),
			25_000
		);
		const job = await completedJob('the notice job', 'tariff-version-notice', 'workspaceId', workspaceId);
		expect(attempts.map((a) => a.accepted)).toEqual([false, true]);
		expect(job.retryCount).toBeGreaterThanOrEqual(1);
		// RETRY: 5 s, doubled per attempt with jitter, so the first retry comes 5 to 10 s after the failure.
		expect(attempts[1]!.at - attempts[0]!.at).toBeGreaterThanOrEqual(4_000);
		expect(mail.at - started).toBeLessThan(25_000);

		expect(delivered.filter((m) => m.to.includes(recipient))).toHaveLength(1);
		expect(mail.subject).toBe(`Tariff change: Retry test rate (Retry ${tag})`);
		// 8,760 kWh in 2027 at 0.10 and at 0.20 a kWh (a 1 kW pump that never stops; invented rates).
		expect(mail.text).toContain(`Retry pond ${tag}: $876.00 → $1,752.00 a year (+$876.00)`);
		expect(await db.select().from(notices).where(eq(notices.workspaceId, workspaceId))).toHaveLength(1);
	}, 30_000);
});

describe('a message sent from a request whose first send the mail server turns away', () => {
	it('is queued at once, retried and delivered once', async () => {
		const { sendMail } = await import('$lib/server/mail');
		const started = Date.now();
		await sendMail({ to: invitee, subject: `Invitation (${tag})`, text: 'An invented invitation.' });
		// The request's part ends when the message is queued, not when a server takes it.
		expect(Date.now() - started).toBeLessThan(1_000);

		const mail = await until(
			'the message to arrive',
			() => delivered.find((m) => m.to.includes(invitee)),
			25_000
		);
		const job = await completedJob('the mail job', 'send-mail', 'to', invitee);
		expect(inviteeAttempts.map((a) => a.accepted)).toEqual([false, true]);
		expect(job.retryCount).toBeGreaterThanOrEqual(1);
		expect(delivered.filter((m) => m.to.includes(invitee))).toHaveLength(1);
		expect(mail.subject).toBe(`Invitation (${tag})`);
	}, 30_000);
});
