import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { readJson } from '$lib/server/json-body';
import { mayRead } from '$lib/server/evenings/access';
import { loadEvening } from '$lib/server/evenings/load';
import { answer, eveningIdOf } from '$lib/server/evenings/respond';
import { deleteEvening, updateEvening } from '$lib/server/evenings/write';
import { eveningPatch } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

const missing = () => json({ error: 'There is no such evening.' }, { status: 404 });

export const GET = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const evening = loadEvening(eveningIdOf(event.params));
	// A draft is invisible to dancers: the same answer as a missing evening.
	if (!evening || !mayRead(user, evening)) return missing();
	return json(evening);
}) satisfies RequestHandler;

export const PATCH = (async (event) => {
	requireRight(event, 'evenings');
	const id = eveningIdOf(event.params);
	const body = await readJson(event.request, eveningPatch);
	if (!body.ok) return body.response;
	return answer(() => {
		updateEvening(id, body.data);
		return json(loadEvening(id));
	});
}) satisfies RequestHandler;

export const DELETE = ((event) => {
	requireRight(event, 'evenings');
	const id = eveningIdOf(event.params);
	if (!deleteEvening(id)) return missing();
	return new Response(null, { status: 204 });
}) satisfies RequestHandler;
