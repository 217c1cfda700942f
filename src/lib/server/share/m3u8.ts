// The evening's music as an extended M3U playlist in UTF-8 (M3U8). The tags are the ones RFC 8216
// defines (§4.3.1.1 #EXTM3U first, §4.3.2.1 #EXTINF:<duration>,<title>); desktop players read the
// same form for local playlists. A player plays as recorded, so the rate goes in a comment.
import { rateText, type RunSheet } from './sheet';

/** One line of text: no CR or LF may end a tag early and smuggle in a line of its own. */
const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ').trim();

export const audioUrl = (origin: string, trackId: number) =>
	`${origin.replace(/\/$/, '')}/api/tracks/${trackId}/audio`;

export function buildM3u8(sheet: RunSheet, origin: string): string {
	const lines = ['#EXTM3U', `# ${oneLine(sheet.title)}`];
	for (const e of sheet.entries) {
		// A track whose audio is gone would be a dead line in the player: leave it out.
		if (e.kind !== 'dance' || e.trackId === null || e.audioMissing) continue;
		// RFC 8216 §4.3.2.1: whole seconds are the form every version accepts.
		const seconds = Math.round(e.trackDurationS ?? e.durationS);
		const name = [e.artist, e.trackTitle].map((s) => oneLine(s ?? '')).filter(Boolean);
		lines.push(`#EXTINF:${seconds},${name.join(' - ')}`);
		// A line that begins with # but not #EXT is a comment (RFC 8216 §4.1).
		if (e.rate !== 1) lines.push(`# rate ${rateText(e.rate)}`);
		lines.push(audioUrl(origin, e.trackId));
	}
	return lines.join('\n') + '\n';
}
