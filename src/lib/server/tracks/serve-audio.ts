// A track's audio as an HTTP answer, with byte ranges (RFC 9110 §14) so a player can seek. One
// place for the signed-in audio route and the signed play links, which differ only in caching.
import { badRequest } from '../json-body';
import { storage } from '../storage';
import { parseRange } from './byte-range';
import type { TrackRow } from './track-json';

export async function audioResponse(
	row: TrackRow,
	request: Request,
	cacheControl: string
): Promise<Response> {
	const size = await storage().size(row.storageKey);
	if (size === null) return badRequest('The audio of this track is missing.', 404);
	const ext = row.storageKey.split('.').pop();
	const headers = new Headers({
		'Content-Type': row.mimeType,
		'Accept-Ranges': 'bytes',
		// The name is ours, never the uploader's, so no header can be forged through it.
		'Content-Disposition': `inline; filename="track-${row.id}.${ext}"`,
		'X-Content-Type-Options': 'nosniff',
		'Cache-Control': cacheControl,
		ETag: `"${row.sha256}"`
	});
	const range = parseRange(request.headers.get('range'), size);
	if (range.kind === 'unsatisfiable') {
		headers.set('Content-Range', `bytes */${size}`);
		headers.set('Content-Type', 'application/json');
		return new Response(JSON.stringify({ error: 'That byte range is not in the file.' }), {
			status: 416,
			headers
		});
	}
	if (range.kind === 'whole') {
		headers.set('Content-Length', String(size));
		return new Response(size === 0 ? null : storage().read(row.storageKey), { headers });
	}
	headers.set('Content-Range', `bytes ${range.start}-${range.end}/${size}`);
	headers.set('Content-Length', String(range.end - range.start + 1));
	return new Response(storage().read(row.storageKey, range), { status: 206, headers });
}
