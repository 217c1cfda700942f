// Accept-Encoding as RFC 9110 §12.5.3 defines it (codings, q-values, "*"), and the gzip form read
// back with Node's own zlib (gunzip), the reference implementation of RFC 1952.
import { gunzipSync } from 'node:zlib';
import { describe, expect, test } from 'vitest';
import { acceptsGzip, CachedBody } from './cached-body';

describe('acceptsGzip', () => {
	test.each([
		['gzip, deflate, br', true],
		['br;q=1.0, gzip;q=0.8, *;q=0.1', true],
		['GZIP', true],
		['gzip;q=0', false],
		['gzip;q=0.000', false],
		['br, *', true],
		['br, *;q=0', false],
		['*;q=0.5, gzip;q=0', false],
		['identity', false],
		['', false],
		[null, false]
	])('%s → %s', (header, expected) => {
		expect(acceptsGzip(header)).toBe(expected);
	});
});

describe('CachedBody', () => {
	const text = JSON.stringify(Array.from({ length: 200 }, (_, i) => ({ id: i, title: 'Reel' })));
	const kept = new CachedBody(new TextEncoder().encode(text));
	const ask = (encoding?: string) =>
		new Request('http://127.0.0.1/x', encoding ? { headers: { 'accept-encoding': encoding } } : {});

	test('plain bytes for a client that does not accept gzip', async () => {
		const res = kept.respond(ask(), {
			headers: { 'content-type': 'application/json', etag: '"a1"' }
		});
		expect(res.headers.get('content-encoding')).toBeNull();
		expect(res.headers.get('vary')).toBe('accept-encoding');
		expect(res.headers.get('etag')).toBe('"a1"');
		expect(Number(res.headers.get('content-length'))).toBe(kept.bytes.byteLength);
		expect(await res.text()).toBe(text);
	});

	test('gzip that zlib reads back to the same bytes, with its own length and ETag', async () => {
		const res = kept.respond(ask('gzip, br'), { headers: { etag: '"a1"' } });
		expect(res.headers.get('content-encoding')).toBe('gzip');
		expect(res.headers.get('etag')).toBe('"a1-gzip"');
		const bytes = new Uint8Array(await res.arrayBuffer());
		expect(bytes.byteLength).toBe(Number(res.headers.get('content-length')));
		expect(bytes.byteLength).toBeLessThan(kept.bytes.byteLength / 4);
		expect(gunzipSync(bytes).toString('utf8')).toBe(text);
		expect(kept.gzip()).toBe(kept.gzip());
	});

	// RFC 9110 §13.1.2 / §15.4.5: a client holding the same form gets 304 and no body; each
	// form (plain, gzip) has its own tag, and a weak "W/" prefix compares equal.
	test('If-None-Match with the tag of the form sent gives 304, with the tag and no body', async () => {
		const cond = (tag: string, encoding = 'gzip') =>
			new Request('http://127.0.0.1/x', {
				headers: { 'accept-encoding': encoding, 'if-none-match': tag }
			});
		const hit = kept.respond(cond('"x", W/"a1-gzip"'), { headers: { etag: '"a1"' } });
		expect(hit.status).toBe(304);
		expect(hit.headers.get('etag')).toBe('"a1-gzip"');
		expect(await hit.text()).toBe('');
		// The plain tag does not stand for the gzip form, nor an old tag for the new bytes.
		expect(kept.respond(cond('"a1"'), { headers: { etag: '"a1"' } }).status).toBe(200);
		expect(kept.respond(cond('"a0-gzip"'), { headers: { etag: '"a1"' } }).status).toBe(200);
		expect(kept.respond(cond('*', 'identity'), { headers: { etag: '"a1"' } }).status).toBe(304);
		// Without a tag of its own the answer cannot be matched.
		expect(kept.respond(cond('*'), { headers: {} }).status).toBe(200);
	});

	test('a small body goes out as it is', async () => {
		const small = new CachedBody(new TextEncoder().encode('{"ok":true}'));
		const res = small.respond(ask('gzip'), { headers: {} });
		expect(res.headers.get('content-encoding')).toBeNull();
		expect(await res.text()).toBe('{"ok":true}');
	});
});
