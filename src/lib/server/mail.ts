import nodemailer from 'nodemailer';
import { env } from '$env/dynamic/private';
import { defineJob } from './jobs';
import { logger } from './log';

// In development and tests SMTP_URL points at the local catcher started by `npm start` / `npm test`;
// in production it is the hosted mail service's SMTP endpoint.
const transport = nodemailer.createTransport(env.SMTP_URL ?? 'smtp://127.0.0.1:2525', {
	from: env.MAIL_FROM ?? 'Runrate <no-reply@runrate.example.org>'
});

export type Mail = { to: string; subject: string; text: string };

/** Sends a plain-text message now; links in it stay clickable in every mail program. Inside a job that
 * the queue already retries (the tariff notices); everywhere else, `sendMail`. */
export async function deliverMail(mail: Mail): Promise<void> {
	await transport.sendMail({ to: mail.to, subject: mail.subject, text: mail.text });
	logger.info({ to: mail.to, subject: mail.subject }, 'mail sent');
}

const mailJob = defineJob<Mail>('send-mail', deliverMail);

/**
 * Queues a message. A mail server that is down or turns a message away for a moment delays it instead
 * of failing the person's request, and the queue tries again (five times, backing off).
 */
export async function sendMail(mail: Mail): Promise<void> {
	await mailJob.send(mail);
}

export const mailServer = env.SMTP_URL ?? 'smtp://127.0.0.1:2525';
