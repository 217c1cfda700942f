import { cachedJson } from '$lib/server/cache/cached-json';
import { requireRight } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { idParam } from '$lib/route-id';
import { fitsForTrack, MAX_FIT_LIMIT, parseLimit } from '$lib/server/fits/ranking';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const limit = parseLimit(event.url.searchParams.get('limit'));
	if (limit == null) return badRequest(`limit is a whole number from 1 to ${MAX_FIT_LIMIT}.`, 422);
	const found = cachedJson(event.request, `track fits ${id} ${limit}`, () =>
		id ? fitsForTrack(id, limit) : null
	);
	return found ?? badRequest('No such track.', 404);
}) satisfies RequestHandler;
