// Tokens are made by Auth.js's own `encode` (@auth/core/jwt, the library that issues the real
// cookies), so the fast path is checked against the format Auth.js writes, not our idea of it.
import { encode } from '@auth/core/jwt';
import { afterEach, describe, expect, test, vi } from 'vitest';
import {
	decodeSession,
	dueForRefresh,
	forgetSessions,
	SESSION_REFRESH_S,
	sessionCookieName,
	sessionClaim
} from './session-token';

const secret = 'test-secret-0123456789abcdef0123456789';
const name = sessionCookieName(false);
const token = (payload: Record<string, unknown>, maxAge = 3600) =>
	encode({ token: payload, secret, salt: name, maxAge });

const cookies = (jar: Record<string, string>) => ({
	get: (n: string) => jar[n],
	getAll: () => Object.keys(jar).map((n) => ({ name: n }))
});

afterEach(() => {
	forgetSessions();
	vi.useRealTimers();
});

describe('decodeSession', () => {
	test('reads the person id from a token Auth.js issued', async () => {
		const s = await decodeSession(await token({ uid: 7 }), secret, name);
		expect(s?.uid).toBe(7);
		expect(s!.exp - s!.iat).toBe(3600);
	});

	test('refuses a token signed with another secret, cut short, or salted for another cookie', async () => {
		const good = await token({ uid: 7 });
		expect(await decodeSession(good, 'another-secret-0123456789abcdef01234', name)).toBeNull();
		expect(await decodeSession(good.slice(0, -5), secret, name)).toBeNull();
		expect(await decodeSession(good, secret, sessionCookieName(true))).toBeNull();
		expect(await decodeSession('not a token', secret, name)).toBeNull();
	});

	test('a remembered token stops counting once it expires', async () => {
		vi.useFakeTimers({ toFake: ['Date'] });
		vi.setSystemTime(new Date('2026-12-02T20:00:00Z'));
		const t = await token({ uid: 7 }, 60);
		expect((await decodeSession(t, secret, name))?.uid).toBe(7);
		vi.setSystemTime(new Date('2026-12-02T20:01:01Z'));
		expect(await decodeSession(t, secret, name)).toBeNull();
	});
});

describe('sessionClaim', () => {
	const opts = { secret, secure: false };

	test('no cookie: nobody, and Auth.js is not asked', async () => {
		const viaAuthJs = vi.fn();
		expect(await sessionClaim(cookies({}), opts, viaAuthJs)).toBeNull();
		expect(viaAuthJs).not.toHaveBeenCalled();
	});

	test('a fresh cookie is read without Auth.js re-issuing it', async () => {
		const viaAuthJs = vi.fn();
		const jar = cookies({ [name]: await token({ uid: 3, pw: 'stamp' }) });
		expect(await sessionClaim(jar, opts, viaAuthJs)).toEqual({ uid: 3, pw: 'stamp' });
		expect(await sessionClaim(jar, opts, viaAuthJs)).toEqual({ uid: 3, pw: 'stamp' });
		expect(viaAuthJs).not.toHaveBeenCalled();
	});

	test('a day-old cookie, a damaged one and a chunked one go through Auth.js', async () => {
		vi.useFakeTimers({ toFake: ['Date'] });
		vi.setSystemTime(new Date('2026-12-01T18:00:00Z'));
		const old = await token({ uid: 3 }, 14 * 86400);
		vi.setSystemTime(new Date(Date.parse('2026-12-01T18:00:00Z') + SESSION_REFRESH_S * 1000));
		const viaAuthJs = vi.fn(async () => ({ uid: 3, pw: 'stamp' }));
		const claim = { uid: 3, pw: 'stamp' };
		expect(await sessionClaim(cookies({ [name]: old }), opts, viaAuthJs)).toEqual(claim);
		expect(await sessionClaim(cookies({ [name]: 'garbage' }), opts, viaAuthJs)).toEqual(claim);
		expect(await sessionClaim(cookies({ [`${name}.0`]: 'part' }), opts, viaAuthJs)).toEqual(claim);
		expect(viaAuthJs).toHaveBeenCalledTimes(3);
	});

	test('a token from before password stamps names its person with no stamp', async () => {
		const jar = cookies({ [name]: await token({ uid: 3 }) });
		expect(await sessionClaim(jar, opts, vi.fn())).toEqual({ uid: 3, pw: null });
	});

	test('Auth.js finding no session means nobody', async () => {
		expect(await sessionClaim(cookies({ [name]: 'garbage' }), opts, async () => null)).toBeNull();
	});
});

test('dueForRefresh after SESSION_REFRESH_S', () => {
	const now = Date.now() / 1000;
	expect(dueForRefresh({ uid: 1, pw: null, iat: now - 60, exp: now + 1000 })).toBe(false);
	expect(dueForRefresh({ uid: 1, pw: null, iat: now - SESSION_REFRESH_S, exp: now + 1000 })).toBe(
		true
	);
});
