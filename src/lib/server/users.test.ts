// Roles are read from the database, never from the cookie, and a change takes effect on the very
// next request even though the signed-in person is kept between requests.
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { users } from './db/schema';
import { makeTestDb } from './testing/test-db';
import { createUser, sessionUser, setRoles } from './users';

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
