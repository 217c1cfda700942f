// Roles are read from the database, never from the cookie, and a change takes effect on the very
// next request even though the signed-in person is kept between requests.
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { users } from './db/schema';
import { makeTestDb } from './testing/test-db';
import { createUser, passwordStamp, sessionUser as sessionUserStamped, setRoles } from './users';

// Sessions issued under the password 'x'.
const sessionUser = (id: number) => sessionUserStamped(id, passwordStamp('x'));

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

test('a change of roles, of name or of access shows on the next read', () => {
	const { id } = createUser({
		email: 'Wren@Example.test',
		name: 'Wren Alder',
		passwordHash: 'x',
		roles: ['dancer']
	});
	expect(sessionUser(id)).toMatchObject({ email: 'wren@example.test', roles: ['dancer'] });
	expect(sessionUser(id)).toBe(sessionUser(id));
	setRoles(id, ['dj', 'instructor']);
	expect(sessionUser(id)?.roles).toEqual(['dj', 'instructor']);
	t.db.update(users).set({ name: 'Wren Marsh' }).where(eq(users.id, id)).run();
	expect(sessionUser(id)?.name).toBe('Wren Marsh');
	t.db.update(users).set({ passwordHash: null }).where(eq(users.id, id)).run();
	expect(sessionUser(id)).toBeNull();
	expect(sessionUser(id + 1)).toBeNull();
});

test('the kept person cannot be changed by one request for the others', () => {
	const { id } = createUser({
		email: 'a@example.test',
		name: 'A',
		passwordHash: 'x',
		roles: ['dj']
	});
	const user = sessionUser(id)!;
	expect(() => user.roles.push('admin')).toThrow(TypeError);
	expect(sessionUser(id)?.roles).toEqual(['dj']);
});

test('a session counts only under the password it was issued with', () => {
	const { id } = createUser({
		email: 'b@example.test',
		name: 'B',
		passwordHash: 'x',
		roles: ['dj']
	});
	expect(sessionUserStamped(id, passwordStamp('x'))?.id).toBe(id);
	// A token from before stamps, or from an earlier password.
	expect(sessionUserStamped(id, null)).toBeNull();
	expect(sessionUserStamped(id, passwordStamp('y'))).toBeNull();
	t.db.update(users).set({ passwordHash: 'y' }).where(eq(users.id, id)).run();
	expect(sessionUserStamped(id, passwordStamp('x'))).toBeNull();
	expect(sessionUserStamped(id, passwordStamp('y'))?.id).toBe(id);
	// The stamp gives nothing of the hash away in length or alphabet worth keeping.
	expect(passwordStamp('x')).toMatch(/^[A-Za-z0-9_-]{22}$/);
});

test('roles for a person who does not exist: false, and no row written', () => {
	// Issue 13, finding 8: this used to throw a foreign-key error (a 500 with a stack trace).
	expect(setRoles(424_242, ['dj'])).toBe(false);
	expect(sessionUser(424_242)).toBeNull();
});
