// Sending mail through nodemailer: to the configured SMTP server, or to the local catcher.
import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config';
import { startCatcher } from './catcher';

let transporter: Promise<Transporter> | undefined;

async function makeTransport(): Promise<Transporter> {
	const c = config();
	if (c.SMTP_HOST) {
		return nodemailer.createTransport({
			host: c.SMTP_HOST,
			port: c.SMTP_PORT,
			secure: c.SMTP_SECURE,
			auth: c.SMTP_USER ? { user: c.SMTP_USER, pass: c.SMTP_PASS ?? '' } : undefined
		});
	}
	const { port } = await startCatcher();
	return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
}

export interface Mail {
	to: string | string[];
	subject: string;
	text: string;
	html?: string;
	attachments?: { filename: string; content: Buffer | string; contentType: string }[];
}

export async function sendMail(mail: Mail) {
	transporter ??= makeTransport();
	const t = await transporter;
	return t.sendMail({ from: config().MAIL_FROM, ...mail });
}

export const mailIsCaptured = () => !config().SMTP_HOST;
