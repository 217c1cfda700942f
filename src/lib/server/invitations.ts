// One-time invitation links: the token is only in the e-mail; we keep its SHA-256.
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import type { Role } from '../domain';
import { config } from './config';
import { db } from './db';
import { invitations, users } from './db/schema';
import { sendMail } from './mail/send';
import { hashToken, LinkError, looksLikeToken, newToken } from './one-time-token';
import { hashPassword } from './passwords';
import { createUser, findUserByEmail, normaliseEmail, setRoles } from './users';

export const INVITATION_DAYS = 7;

export class InvitationError extends LinkError {}

export async function invite(input: {
	email: string;
	name: string;
	roles: Role[];
	invitedBy: number;
	now?: number;
}) {
	const email = normaliseEmail(input.email);
	const existing = findUserByEmail(email);
	if (existing?.passwordHash) throw new InvitationError('That person already has an account.');
	const { token, hash } = newToken();
	const now = input.now ?? Date.now();
	db()
		.insert(invitations)
		.values({
			email,
			name: input.name,
			roles: input.roles,
			tokenHash: hash,
			invitedBy: input.invitedBy,
			expiresAt: new Date(now + INVITATION_DAYS * 86_400_000)
		})
		.run();
	return { link: await mailInvitation(email, input.name, input.roles, token) };
}

async function mailInvitation(
	email: string,
	name: string,
	roles: readonly string[],
	token: string
) {
	const link = `${config().origin}/invite/${token}`;
	await sendMail({
		to: email,
		subject: 'You are invited to Floorset',
		text: [
			`Hello ${name},`,
			'',
			`You have been invited to your dance team's Floorset as: ${roles.join(', ')}.`,
			`Set your password here (the link works once, for ${INVITATION_DAYS} days):`,
			link,
			'',
			'If you were not expecting this, you can ignore this message.'
		].join('\n')
	});
	return link;
}

export interface PendingInvitation {
	id: number;
	email: string;
	name: string;
	roles: string[];
	expiresAt: string;
	expired: boolean;
}

/** Invitations not yet used, newest first; expired ones too, so they can be sent again. */
export function pendingInvitations(now = Date.now()): PendingInvitation[] {
	return db()
		.select()
		.from(invitations)
		.where(isNull(invitations.acceptedAt))
		.orderBy(desc(invitations.createdAt), desc(invitations.id))
		.all()
		.map((i) => ({
			id: i.id,
			email: i.email,
			name: i.name,
			roles: i.roles,
			expiresAt: i.expiresAt.toISOString(),
			expired: i.expiresAt.getTime() <= now
		}));
}

/**
 * Sends an unused invitation again with a new link and a new week; the old link stops
 * working. False when there is no such unused invitation.
 */
export async function resendInvitation(id: number, now = Date.now()): Promise<boolean> {
	const { token, hash } = newToken();
	const row = db()
		.update(invitations)
		.set({ tokenHash: hash, expiresAt: new Date(now + INVITATION_DAYS * 86_400_000) })
		.where(and(eq(invitations.id, id), isNull(invitations.acceptedAt)))
		.returning()
		.get();
	if (!row) return false;
	await mailInvitation(row.email, row.name, row.roles, token);
	return true;
}

/** Withdraws an unused invitation: its link stops working. */
export function cancelInvitation(id: number): boolean {
	const row = db()
		.delete(invitations)
		.where(and(eq(invitations.id, id), isNull(invitations.acceptedAt)))
		.returning({ id: invitations.id })
		.get();
	return !!row;
}

/** The open invitation behind a token, or null when it is unknown, used or expired. */
export function findOpenInvitation(token: string, now = Date.now()) {
	if (!looksLikeToken(token)) return null;
	return (
		db()
			.select()
			.from(invitations)
			.where(
				and(
					eq(invitations.tokenHash, hashToken(token)),
					isNull(invitations.acceptedAt),
					gt(invitations.expiresAt, new Date(now))
				)
			)
			.get() ?? null
	);
}

export async function acceptInvitation(token: string, password: string, now = Date.now()) {
	const inv = findOpenInvitation(token, now);
	if (!inv) throw new InvitationError('This invitation link is no longer valid.');
	const passwordHash = await hashPassword(password);
	return db().transaction((tx) => {
		// Claim the invitation first, so the same link cannot be used twice concurrently.
		const claimed = tx
			.update(invitations)
			.set({ acceptedAt: new Date(now) })
			.where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt)))
			.run();
		if (claimed.changes !== 1) throw new InvitationError('This invitation link was already used.');
		const existing = findUserByEmail(inv.email);
		if (existing) {
			if (existing.passwordHash) throw new InvitationError('That person already has an account.');
			// Someone known before (their access was withdrawn): the new invitation's roles hold.
			tx.update(users).set({ passwordHash }).where(eq(users.id, existing.id)).run();
			setRoles(existing.id, inv.roles as Role[]);
			return existing.id;
		}
		return createUser({
			email: inv.email,
			name: inv.name,
			passwordHash,
			roles: inv.roles as Role[]
		}).id;
	});
}
