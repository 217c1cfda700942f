// Signed play links: an exported playlist must play on the laptop that drives the speakers,
// where nobody is signed in. Each link names one track of one evening and when it stops
// working, with an HMAC-SHA256 tag over exactly those three (RFC 2104), so it cannot be bent to
// another track, another evening or a later time. The key is derived from AUTH_SECRET with HKDF
// (RFC 5869) under a label of its own, so a play link's tag is never a valid session signature
// and the other way round.
import { createHmac, hkdfSync, timingSafeEqual } from 'node:crypto';
import { authSecret, config } from '../config';

export interface PlayLink {
	eveningId: number;
	trackId: number;
	/** Unix time in whole seconds after which the link is refused. */
	expires: number;
}

export type PlayCheck = 'ok' | 'forged' | 'expired';

const LABEL = 'floorset play link v1';
/** A SHA-256 tag is 32 bytes: 43 characters of base64url without padding. */
const TAG_BYTES = 32;

export const playKey = (secret: string) =>
	Buffer.from(hkdfSync('sha256', secret, '', LABEL, TAG_BYTES));

function tag(link: PlayLink, key: Buffer): Buffer {
	// Fixed order and separators, integers only: no two links share a message.
	const message = `${LABEL}\n${link.eveningId}\n${link.trackId}\n${link.expires}`;
	return createHmac('sha256', key).update(message).digest();
}

export const signPlay = (link: PlayLink, key: Buffer) => tag(link, key).toString('base64url');

/**
 * Whether `signature` is ours for this link, and then whether it still runs at `nowS`. The tag
 * is compared in constant time (timingSafeEqual) so its bytes cannot be guessed one by one.
 */
export function checkPlay(link: PlayLink, signature: string, key: Buffer, nowS: number): PlayCheck {
	const given = Buffer.from(signature, 'base64url');
	// Buffer.from drops characters outside the alphabet; re-encoding catches a padded or bent tag.
	if (given.length !== TAG_BYTES || given.toString('base64url') !== signature) return 'forged';
	if (!timingSafeEqual(given, tag(link, key))) return 'forged';
	return nowS > link.expires ? 'expired' : 'ok';
}

let key: Buffer | undefined;
let keyOf: string | undefined;
/** The app's play-link key, derived once per secret. */
export function appPlayKey(): Buffer {
	const secret = authSecret();
	if (!key || keyOf !== secret) {
		key = playKey(secret);
		keyOf = secret;
	}
	return key;
}

/** When a link made now stops working (PLAY_LINK_HOURS, 24 by default). */
export const playExpiry = (nowMs = Date.now()) =>
	Math.floor(nowMs / 1000) + Math.round(config().PLAY_LINK_HOURS * 3600);

export const playPath = (link: PlayLink) => `/api/public/play/${link.eveningId}/${link.trackId}`;

/** The absolute URL a player fetches, signed with `key`. */
export function playUrl(origin: string, link: PlayLink, key: Buffer): string {
	const query = new URLSearchParams({ expires: String(link.expires), sig: signPlay(link, key) });
	return `${origin.replace(/\/$/, '')}${playPath(link)}?${query}`;
}
