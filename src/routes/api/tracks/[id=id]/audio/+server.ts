import { requireRight } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { getTrackRow } from '$lib/server/tracks';
import { audioResponse } from '$lib/server/tracks/serve-audio';
import { idParam } from '$lib/route-id';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const row = id === null ? undefined : getTrackRow(id);
	if (!row) return badRequest('No such track.', 404);
	return audioResponse(row, event.request, 'private, max-age=3600');
}) satisfies RequestHandler;
