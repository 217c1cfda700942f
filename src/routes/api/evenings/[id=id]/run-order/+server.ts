import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { readJsonValue, validateJson } from '$lib/server/json-body';
import { cachedJson } from '$lib/server/cache/cached-json';
import { mayRead, readsDrafts } from '$lib/server/evenings/access';
import { loadEvening } from '$lib/server/evenings/load';
import { answer, eveningIdOf } from '$lib/server/evenings/respond';
import { refuseStaleSave, saveRunOrder } from '$lib/server/evenings/run-order';
import { runOrderSave } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const id = eveningIdOf(event.params);
	// Everyone who may read drafts gets the same answer, and so does everyone who may not.
	const drafts = readsDrafts(user);
	const found = cachedJson(event.request, `run order ${id} ${drafts}`, () => {
		const evening = loadEvening(id);
		if (!evening || !mayRead(user, evening)) return null;
		return { runOrderVersion: evening.runOrderVersion, entries: evening.entries };
	});
	return found ?? json({ error: 'There is no such evening.' }, { status: 404 });
}) satisfies RequestHandler;

/** Replaces the run order; a stale `version` gets 409 with the current one and nothing changes. */
export const PUT = (async (event) => {
	requireRight(event, 'evenings');
	const id = eveningIdOf(event.params);
	const raw = await readJsonValue(event.request);
	if (!raw.ok) return raw.response;
	return answer(() => {
		// When several people save at once most saves are stale, and a stale save is refused
		// whatever its entries hold, so the version is checked before the entries are.
		const version = (raw.data as { version?: unknown } | null)?.version;
		if (typeof version === 'number' && Number.isSafeInteger(version)) refuseStaleSave(id, version);
		const body = validateJson(raw.data, runOrderSave);
		if (!body.ok) return body.response;
		const saved = saveRunOrder(id, body.data.version, body.data.entries);
		const evening = loadEvening(id)!;
		return json({ ...saved, entries: evening.entries });
	});
}) satisfies RequestHandler;
