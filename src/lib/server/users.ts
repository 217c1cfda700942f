// People and their roles.
import { eq, sql } from 'drizzle-orm';
import { ROLES, type Role } from '../domain';
import { db } from './db';
import { userRoles, users } from './db/schema';

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

export function rolesOf(userId: number): Role[] {
	const rows = db().select().from(userRoles).where(eq(userRoles.userId, userId)).all();
	return ROLES.filter((r) => rows.some((row) => row.role === r));
}

export function sessionUser(userId: number): SessionUser | null {
	const user = db().select().from(users).where(eq(users.id, userId)).get();
	if (!user || !user.passwordHash) return null;
	return { id: user.id, email: user.email, name: user.name, roles: rolesOf(user.id) };
}

export function setRoles(userId: number, roles: readonly Role[]) {
	db().transaction((tx) => {
		tx.delete(userRoles).where(eq(userRoles.userId, userId)).run();
		for (const role of new Set(roles)) tx.insert(userRoles).values({ userId, role }).run();
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

export function listPeople() {
	const all = db().select().from(users).orderBy(users.name).all();
	return all.map((u) => ({
		id: u.id,
		email: u.email,
		name: u.name,
		active: u.passwordHash !== null,
		roles: rolesOf(u.id)
	}));
}
