import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { inflateSync } from 'node:zlib';
import { describe, expect, test } from 'vitest';
import { woffToSfnt } from './woff';

const require = createRequire(import.meta.url);
const woff = readFileSync(
	require.resolve('@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-400-normal.woff')
);

// Checked against the layouts of the W3C WOFF 1.0 spec (§4 header, §5 table directory) and the
// OpenType table directory (sfnt version, numTables, searchRange = 16 × 2^floor(log2 n)).
describe('WOFF to sfnt', () => {
	const sfnt = woffToSfnt(woff);
	const count = woff.readUInt16BE(12);

	test('keeps the flavour and the number of tables, with the binary-search fields', () => {
		expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4));
		expect(sfnt.readUInt16BE(4)).toBe(count);
		const log2 = Math.floor(Math.log2(count));
		expect(sfnt.readUInt16BE(6)).toBe(16 * 2 ** log2);
		expect(sfnt.readUInt16BE(8)).toBe(log2);
		expect(sfnt.readUInt16BE(10)).toBe(count * 16 - 16 * 2 ** log2);
	});

	test('every table is there, unpacked, 4-byte aligned, with its checksum; total size as the WOFF says', () => {
		for (let i = 0; i < count; i++) {
			const w = 44 + i * 20;
			const s = 12 + i * 16;
			expect(sfnt.readUInt32BE(s)).toBe(woff.readUInt32BE(w));
			expect(sfnt.readUInt32BE(s + 4)).toBe(woff.readUInt32BE(w + 16));
			const offset = sfnt.readUInt32BE(s + 8);
			const length = sfnt.readUInt32BE(s + 12);
			expect(offset % 4).toBe(0);
			expect(length).toBe(woff.readUInt32BE(w + 12));
			const stored = woff.subarray(
				woff.readUInt32BE(w + 4),
				woff.readUInt32BE(w + 4) + woff.readUInt32BE(w + 8)
			);
			const expected = stored.length < length ? inflateSync(stored) : stored;
			expect(sfnt.subarray(offset, offset + length).equals(expected)).toBe(true);
		}
		// WOFF header field totalSfntSize: the size of the uncompressed font (§4).
		expect(sfnt.length).toBe(woff.readUInt32BE(16));
	});

	test('refuses what is not a WOFF', () => {
		expect(() => woffToSfnt(Buffer.from('not a font at all, really not'))).toThrow(/WOFF/);
	});
});
