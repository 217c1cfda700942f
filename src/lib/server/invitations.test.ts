import { afterEach, beforeEach, expect, test } from 'vitest';
import { outbox } from './db/schema';
import {
	acceptInvitation,
	findOpenInvitation,
	INVITATION_DAYS,
	invite,
	InvitationError
} from './invitations';
import { startCatcher } from './mail/catcher';
import { verifyPassword } from './passwords';
import { createUser, findUserByEmail, rolesOf } from './users';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
beforeEach(async () => {
	t = makeTestDb();
	await startCatcher();
});
afterEach(() => t.cleanup());

const tokenOf = (link: string) => link.split('/invite/')[1];

test('an invitation is mailed through SMTP, captured, and its link sets a password once', async () => {
	const admin = createUser({
		email: 'a@floorset.test',
		name: 'A',
		passwordHash: 'x',
		roles: ['admin']
	});
	const { link } = await invite({
		email: 'New.Person@Floorset.test',
		name: 'New Person',
		roles: ['dj', 'instructor'],
		invitedBy: admin.id
	});
	const mail = t.db.select().from(outbox).all();
	expect(mail).toHaveLength(1);
	expect(mail[0].to).toContain('new.person@floorset.test');
	expect(mail[0].text).toContain(link);

	const id = await acceptInvitation(tokenOf(link), 'a long password');
	const user = findUserByEmail('new.person@floorset.test')!;
	expect(user.id).toBe(id);
	expect(await verifyPassword(user.passwordHash!, 'a long password')).toBe(true);
	expect(rolesOf(id)).toEqual(['dj', 'instructor']);
	await expect(acceptInvitation(tokenOf(link), 'another password')).rejects.toThrow(
		InvitationError
	);
});

test('an expired invitation is not found', async () => {
	const admin = createUser({
		email: 'a@floorset.test',
		name: 'A',
		passwordHash: 'x',
		roles: ['admin']
	});
	const now = Date.now();
	const { link } = await invite({
		email: 'b@floorset.test',
		name: 'B',
		roles: ['dancer'],
		invitedBy: admin.id,
		now
	});
	expect(findOpenInvitation(tokenOf(link), now + 1000)).not.toBeNull();
	expect(findOpenInvitation(tokenOf(link), now + INVITATION_DAYS * 86_400_000 + 1)).toBeNull();
});

test('nobody can be invited twice once they have an account', async () => {
	const admin = createUser({
		email: 'a@floorset.test',
		name: 'A',
		passwordHash: 'x',
		roles: ['admin']
	});
	await expect(
		invite({ email: 'A@floorset.test', name: 'A again', roles: ['dj'], invitedBy: admin.id })
	).rejects.toThrow('already has an account');
});

test('a malformed token is refused without a query', () => {
	expect(findOpenInvitation('../../etc/passwd')).toBeNull();
});
