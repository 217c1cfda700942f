import { cachedJson } from '$lib/server/cache/cached-json';
import { requireRight } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { idParam } from '$lib/route-id';
import { fitsForDance, MAX_FIT_LIMIT, parseLimit } from '$lib/server/fits/ranking';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	// The fits carry the team's verdicts on the whole library: not for dancers.
	requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const limit = parseLimit(event.url.searchParams.get('limit'));
	if (limit == null) return badRequest(`limit is a whole number from 1 to ${MAX_FIT_LIMIT}.`, 422);
	const found = cachedJson(event.request, `dance fits ${id} ${limit}`, () => {
		const result = id ? fitsForDance(id, limit) : null;
		return result && { dance: result.dance, items: result.items };
	});
	return found ?? badRequest('No such dance.', 404);
}) satisfies RequestHandler;
