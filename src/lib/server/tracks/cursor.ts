// Opaque keyset cursors: the sort the page was read in, the last row's sort key and its id.
// A cursor only continues the sort it was made for; anything else is refused, never guessed.
import type { TrackSort } from '../../music/track-schemas';

export interface Cursor {
	sort: TrackSort;
	key: string | number;
	id: number;
}

export function encodeCursor(c: Cursor): string {
	return Buffer.from(JSON.stringify([c.sort, c.key, c.id])).toString('base64url');
}

/** The cursor, or null when it is not one of ours or was made for another sort. */
export function decodeCursor(text: string, sort: TrackSort): Cursor | null {
	try {
		const value: unknown = JSON.parse(Buffer.from(text, 'base64url').toString('utf8'));
		if (!Array.isArray(value) || value.length !== 3) return null;
		const [s, key, id] = value as unknown[];
		if (s !== sort) return null;
		if (typeof key !== 'string' && typeof key !== 'number') return null;
		if (typeof id !== 'number' || !Number.isInteger(id)) return null;
		return { sort, key, id };
	} catch {
		return null;
	}
}
