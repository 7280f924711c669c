import nodemailer from 'nodemailer';
import { env } from '$env/dynamic/private';
import { logger } from './log';

// In development and tests SMTP_URL points at the local catcher started by `npm start` / `npm test`;
// in production it is the hosted mail service's SMTP endpoint.
const transport = nodemailer.createTransport(env.SMTP_URL ?? 'smtp://127.0.0.1:2525', {
	from: env.MAIL_FROM ?? 'Runrate <no-reply@runrate.example.org>'
});

export type Mail = { to: string; subject: string; text: string };

/** Sends a plain-text message; links in it stay clickable in every mail program. */
export async function sendMail(mail: Mail): Promise<void> {
	await transport.sendMail({ to: mail.to, subject: mail.subject, text: mail.text });
	logger.info({ to: mail.to, subject: mail.subject }, 'mail sent');
}

export const mailServer = env.SMTP_URL ?? 'smtp://127.0.0.1:2525';
