// "Forgot your password?": a one-time link by e-mail to set a new one. Only a person who can sign
// in now may reset (someone whose access was withdrawn needs a new invitation from an admin).
// The asker learns nothing about whether an address has an account: the answer is the same
// either way, and takes about as long. Figures are our own judgement, in the spirit of OWASP's
// forgot-password guidance (from memory): links short-lived and single-use, asking limited.
import { and, count, eq, gt, isNull } from 'drizzle-orm';
import { config } from './config';
import { db } from './db';
import { passwordResets, users } from './db/schema';
import { sendMail } from './mail/send';
import { hashToken, LinkError, looksLikeToken, newToken } from './one-time-token';
import { hashPassword } from './passwords';
import { clearAccount } from './sign-in-limit';
import { SlidingWindowLimit } from './sliding-window-limit';
import { findUserByEmail } from './users';

export const RESET_MINUTES = 60;
/** Links mailed to one person per hour, however often the form is sent. */
export const RESETS_PER_HOUR = 3;

/**
 * Asks from one address per hour, whatever addresses they name: one machine cannot make the
 * team's mailboxes fill with links (each person still gets at most RESETS_PER_HOUR).
 */
export const ASKS_PER_ADDRESS_HOUR = 10;
export const resetAskLimit = new SlidingWindowLimit(ASKS_PER_ADDRESS_HOUR, 3_600_000);

export class ResetError extends LinkError {}

/**
 * Mails a reset link when `email` belongs to someone who can sign in, within the hourly limit;
 * otherwise does nothing. The mail is not awaited, so the answer takes about as long either way.
 * Returns the link for tests (never shown to the asker).
 */
export function requestReset(email: string, now = Date.now()): { link: string } | null {
	const user = findUserByEmail(email);
	if (!user?.passwordHash) return null;
	const recent = db()
		.select({ n: count() })
		.from(passwordResets)
		.where(
			and(
				eq(passwordResets.userId, user.id),
				gt(passwordResets.createdAt, new Date(now - 3_600_000))
			)
		)
		.get()!.n;
	if (recent >= RESETS_PER_HOUR) return null;
	const { token, hash } = newToken();
	db()
		.insert(passwordResets)
		.values({
			userId: user.id,
			tokenHash: hash,
			expiresAt: new Date(now + RESET_MINUTES * 60_000),
			createdAt: new Date(now)
		})
		.run();
	const link = `${config().origin}/reset/${token}`;
	sendMail({
		to: user.email,
		subject: 'Set a new Floorset password',
		text: [
			`Hello ${user.name},`,
			'',
			'Someone (we hope you) asked to set a new password for your Floorset account.',
			`Set it here (the link works once, for ${RESET_MINUTES} minutes):`,
			link,
			'',
			'Setting a new password signs you out everywhere else.',
			'If you did not ask, ignore this message: your password stays as it is.'
		].join('\n')
	}).catch((e: unknown) => console.error('[reset] the mail could not be sent:', e));
	return { link };
}

/** The open reset behind a token with the person it is for, or null when unknown, used or expired. */
export function findOpenReset(token: string, now = Date.now()) {
	if (!looksLikeToken(token)) return null;
	return (
		db()
			.select({ id: passwordResets.id, userId: users.id, email: users.email, name: users.name })
			.from(passwordResets)
			.innerJoin(users, eq(users.id, passwordResets.userId))
			.where(
				and(
					eq(passwordResets.tokenHash, hashToken(token)),
					isNull(passwordResets.usedAt),
					gt(passwordResets.expiresAt, new Date(now))
				)
			)
			.get() ?? null
	);
}

/**
 * Sets the new password and spends the link (and any other open link of the same person). The
 * password stamp in every older session no longer matches, so they all end.
 */
export async function completeReset(token: string, password: string, now = Date.now()) {
	const open = findOpenReset(token, now);
	if (!open) throw new ResetError('This link is no longer valid. Ask for a new one.');
	const passwordHash = await hashPassword(password);
	db().transaction((tx) => {
		const spent = tx
			.update(passwordResets)
			.set({ usedAt: new Date(now) })
			.where(and(eq(passwordResets.userId, open.userId), isNull(passwordResets.usedAt)))
			.run();
		if (spent.changes === 0) throw new ResetError('This link was already used.');
		const user = tx.select().from(users).where(eq(users.id, open.userId)).get();
		// Access withdrawn since the link was sent: the link must not give it back.
		if (!user?.passwordHash) throw new ResetError('This link is no longer valid.');
		tx.update(users).set({ passwordHash }).where(eq(users.id, open.userId)).run();
	});
	clearAccount(open.email);
	return open.userId;
}
