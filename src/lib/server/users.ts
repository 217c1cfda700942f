// People and their roles.
import { createHash } from 'node:crypto';
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { ROLES, type Role } from '../domain';
import { db } from './db';
import { preparedFor } from './db/prepared';
import { changeStamp } from './cache/change-stamp';
import { StampedCache } from './cache/stamped-cache';
import { invitations, passwordResets, userRoles, users } from './db/schema';

export interface SessionUser {
	id: number;
	email: string;
	name: string;
	roles: Role[];
}

export const normaliseEmail = (email: string) => email.trim().toLowerCase();

export function findUserByEmail(email: string) {
	return db()
		.select()
		.from(users)
		.where(sql`lower(${users.email}) = ${normaliseEmail(email)}`)
		.get();
}

// Read on every request (roles are never taken from the cookie), so prepared once.
const statements = preparedFor((d) => {
	const id = sql.placeholder('id');
	return {
		user: d.select().from(users).where(eq(users.id, id)).prepare(),
		roles: d.select().from(userRoles).where(eq(userRoles.userId, id)).prepare()
	};
});

export function rolesOf(userId: number): Role[] {
	const rows = statements().roles.all({ id: userId });
	return ROLES.filter((r) => rows.some((row) => row.role === r));
}

/**
 * A short fingerprint of a person's password hash, carried in their session. Setting a password
 * (a new one, or again after their access was withdrawn) makes the sessions issued before it
 * worthless, as Django does with its session auth hash (from memory). The hash is salted, so
 * the same password set again gives a new stamp.
 */
export const passwordStamp = (passwordHash: string) =>
	createHash('sha256').update(passwordHash).digest('base64url').slice(0, 22);

// Who is signed in, kept until an account or a role is next written (a password change included).
const WHO = ['users', 'user_roles'] as const;
const signedIn = new StampedCache<{ user: SessionUser; stamp: string } | null>(10_000, () => 1);

/** The person a session names, or null when they have no way in or the session predates their password. */
export function sessionUser(userId: number, stamp: string | null): SessionUser | null {
	const known = signedIn.through(String(userId), changeStamp(db().$client, WHO), () =>
		readSessionUser(userId)
	);
	return known && known.stamp === stamp ? known.user : null;
}

function readSessionUser(userId: number) {
	const user = statements().user.get({ id: userId });
	if (!user || !user.passwordHash) return null;
	// Shared by every request until the next write: frozen, so no request can change it for others.
	const frozen: SessionUser = Object.freeze({
		id: user.id,
		email: user.email,
		name: user.name,
		roles: Object.freeze(rolesOf(user.id)) as Role[]
	});
	return { user: frozen, stamp: passwordStamp(user.passwordHash) };
}

/** Replaces a person's roles; false (and nothing changed) when there is no such person. */
export function setRoles(userId: number, roles: readonly Role[]): boolean {
	return db().transaction((tx) => {
		const user = tx.select({ id: users.id }).from(users).where(eq(users.id, userId)).get();
		if (!user) return false;
		tx.delete(userRoles).where(eq(userRoles.userId, userId)).run();
		for (const role of new Set(roles)) tx.insert(userRoles).values({ userId, role }).run();
		return true;
	});
}

export function createUser(input: {
	email: string;
	name: string;
	passwordHash: string | null;
	roles: readonly Role[];
}) {
	return db().transaction((tx) => {
		const user = tx
			.insert(users)
			.values({
				email: normaliseEmail(input.email),
				name: input.name,
				passwordHash: input.passwordHash
			})
			.returning()
			.get();
		for (const role of new Set(input.roles))
			tx.insert(userRoles).values({ userId: user.id, role }).run();
		return user;
	});
}

/** Whether a person can sign in, has been invited and not yet joined, or has no way in. */
export type Access = 'active' | 'invited' | 'none';

export function listPeople(now = Date.now()) {
	const all = db().select().from(users).orderBy(users.name).all();
	const invited = new Set(
		db()
			.select({ email: invitations.email })
			.from(invitations)
			.where(and(isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date(now))))
			.all()
			.map((i) => i.email)
	);
	return all.map((u) => {
		const access: Access = u.passwordHash ? 'active' : invited.has(u.email) ? 'invited' : 'none';
		return {
			id: u.id,
			email: u.email,
			name: u.name,
			active: access === 'active',
			access,
			roles: rolesOf(u.id)
		};
	});
}

/**
 * Takes a person's way in away at once: their password, their roles and any invitation or
 * password-reset link not yet used. The next request their browser sends is signed out (the
 * session is checked against the database on every request). What they made (tracks, dances,
 * evenings) stays. An invitation gives access back. False when there is no such person.
 */
export function withdrawAccess(userId: number): boolean {
	return db().transaction((tx) => {
		const user = tx.select({ email: users.email }).from(users).where(eq(users.id, userId)).get();
		if (!user) return false;
		tx.update(users).set({ passwordHash: null }).where(eq(users.id, userId)).run();
		tx.delete(userRoles).where(eq(userRoles.userId, userId)).run();
		tx.delete(invitations)
			.where(and(eq(invitations.email, user.email), isNull(invitations.acceptedAt)))
			.run();
		tx.delete(passwordResets)
			.where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt)))
			.run();
		return true;
	});
}
