// Reading who is signed in is the one cost every request pays. Auth.js's own session call
// decrypts the cookie and then encrypts and sets a fresh one on every request (about 2 ms of CPU,
// most of a cheap API call). Here the cookie is decrypted once and remembered by its exact text,
// and Auth.js is asked to re-issue it only when it is due (a day old), the same throttle Auth.js
// applies to database sessions (`session.updateAge`). Roles are still read fresh on every request,
// and the token's password stamp is checked against the person's current password.
import { decode } from '@auth/core/jwt';

/** Auth.js's session cookie; its name is also the key-derivation salt of the token. */
export const sessionCookieName = (secure: boolean) =>
	`${secure ? '__Secure-' : ''}authjs.session-token`;

/** Re-issue (and so extend) a session cookie at most this often. */
export const SESSION_REFRESH_S = 24 * 60 * 60;

/** Tokens remembered at once; a visitor who sends new garbage each time only costs a decode. */
const MAX_REMEMBERED = 5000;

export interface DecodedSession {
	uid: number | null;
	/** The password stamp at sign-in (`passwordStamp`); null in a token from before stamps. */
	pw: string | null;
	/** Issued and expires, in seconds since the epoch. */
	iat: number;
	exp: number;
}

const remembered = new Map<string, DecodedSession>();

const nowS = () => Date.now() / 1000;

/** The session a token holds, or null when it is forged, damaged or expired. */
export async function decodeSession(
	token: string,
	secret: string,
	salt: string
): Promise<DecodedSession | null> {
	const known = remembered.get(token);
	if (known) return known.exp > nowS() ? known : forget(token);
	let payload: Record<string, unknown> | null;
	try {
		payload = await decode({ token, secret, salt });
	} catch {
		return null;
	}
	if (!payload || typeof payload.exp !== 'number' || typeof payload.iat !== 'number') return null;
	const session: DecodedSession = {
		uid: typeof payload.uid === 'number' ? payload.uid : null,
		pw: typeof payload.pw === 'string' ? payload.pw : null,
		iat: payload.iat,
		exp: payload.exp
	};
	if (remembered.size >= MAX_REMEMBERED) remembered.delete(remembered.keys().next().value!);
	remembered.set(token, session);
	return session;
}

function forget(token: string): null {
	remembered.delete(token);
	return null;
}

/** Whether the token should go back through Auth.js to be re-issued with a later expiry. */
export const dueForRefresh = (s: DecodedSession) => nowS() - s.iat >= SESSION_REFRESH_S;

type Cookies = { get(name: string): string | undefined; getAll(): { name: string }[] };

/** Who a session says is signed in: their id and the password stamp it was issued under. */
export interface SessionClaim {
	uid: number;
	pw: string | null;
}

const claimOf = (s: { uid?: unknown; pw?: unknown } | null): SessionClaim | null =>
	typeof s?.uid === 'number' ? { uid: s.uid, pw: typeof s.pw === 'string' ? s.pw : null } : null;

/**
 * Who the request's cookies say is signed in. `viaAuthJs` is Auth.js's own session call
 * (`event.locals.auth`): used when the cookie is due for re-issue, is split into chunks, or does
 * not decode, so Auth.js re-issues or clears it as it always has.
 */
export async function sessionClaim(
	cookies: Cookies,
	opts: { secret: string; secure: boolean },
	viaAuthJs: () => Promise<unknown>
): Promise<SessionClaim | null> {
	const name = sessionCookieName(opts.secure);
	const token = cookies.get(name);
	if (token) {
		const s = await decodeSession(token, opts.secret, name);
		if (s && !dueForRefresh(s)) return claimOf(s);
	} else if (!cookies.getAll().some((c) => c.name.startsWith(`${name}.`))) {
		return null;
	}
	return claimOf((await viaAuthJs()) as { uid?: unknown; pw?: unknown } | null);
}

/** For tests. */
export function forgetSessions() {
	remembered.clear();
}
