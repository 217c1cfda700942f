import { config } from '$lib/server/config';
import { holds, requireRight } from '$lib/server/guard';
import { audioUrl, buildM3u8, type UriOf } from '$lib/server/share/m3u8';
import { appPlayKey, playExpiry, playUrl } from '$lib/server/share/play-link';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const sheet = readableSheet(user, event.params.id);
	const origin = config().origin;
	// Signed links play without a session; they go only to people who may play the music
	// anyway (readMusic), so a published evening's playlist hands no dancer the club's audio.
	const expires = playExpiry();
	const uriOf: UriOf = holds(user, 'readMusic')
		? (e) => playUrl(origin, { eveningId: sheet.id, trackId: e.trackId, expires }, appPlayKey())
		: (e) => audioUrl(origin, e.trackId);
	// RFC 8216 §4: a playlist is served as application/vnd.apple.mpegurl or audio/mpegurl.
	return download(buildM3u8(sheet, uriOf), 'audio/mpegurl', sheet, 'm3u8');
}) satisfies RequestHandler;
