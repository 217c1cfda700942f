import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { badRequest, readJson } from '$lib/server/json-body';
import { deleteTrack, getTrack, updateTrack } from '$lib/server/tracks';
import { patchSchema } from '$lib/music/track-schemas';
import { idParam } from '$lib/route-id';
import type { RequestHandler } from './$types';

const notFound = () => badRequest('No such track.', 404);

export const GET = ((event) => {
	requireRight(event, 'readMusic');
	const id = idParam(event.params.id);
	const track = id === null ? null : getTrack(id);
	return track ? json({ track }) : notFound();
}) satisfies RequestHandler;

export const PATCH = (async (event) => {
	requireRight(event, 'tracks');
	const id = idParam(event.params.id);
	if (id === null) return notFound();
	const body = await readJson(event.request, patchSchema);
	if (!body.ok) return body.response;
	const result = updateTrack(id, body.data);
	if (result.kind === 'not-found') return notFound();
	if (result.kind === 'stale') {
		return badRequest('Someone changed this track meanwhile; here is what it holds now.', 409, {
			current: result.current
		});
	}
	return json({ track: result.track });
}) satisfies RequestHandler;

export const DELETE = (async (event) => {
	requireRight(event, 'tracks');
	const id = idParam(event.params.id);
	if (id === null || !(await deleteTrack(id))) return notFound();
	return new Response(null, { status: 204 });
}) satisfies RequestHandler;
