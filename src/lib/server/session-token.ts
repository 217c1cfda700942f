// Reading who is signed in is the one cost every request pays. Auth.js's own session call
// decrypts the cookie and then encrypts and sets a fresh one on every request (about 2 ms of CPU,
// most of a cheap API call). Here the cookie is decrypted once and remembered by its exact text,
// and Auth.js is asked to re-issue it only when it is due (a day old), the same throttle Auth.js
// applies to database sessions (`session.updateAge`). Roles are still read fresh on every request.
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

/**
 * The signed-in person's id from the request's cookies. `viaAuthJs` is Auth.js's own session call
 * (`event.locals.auth`): used when the cookie is due for re-issue, is split into chunks, or does
 * not decode, so Auth.js re-issues or clears it as it always has.
 */
export async function sessionUid(
	cookies: Cookies,
	opts: { secret: string; secure: boolean },
	viaAuthJs: () => Promise<unknown>
): Promise<number | null> {
	const name = sessionCookieName(opts.secure);
	const token = cookies.get(name);
	if (token) {
		const s = await decodeSession(token, opts.secret, name);
		if (s && !dueForRefresh(s)) return s.uid;
	} else if (!cookies.getAll().some((c) => c.name.startsWith(`${name}.`))) {
		return null;
	}
	const s = (await viaAuthJs()) as { uid?: unknown } | null;
	return typeof s?.uid === 'number' ? s.uid : null;
}

/** For tests. */
export function forgetSessions() {
	remembered.clear();
}
