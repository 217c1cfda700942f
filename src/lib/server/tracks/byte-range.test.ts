// Range requests as RFC 9110 §14.1.2 defines byte ranges (its worked examples use a 10000-byte
// representation: "bytes=0-499", "bytes=-500", "bytes=9500-").
import { describe, expect, test } from 'vitest';
import { parseRange } from './byte-range';

describe('parseRange', () => {
	test('RFC 9110 §14.1.2 examples', () => {
		expect(parseRange('bytes=0-499', 10000)).toEqual({ kind: 'part', start: 0, end: 499 });
		expect(parseRange('bytes=500-999', 10000)).toEqual({ kind: 'part', start: 500, end: 999 });
		expect(parseRange('bytes=-500', 10000)).toEqual({ kind: 'part', start: 9500, end: 9999 });
		expect(parseRange('bytes=9500-', 10000)).toEqual({ kind: 'part', start: 9500, end: 9999 });
	});

	test('a last byte past the end is cut to the end; a long suffix is the whole file', () => {
		expect(parseRange('bytes=9000-20000', 10000)).toEqual({ kind: 'part', start: 9000, end: 9999 });
		expect(parseRange('bytes=-20000', 10000)).toEqual({ kind: 'part', start: 0, end: 9999 });
	});

	test('no header or another unit: the whole file', () => {
		expect(parseRange(null, 10)).toEqual({ kind: 'whole' });
		expect(parseRange('items=0-1', 10)).toEqual({ kind: 'whole' });
	});

	test('unsatisfiable and malformed ranges (→ 416)', () => {
		for (const h of [
			'bytes=10000-',
			'bytes=500-400',
			'bytes=-0',
			'bytes=-',
			'bytes=abc',
			'bytes=1-2-3'
		]) {
			expect(parseRange(h, 10000), h).toEqual({ kind: 'unsatisfiable' });
		}
	});

	test('of several ranges the first is served', () => {
		expect(parseRange('bytes=0-9, 20-29', 100)).toEqual({ kind: 'part', start: 0, end: 9 });
	});
});
