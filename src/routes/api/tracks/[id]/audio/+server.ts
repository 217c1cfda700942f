import { requireRight } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { storage } from '$lib/server/storage';
import { getTrackRow, parseRange } from '$lib/server/tracks';
import { trackId } from '../track-id';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	requireRight(event, 'readMusic');
	const id = trackId(event.params.id);
	const row = id === null ? undefined : getTrackRow(id);
	if (!row) return badRequest('No such track.', 404);
	const size = await storage().size(row.storageKey);
	if (size === null) return badRequest('The audio of this track is missing.', 404);
	const ext = row.storageKey.split('.').pop();
	const headers = new Headers({
		'Content-Type': row.mimeType,
		'Accept-Ranges': 'bytes',
		// The name is ours, never the uploader's, so no header can be forged through it.
		'Content-Disposition': `inline; filename="track-${row.id}.${ext}"`,
		'X-Content-Type-Options': 'nosniff',
		'Cache-Control': 'private, max-age=3600',
		ETag: `"${row.sha256}"`
	});
	const range = parseRange(event.request.headers.get('range'), size);
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
}) satisfies RequestHandler;
