// One-time links (invitations, password resets): the token travels only in the e-mail; the
// database keeps its SHA-256, so a copy of the database opens no link.
import { createHash, randomBytes } from 'node:crypto';

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

/** 256 random bits, URL-safe. */
export function newToken() {
	const token = randomBytes(32).toString('base64url');
	return { token, hash: hashToken(token) };
}

/** Whether a string has the shape of a token we issue; anything else is refused before a query. */
export const looksLikeToken = (token: string) => /^[A-Za-z0-9_-]{20,100}$/.test(token);

/** A link that cannot be used (unknown, spent, expired); its message is for the person. */
export class LinkError extends Error {}
