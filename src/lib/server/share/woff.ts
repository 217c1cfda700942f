// WOFF 1.0 to a plain TrueType/OpenType file (W3C WOFF File Format 1.0, 2012, §4–§5): inflate each
// table and lay them out again behind an sfnt table directory. pdfkit embeds a WOFF directly, but
// through fontkit it inflates the tables again for every PDF; unpacked once, a PDF is ~4× faster.
import { inflateSync } from 'node:zlib';

const WOFF_SIGNATURE = 0x774f4646; // 'wOFF'
const WOFF_HEADER = 44;
const WOFF_ENTRY = 20;
const SFNT_ENTRY = 16;

export function woffToSfnt(woff: Uint8Array): Buffer {
	const w = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength);
	if (w.readUInt32BE(0) !== WOFF_SIGNATURE) throw new Error('Not a WOFF 1.0 font.');
	const flavor = w.readUInt32BE(4);
	const count = w.readUInt16BE(12);
	const tables = Array.from({ length: count }, (_, i) => {
		const at = WOFF_HEADER + i * WOFF_ENTRY;
		const offset = w.readUInt32BE(at + 4);
		const compLength = w.readUInt32BE(at + 8);
		const origLength = w.readUInt32BE(at + 12);
		const stored = w.subarray(offset, offset + compLength);
		// §5: a table is stored uncompressed when compressing did not make it smaller.
		const data = compLength < origLength ? inflateSync(stored) : stored;
		if (data.length !== origLength) throw new Error('A WOFF table has the wrong length.');
		return { tag: w.readUInt32BE(at), checksum: w.readUInt32BE(at + 16), data };
	});
	// The sfnt header's binary-search fields (OpenType spec, table directory).
	let power = 1;
	let log2 = 0;
	while (power * 2 <= count) {
		power *= 2;
		log2++;
	}
	const head = Buffer.alloc(12 + SFNT_ENTRY * count);
	head.writeUInt32BE(flavor, 0);
	head.writeUInt16BE(count, 4);
	head.writeUInt16BE(power * 16, 6);
	head.writeUInt16BE(log2, 8);
	head.writeUInt16BE(count * 16 - power * 16, 10);
	const parts: Buffer[] = [head];
	let offset = head.length;
	tables.forEach((t, i) => {
		const at = 12 + SFNT_ENTRY * i;
		head.writeUInt32BE(t.tag, at);
		head.writeUInt32BE(t.checksum, at + 4);
		head.writeUInt32BE(offset, at + 8);
		head.writeUInt32BE(t.data.length, at + 12);
		// Tables start on 4-byte boundaries.
		const pad = (4 - (t.data.length % 4)) % 4;
		parts.push(t.data, Buffer.alloc(pad));
		offset += t.data.length + pad;
	});
	return Buffer.concat(parts);
}
