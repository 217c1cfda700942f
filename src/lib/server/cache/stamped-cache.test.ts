import { describe, expect, test } from 'vitest';
import { StampedCache } from './stamped-cache';

const bytes = (n: number) => new Uint8Array(n);

describe('StampedCache', () => {
	test('keeps a value for its stamp and forgets everything when the stamp moves', () => {
		const c = new StampedCache<Uint8Array>(1000);
		let computed = 0;
		const make = () => (computed++, bytes(10));
		const a = c.through('k', 's1', make);
		expect(c.through('k', 's1', make)).toBe(a);
		expect(computed).toBe(1);
		expect(c.get('k', 's2')).toBeUndefined();
		expect(c.size).toBe(0);
		c.through('k', 's2', make);
		expect(computed).toBe(2);
		expect([c.hits, c.misses]).toEqual([1, 3]);
	});

	test('a value computed under an older stamp is never served under the newer one', () => {
		const c = new StampedCache<Uint8Array>(1000);
		c.get('k', 's2');
		// A slow computation that began before the write finishes after it.
		c.set('k', 's1', bytes(5));
		expect(c.get('k', 's2')).toBeUndefined();
	});

	test('stays within its byte budget, dropping the oldest first', () => {
		const c = new StampedCache<Uint8Array>(100);
		c.set('a', 's', bytes(40));
		c.set('b', 's', bytes(40));
		c.set('c', 's', bytes(40));
		expect(c.get('a', 's')).toBeUndefined();
		expect(c.get('b', 's')).toBeDefined();
		expect(c.get('c', 's')).toBeDefined();
		expect(c.bytes).toBe(80);
		c.set('c', 's', bytes(10));
		expect(c.bytes).toBe(50);
	});

	test('a value larger than the whole budget is returned but not kept', () => {
		const c = new StampedCache<Uint8Array>(100);
		expect(c.through('big', 's', () => bytes(101)).byteLength).toBe(101);
		expect(c.size).toBe(0);
	});
});
