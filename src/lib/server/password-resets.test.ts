import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, expect, test } from 'vitest';
import { passwordResets } from './db/schema';
import { startCatcher } from './mail/catcher';
import {
	completeReset,
	findOpenReset,
	requestReset,
	RESET_MINUTES,
	ResetError,
	RESETS_PER_HOUR
} from './password-resets';
import { verifyPassword } from './passwords';
import { isLimited, MAX_PER_PAIR, recordFailure } from './sign-in-limit';
import { createUser, findUserByEmail, passwordStamp, sessionUser, withdrawAccess } from './users';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
beforeEach(async () => {
	t = makeTestDb();
	await startCatcher();
});
afterEach(() => t.cleanup());

const tokenOf = (link: string) => link.split('/reset/')[1];
const member = () =>
	createUser({ email: 'rue@floorset.test', name: 'Rue', passwordHash: 'old', roles: ['dj'] });

test('a reset link sets a new password once, ends older sessions and clears failed sign-ins', async () => {
	const { id } = member();
	for (let i = 0; i < MAX_PER_PAIR; i++) recordFailure('rue@floorset.test', '10.0.0.1');
	expect(isLimited('rue@floorset.test', '10.0.0.1')).toBe(true);

	const asked = requestReset('Rue@Floorset.test')!;
	expect(asked.link).toMatch(/\/reset\/[A-Za-z0-9_-]{43}$/);
	expect(findOpenReset(tokenOf(asked.link))).toMatchObject({ userId: id, name: 'Rue' });
	// The token itself is never stored, only its hash.
	const row = t.db.select().from(passwordResets).get()!;
	expect(row.tokenHash).not.toContain(tokenOf(asked.link));

	expect(await completeReset(tokenOf(asked.link), 'a brand new password')).toBe(id);
	const user = findUserByEmail('rue@floorset.test')!;
	expect(await verifyPassword(user.passwordHash!, 'a brand new password')).toBe(true);
	expect(sessionUser(id, passwordStamp('old'))).toBeNull();
	expect(sessionUser(id, passwordStamp(user.passwordHash!))?.roles).toEqual(['dj']);
	expect(isLimited('rue@floorset.test', '10.0.0.1')).toBe(false);

	await expect(completeReset(tokenOf(asked.link), 'yet another password')).rejects.toThrow(
		ResetError
	);
	expect(findOpenReset(tokenOf(asked.link))).toBeNull();
});

test('nobody unknown, withdrawn or not yet joined gets a link, and nothing is stored for them', () => {
	const { id } = member();
	createUser({ email: 'new@floorset.test', name: 'New', passwordHash: null, roles: ['dancer'] });
	expect(requestReset('nobody@floorset.test')).toBeNull();
	expect(requestReset('new@floorset.test')).toBeNull();
	withdrawAccess(id);
	expect(requestReset('rue@floorset.test')).toBeNull();
	expect(t.db.select().from(passwordResets).all()).toHaveLength(0);
});

test('a link sent before access was withdrawn gives nothing back', async () => {
	const { id } = member();
	const asked = requestReset('rue@floorset.test')!;
	withdrawAccess(id);
	expect(findOpenReset(tokenOf(asked.link))).toBeNull();
	await expect(completeReset(tokenOf(asked.link), 'a brand new password')).rejects.toThrow(
		ResetError
	);
	expect(findUserByEmail('rue@floorset.test')!.passwordHash).toBeNull();
});

test(`links expire after ${RESET_MINUTES} minutes, and at most ${RESETS_PER_HOUR} are mailed an hour`, () => {
	member();
	const now = Date.parse('2026-12-02T19:00:00Z');
	const links = Array.from({ length: RESETS_PER_HOUR + 1 }, (_, i) =>
		requestReset('rue@floorset.test', now + i * 60_000)
	);
	expect(links.filter(Boolean)).toHaveLength(RESETS_PER_HOUR);
	expect(links.at(-1)).toBeNull();
	const token = tokenOf(links[0]!.link);
	expect(findOpenReset(token, now + (RESET_MINUTES * 60_000 - 1))).not.toBeNull();
	expect(findOpenReset(token, now + RESET_MINUTES * 60_000 + 1)).toBeNull();
	// An hour on, asking works again.
	expect(requestReset('rue@floorset.test', now + 3_600_000 + 1)).not.toBeNull();
});

test('using one link spends the others of the same person', async () => {
	const { id } = member();
	const first = requestReset('rue@floorset.test')!;
	const second = requestReset('rue@floorset.test')!;
	await completeReset(tokenOf(second.link), 'a brand new password');
	expect(findOpenReset(tokenOf(first.link))).toBeNull();
	const rows = t.db.select().from(passwordResets).where(eq(passwordResets.userId, id)).all();
	expect(rows.map((r) => r.usedAt !== null)).toEqual([true, true]);
});

test('a malformed token is refused without a query', () => {
	expect(findOpenReset('../../etc/passwd')).toBeNull();
	expect(findOpenReset('')).toBeNull();
});
