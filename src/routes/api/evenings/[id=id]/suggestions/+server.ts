import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { eveningIdOf } from '$lib/server/evenings/respond';
import { suggestTracks } from '$lib/server/evenings/suggestions';
import type { RequestHandler } from './$types';

/** Tracks that fit a dance, ranked by the fit engine: for swapping an entry's track. */
export const GET = ((event) => {
	requireRight(event, 'evenings');
	eveningIdOf(event.params);
	const danceId = Number(event.url.searchParams.get('danceId'));
	if (!Number.isSafeInteger(danceId) || danceId <= 0)
		return json({ error: 'Give danceId, a positive whole number.' }, { status: 400 });
	const items = suggestTracks(danceId);
	if (!items) return json({ error: 'There is no such dance.' }, { status: 404 });
	return json({ items });
}) satisfies RequestHandler;
