import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { readJson } from '$lib/server/json-body';
import { mayRead } from '$lib/server/evenings/access';
import { loadEvening } from '$lib/server/evenings/load';
import { answer, eveningIdOf } from '$lib/server/evenings/respond';
import { saveRunOrder } from '$lib/server/evenings/run-order';
import { runOrderSave } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const evening = loadEvening(eveningIdOf(event.params));
	if (!evening || !mayRead(user, evening))
		return json({ error: 'There is no such evening.' }, { status: 404 });
	return json({ runOrderVersion: evening.runOrderVersion, entries: evening.entries });
}) satisfies RequestHandler;

/** Replaces the run order; a stale `version` gets 409 with the current one and nothing changes. */
export const PUT = (async (event) => {
	requireRight(event, 'evenings');
	const id = eveningIdOf(event.params);
	const body = await readJson(event.request, runOrderSave);
	if (!body.ok) return body.response;
	return answer(() => {
		const saved = saveRunOrder(id, body.data.version, body.data.entries);
		const evening = loadEvening(id)!;
		return json({ ...saved, entries: evening.entries });
	});
}) satisfies RequestHandler;
