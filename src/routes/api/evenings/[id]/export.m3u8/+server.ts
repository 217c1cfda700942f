import { config } from '$lib/server/config';
import { buildM3u8 } from '$lib/server/share/m3u8';
import { requireRight } from '$lib/server/guard';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const sheet = readableSheet(requireRight(event, 'readEvenings'), event.params.id);
	// RFC 8216 §4: a playlist is served as application/vnd.apple.mpegurl or audio/mpegurl.
	return download(buildM3u8(sheet, config().origin), 'audio/mpegurl', sheet.id, 'm3u8');
}) satisfies RequestHandler;
