import { createHmac, hkdfSync } from 'node:crypto';
import { describe, expect, test } from 'vitest';
import { checkPlay, playKey, playUrl, signPlay, type PlayLink } from './play-link';

const KEY = playKey('a test secret, not the app one');
const LINK: PlayLink = { eveningId: 7, trackId: 42, expires: 1_900_000_000 };
const BEFORE = LINK.expires - 60;

describe('signed play links', () => {
	test('a link we signed plays until it expires', () => {
		expect(checkPlay(LINK, signPlay(LINK, KEY), KEY, BEFORE)).toBe('ok');
		expect(checkPlay(LINK, signPlay(LINK, KEY), KEY, LINK.expires)).toBe('ok');
	});

	test('once expired it is refused as expired, not as forged', () => {
		expect(checkPlay(LINK, signPlay(LINK, KEY), KEY, LINK.expires + 1)).toBe('expired');
	});

	test('a tag for another evening, another track or a later expiry does not fit', () => {
		const sig = signPlay(LINK, KEY);
		expect(checkPlay({ ...LINK, eveningId: 8 }, sig, KEY, BEFORE)).toBe('forged');
		expect(checkPlay({ ...LINK, trackId: 43 }, sig, KEY, BEFORE)).toBe('forged');
		expect(checkPlay({ ...LINK, expires: LINK.expires + 86_400 }, sig, KEY, BEFORE)).toBe('forged');
		// The fields cannot slide into each other: evening 74, track 2 is another message.
		expect(checkPlay({ ...LINK, eveningId: 74, trackId: 2 }, sig, KEY, BEFORE)).toBe('forged');
	});

	test('a tampered, shortened, padded or empty tag is forged', () => {
		const sig = signPlay(LINK, KEY);
		const flipped = (sig[0] === 'A' ? 'B' : 'A') + sig.slice(1);
		for (const bad of [flipped, sig.slice(0, -1), `${sig}=`, `${sig}AA`, '', '....']) {
			expect(checkPlay(LINK, bad, KEY, BEFORE), bad).toBe('forged');
		}
	});

	test('a key from another secret does not sign for ours', () => {
		const other = playKey('another secret');
		expect(checkPlay(LINK, signPlay(LINK, other), KEY, BEFORE)).toBe('forged');
	});

	test('the tag is HMAC-SHA256 under an HKDF key, recomputed here with node:crypto directly', () => {
		// RFC 2104 (HMAC) and RFC 5869 (HKDF) with SHA-256, the label as HKDF's info.
		const key = Buffer.from(
			hkdfSync('sha256', 'a test secret, not the app one', '', 'floorset play link v1', 32)
		);
		const expected = createHmac('sha256', key)
			.update('floorset play link v1\n7\n42\n1900000000')
			.digest('base64url');
		expect(signPlay(LINK, KEY)).toBe(expected);
		// 32 bytes of SHA-256 are 43 base64url characters (RFC 4648 §5, no padding).
		expect(expected).toMatch(/^[A-Za-z0-9_-]{43}$/);
	});

	test('the URL carries the evening, the track, the expiry and the tag', () => {
		const url = new URL(playUrl('https://floorset.example/', LINK, KEY));
		expect(url.pathname).toBe('/api/public/play/7/42');
		expect(url.searchParams.get('expires')).toBe('1900000000');
		expect(checkPlay(LINK, url.searchParams.get('sig')!, KEY, BEFORE)).toBe('ok');
	});
});
