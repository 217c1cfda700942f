// A local SMTP server that captures every message into the outbox table. It runs whenever no
// real SMTP_HOST is configured (development, the demo, tests), so mail always takes the real
// SMTP path through nodemailer and admins can read what would have been sent.
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { AddressInfo } from 'node:net';
import { db } from '../db';
import { outbox } from '../db/schema';

const addresses = (a: AddressObject | AddressObject[] | undefined) =>
	(Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

export async function captureMessage(raw: Buffer) {
	const mail = await simpleParser(raw);
	db()
		.insert(outbox)
		.values({
			from: addresses(mail.from),
			to: addresses(mail.to),
			subject: mail.subject ?? '(no subject)',
			text: mail.text ?? '',
			html: typeof mail.html === 'string' ? mail.html : null,
			attachments: mail.attachments.map((a) => ({
				filename: a.filename ?? 'attachment',
				contentType: a.contentType,
				size: a.size
			})),
			raw: raw.toString('utf8')
		})
		.run();
}

let running: Promise<{ port: number; close: () => Promise<void> }> | undefined;

/** Starts the catcher once, on a free port of 127.0.0.1. */
export function startCatcher() {
	running ??= new Promise((resolve, reject) => {
		const server = new SMTPServer({
			authOptional: true,
			disabledCommands: ['STARTTLS'],
			logger: false,
			size: 30 * 1024 * 1024,
			onData(stream, _session, callback) {
				const chunks: Buffer[] = [];
				stream.on('data', (c: Buffer) => chunks.push(c));
				stream.on('end', () => {
					captureMessage(Buffer.concat(chunks)).then(
						() => callback(),
						(e: Error) => callback(e)
					);
				});
			}
		});
		server.on('error', reject);
		server.listen(0, '127.0.0.1', () => {
			const { port } = server.server.address() as AddressInfo;
			resolve({ port, close: () => new Promise<void>((done) => server.close(() => done())) });
		});
	});
	return running;
}

export async function stopCatcher() {
	if (!running) return;
	const { close } = await running;
	running = undefined;
	await close();
}
