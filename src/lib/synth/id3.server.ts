// Node only (node-id3 needs Buffer): for the server-side demo seed. The .server.ts name makes
// SvelteKit refuse to bundle it for the browser.
// TBPM is "the number of beats per minute in the main part of the audio … an integer and
// represented as a numerical string" (id3.org, ID3 tag version 2.4.0 – Native Frames, 4.2.3;
// ID3v2.3 defines it the same way, and node-id3 0.2.9 writes a v2.3 tag).
import NodeID3 from 'node-id3';

export interface Id3Fields {
	title?: string;
	artist?: string;
	album?: string;
	/** Rounded to an integer, as TBPM requires. */
	bpm?: number;
}

export function writeId3(mp3: Uint8Array, fields: Id3Fields): Uint8Array {
	const tags: NodeID3.Tags = {};
	if (fields.title) tags.title = fields.title;
	if (fields.artist) tags.artist = fields.artist;
	if (fields.album) tags.album = fields.album;
	if (fields.bpm !== undefined) tags.bpm = String(Math.round(fields.bpm));
	const out = NodeID3.write(tags, Buffer.from(mp3.buffer, mp3.byteOffset, mp3.byteLength));
	return new Uint8Array(out.buffer, out.byteOffset, out.byteLength);
}
