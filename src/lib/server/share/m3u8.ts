// The evening's music as an extended M3U playlist in UTF-8 (M3U8). The tags are the ones RFC 8216
// defines (§4.3.1.1 #EXTM3U first, §4.3.2.1 #EXTINF:<duration>,<title>); desktop players read the
// same form for local playlists. A player plays as recorded, so the rate goes in a comment.
import { rateText, type RunSheet, type SheetEntry } from './sheet';

/** One line of text: no CR or LF may end a tag early and smuggle in a line of its own. */
const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ').trim();

/** The signed-in audio route: for readers who may not have signed play links. */
export const audioUrl = (origin: string, trackId: number) =>
	`${origin.replace(/\/$/, '')}/api/tracks/${trackId}/audio`;

/**
 * Where a player finds an entry's audio: an absolute URL online, a file beside the playlist in
 * the evening kit; null when there is none (the entry is named in a comment instead).
 */
export type UriOf = (entry: SheetEntry & { trackId: number }) => string | null;

const playable = (e: SheetEntry): e is SheetEntry & { trackId: number } =>
	e.kind === 'dance' && e.trackId !== null;

/** The entries a playlist lists, in run order: dances with a track. */
export const playlistEntries = (sheet: RunSheet) => sheet.entries.filter(playable);

export function buildM3u8(sheet: RunSheet, uriOf: UriOf): string {
	const lines = ['#EXTM3U', `# ${oneLine(sheet.title)}`];
	// A track whose audio is gone would be a dead line in the player: leave it out.
	for (const e of playlistEntries(sheet).filter((e) => !e.audioMissing)) {
		// RFC 8216 §4.3.2.1: whole seconds are the form every version accepts.
		const seconds = Math.round(e.trackDurationS ?? e.durationS);
		const name = [e.artist, e.trackTitle]
			.map((s) => oneLine(s ?? ''))
			.filter(Boolean)
			.join(' - ');
		const uri = uriOf(e);
		// A line that begins with # but not #EXT is a comment (RFC 8216 §4.1).
		if (uri === null) {
			lines.push(`# missing audio: ${name}`);
			continue;
		}
		lines.push(`#EXTINF:${seconds},${name}`);
		if (e.rate !== 1) lines.push(`# rate ${rateText(e.rate)}`);
		lines.push(oneLine(uri));
	}
	return lines.join('\n') + '\n';
}
