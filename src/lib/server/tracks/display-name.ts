// An uploader's file name is only ever display text: never a path, never a storage key.
// Control characters and bidirectional overrides (which can make "mp3.exe" read as "exe.mp3")
// are dropped, only the last path segment is kept, and the length is capped.

const MAX = 200;
// C0 and C1 controls, and Unicode's bidi marks, embeddings, overrides and isolates
// (U+200E/F, U+202A–E, U+2066–9) as listed in Unicode's bidirectional algorithm (UAX #9).
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069\ufeff]/g;

/** Tag text (title, artist, album) without controls or bidi overrides, capped. */
export const cleanText = (raw: string | undefined, max = 300): string =>
	[...(raw ?? '').normalize('NFC').replace(UNSAFE, '').trim()].slice(0, max).join('');

export function displayName(raw: string | undefined | null): string {
	const text = (raw ?? '').normalize('NFC').replace(UNSAFE, '');
	const last = text.split(/[\\/]/).pop() ?? '';
	const trimmed = last.trim().replace(/^\.+/, '');
	return [...trimmed].slice(0, MAX).join('');
}

/** A title to show when the file has no title tag: the name without its extension. */
export function titleFromName(name: string): string {
	const base = name.replace(/\.[a-z0-9]{1,5}$/i, '').trim();
	return base || 'Untitled track';
}
