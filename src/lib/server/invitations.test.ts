import { afterEach, beforeEach, expect, test } from 'vitest';
import { outbox } from './db/schema';
import {
	acceptInvitation,
	cancelInvitation,
	findOpenInvitation,
	INVITATION_DAYS,
	invite,
	InvitationError,
	pendingInvitations,
	resendInvitation
} from './invitations';
import { startCatcher } from './mail/catcher';
import { verifyPassword } from './passwords';
import {
	createUser,
	findUserByEmail,
	listPeople,
	passwordStamp,
	rolesOf,
	sessionUser,
	withdrawAccess
} from './users';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
beforeEach(async () => {
	t = makeTestDb();
	await startCatcher();
});
afterEach(() => t.cleanup());

const tokenOf = (link: string) => link.split('/invite/')[1];
const makeAdmin = () =>
	createUser({ email: 'a@floorset.test', name: 'A', passwordHash: 'x', roles: ['admin'] });

test('an invitation is mailed through SMTP, captured, and its link sets a password once', async () => {
	const admin = makeAdmin();
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
	const admin = makeAdmin();
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
	const admin = makeAdmin();
	await expect(
		invite({ email: 'A@floorset.test', name: 'A again', roles: ['dj'], invitedBy: admin.id })
	).rejects.toThrow('already has an account');
});

test('a malformed token is refused without a query', () => {
	expect(findOpenInvitation('../../etc/passwd')).toBeNull();
});

test('withdrawn access ends the session at once, voids an unused link, and a new invitation gives it back with its own roles', async () => {
	const admin = makeAdmin();
	const dj = createUser({ email: 'dj@floorset.test', name: 'D', passwordHash: 'x', roles: ['dj'] });
	const spare = await invite({
		email: 'dj@floorset.test',
		name: 'D',
		roles: ['dj'],
		invitedBy: admin.id
	}).catch((e: unknown) => e);
	expect(spare).toBeInstanceOf(InvitationError); // an active account cannot be invited
	const before = passwordStamp('x');
	expect(sessionUser(dj.id, before)?.roles).toEqual(['dj']);

	const pending = await invite({
		email: 'p@floorset.test',
		name: 'P',
		roles: ['dj'],
		invitedBy: admin.id
	});
	const invitee = createUser({
		email: 'p@floorset.test',
		name: 'P',
		passwordHash: null,
		roles: []
	});
	expect(listPeople().find((p) => p.id === invitee.id)?.access).toBe('invited');

	expect(withdrawAccess(dj.id)).toBe(true);
	expect(withdrawAccess(invitee.id)).toBe(true);
	expect(withdrawAccess(9999)).toBe(false);
	expect(sessionUser(dj.id, before)).toBeNull();
	expect(rolesOf(dj.id)).toEqual([]);
	expect(findUserByEmail('dj@floorset.test')?.passwordHash).toBeNull();
	// The link mailed before the withdrawal no longer lets anyone in.
	expect(findOpenInvitation(tokenOf(pending.link))).toBeNull();
	expect(listPeople().map((p) => [p.email, p.access])).toEqual([
		['a@floorset.test', 'active'],
		['dj@floorset.test', 'none'],
		['p@floorset.test', 'none']
	]);

	const back = await invite({
		email: 'dj@floorset.test',
		name: 'D',
		roles: ['instructor'],
		invitedBy: admin.id
	});
	expect(listPeople().find((p) => p.id === dj.id)?.access).toBe('invited');
	expect(await acceptInvitation(tokenOf(back.link), 'a long password')).toBe(dj.id);
	const after = passwordStamp(findUserByEmail('dj@floorset.test')!.passwordHash!);
	expect(sessionUser(dj.id, after)?.roles).toEqual(['instructor']);
	// A session from before the withdrawal stays worthless once access is given back.
	expect(sessionUser(dj.id, before)).toBeNull();
});

test('pending invitations are listed; resent, the old link dies and the new one works; cancelled, none does', async () => {
	const admin = makeAdmin();
	const { link: first } = await invite({
		email: 'wren@floorset.test',
		name: 'Wren Ashby',
		roles: ['dancer'],
		invitedBy: admin.id
	});
	const [pending] = pendingInvitations();
	expect(pending).toMatchObject({
		email: 'wren@floorset.test',
		name: 'Wren Ashby',
		expired: false
	});
	expect(await resendInvitation(pending.id)).toBe(true);
	const mail = t.db.select().from(outbox).all();
	expect(mail).toHaveLength(2);
	const second = /https?:\/\/\S+\/invite\/\S+/.exec(mail[1].text)![0];
	expect(second).not.toBe(first);
	expect(findOpenInvitation(tokenOf(first))).toBeNull();
	expect(findOpenInvitation(tokenOf(second))).not.toBeNull();

	expect(cancelInvitation(pending.id)).toBe(true);
	expect(findOpenInvitation(tokenOf(second))).toBeNull();
	expect(pendingInvitations()).toEqual([]);
	expect(cancelInvitation(pending.id)).toBe(false);
	expect(await resendInvitation(pending.id)).toBe(false);
});
